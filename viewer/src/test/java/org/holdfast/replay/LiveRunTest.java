package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.output.RunFolder;
import org.holdfast.schema.ScenarioException;
import org.holdfast.window.RunFrameSource;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * A scenario evolving while it is shown: the source's span grows snapshot by snapshot, ends as
 * the same run folder {@code holdfast evolve} writes, and closing it stops the run cleanly.
 */
@Timeout(300)
@Tag("slow")
class LiveRunTest {

    @TempDir
    Path dir;

    @Test
    void theSpanGrowsWithTheRunAndEndsAsTheFinishedFolderReadsBack() throws Exception {
        Path keep = dir.resolve("live");
        List<Double> ends = new ArrayList<>();
        try (RunFrameSource s = RunFrameSource.following(LiveRun.start(DemoRun.SCENARIO, DemoRun.cutDown(125), keep))) {
            assertEquals(0.0, s.startGyr(), 0, "the run starts today");
            assertEquals(DemoRun.UNTIL_GYR, s.runEndGyr(), 0, "and ends at run.until_gyr");
            while (s.growing()) {
                ends.add(s.endGyr());
                Thread.sleep(5);
            }
            ends.add(s.endGyr());
            assertEquals(DemoRun.UNTIL_GYR, s.endGyr(), 1e-12, "the whole run in the end");
            assertFalse(s.growing());
            for (int i = 1; i < ends.size(); i++) {
                assertTrue(ends.get(i) >= ends.get(i - 1), "the span only grows: " + ends);
            }
            assertTrue(ends.get(0) < DemoRun.UNTIL_GYR, "the window saw the run before it ended: " + ends);

            RunArchive fresh = RunArchive.open(keep);
            double[] events = s.eventTimesGyr();
            assertEquals(fresh.events().size(), events.length, "the summary's events, escapes included");
            for (int i = 0; i < events.length; i++) {
                assertEquals(fresh.events().get(i).tGyr(), events[i], 0);
            }
            assertEquals(fresh.snapshotCount(), 1 + (int) Math.round(DemoRun.UNTIL_GYR / 0.125));
            for (String name : fresh.initialNames()) {
                double[][] read = fresh.track(name);
                double[][] live = s.archive().track(name);
                assertEquals(read.length, live.length);
                for (int row = 0; row < read.length; row++) {
                    org.junit.jupiter.api.Assertions.assertArrayEquals(read[row], live[row],
                            "the track of " + name + ", read as it grew, equals the one read whole");
                }
            }
            assertEquals(DemoRun.UNTIL_GYR, fresh.lastGyr(), 1e-12);
        }
        assertTrue(Files.isRegularFile(keep.resolve(RunFolder.SUMMARY)), "a kept folder stays");
        assertTrue(Files.isRegularFile(keep.resolve("tracks.csv")));
    }

    @Test
    void aRunThatARipCutsShortKnowsItsEndBeforeItGetsThere() throws Exception {
        Path keep = dir.resolve("rip");
        List<String> sets = new ArrayList<>(DemoRun.cutDown(2000, 40));
        sets.add("cosmology.dark_energy.w0=-1.5");
        double planned;
        try (RunFrameSource s = RunFrameSource.following(LiveRun.start(DemoRun.SCENARIO, sets, keep))) {
            assertTrue(s.growing());
            planned = s.runEndGyr();
            assertTrue(planned > 21 && planned < 22, "short of run.until_gyr = 40, before the rip: " + planned);
            assertTrue(s.endGyr() < planned, "known before the run gets there");
            s.awaitGyr(planned);
            while (s.growing()) {
                Thread.sleep(5);
            }
            assertEquals(planned, s.endGyr(), 0, "the run ends where it said it would");
        }
        JsonNode summary = new ObjectMapper().readTree(keep.resolve(RunFolder.SUMMARY).toFile());
        assertEquals("before_rip", summary.path("stop_reason").asText());
        assertEquals(planned, summary.path("end_gyr").asDouble(), 0);
    }

    @Test
    void framesOfARunStillGrowingMatchTheFinishedRun() throws Exception {
        Path keep = dir.resolve("live");
        double t = 0.6;
        double[] live = new double[3];
        try (RunFrameSource s = RunFrameSource.following(LiveRun.start(DemoRun.SCENARIO, DemoRun.cutDown(125), keep))) {
            s.awaitGyr(t);
            assertTrue(s.endGyr() >= t);
            assertTrue(s.memberCentreKpc(0, t, live));
            while (s.growing()) {
                Thread.sleep(5);
            }
        }
        double[] done = new double[3];
        try (RunFrameSource s = new RunFrameSource(RunArchive.open(keep), null)) {
            assertTrue(s.memberCentreKpc(0, t, done));
        }
        for (int c = 0; c < 3; c++) {
            assertEquals(done[c], live[c], 0, "same snapshots, same interpolation, axis " + c);
        }
    }

    @Test
    void closingMidRunCancelsItAndLeavesAWholeFolder() throws Exception {
        Path keep = dir.resolve("stopped");
        LiveRun live = LiveRun.start(DemoRun.SCENARIO, List.of("run.snapshot_every_myr=100"), keep);
        live.awaitSnapshots(3);
        live.close();
        assertTrue(live.finished());
        assertTrue(live.status().contains("cancelled"), live.status());
        JsonNode summary = new ObjectMapper().readTree(keep.resolve(RunFolder.SUMMARY).toFile());
        assertEquals("cancelled", summary.path("stop_reason").asText());
        assertTrue(summary.path("end_gyr").asDouble() < 40, "stopped long before run.until_gyr");
        RunArchive back = RunArchive.open(keep);
        assertTrue(back.snapshotCount() >= 3, "every snapshot written is whole and readable");
        for (int i = 0; i < back.snapshotCount(); i++) {
            assertEquals(0.1 * i, back.snapshot(i).tGyr(), 1e-9);
        }
    }

    @Test
    void aJvmToldToQuitMidRunStillWritesTheSummary() throws Exception {
        Path keep = dir.resolve("terminated");
        List<String> cmd = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                System.getProperty("java.class.path"), LiveRunChild.class.getName(), keep.toString());
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(dir.resolve("child.txt").toFile()).start();
        Path snaps = keep.resolve("snapshots");
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (count(snaps) < 3 && p.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(50);
        }
        assertTrue(p.isAlive(), "the child runs: " + Files.readString(dir.resolve("child.txt")));
        p.destroy(); // SIGTERM, as a terminal's Ctrl+C or a scheduler would send
        assertTrue(p.waitFor(60, java.util.concurrent.TimeUnit.SECONDS), "the child quits");
        JsonNode summary = new ObjectMapper().readTree(keep.resolve(RunFolder.SUMMARY).toFile());
        assertEquals("cancelled", summary.path("stop_reason").asText());
        assertTrue(RunArchive.open(keep).snapshotCount() >= 3);
    }

    private static long count(Path folder) throws java.io.IOException {
        if (!Files.isDirectory(folder)) {
            return 0;
        }
        try (var s = Files.list(folder)) {
            return s.filter(f -> f.getFileName().toString().endsWith(".h5")).count();
        }
    }

    @Test
    void aTemporaryRunFolderGoesWhenTheSourceCloses() {
        LiveRun live = LiveRun.start(DemoRun.SCENARIO, DemoRun.cutDown(250), null);
        Path folder = live.dir();
        assertTrue(live.temporary());
        try (RunFrameSource s = RunFrameSource.following(live)) {
            assertTrue(Files.isDirectory(folder));
            assertTrue(s.endGyr() >= s.startGyr());
        }
        assertFalse(Files.exists(folder), "removed: " + folder);
        assertFalse(Files.exists(folder.getParent()));
    }

    @Test
    void badInputIsRefusedBeforeAnythingRuns() {
        Path keep = dir.resolve("never");
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> LiveRun.start(DemoRun.SCENARIO, List.of("galaxy.Aldermere.mass_msun=-1"), keep));
        assertTrue(e.getMessage().contains("mass_msun"), e.getMessage());
        assertFalse(Files.exists(keep), "nothing written");
    }

    /**
     * A folder caught mid-write: tracks.csv ends in half a row and there is no summary yet. The
     * archive leaves the half row for later, and once the rest is written its tracks equal
     * those of the finished folder read whole.
     */
    @Test
    void tracksReadWhileTheyAreWrittenEqualTheFinishedOnes() throws Exception {
        Path full = DemoRun.folder();
        Path grow = dir.resolve("growing");
        try (var files = Files.walk(full)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                Path to = grow.resolve(full.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(to);
                } else if (!p.getFileName().toString().equals(RunFolder.SUMMARY)) {
                    Files.copy(p, to);
                }
            }
        }
        byte[] csv = Files.readAllBytes(full.resolve("tracks.csv"));
        int cut = csv.length / 3;
        while (csv[cut - 1] == '\n') {
            cut++;
        }
        Files.write(grow.resolve("tracks.csv"), java.util.Arrays.copyOf(csv, cut));
        RunArchive growing = RunArchive.open(grow);
        RunArchive whole = RunArchive.open(full);
        String name = whole.initialNames().get(0);
        assertTrue(growing.track(name)[0].length < whole.track(name)[0].length, "only part of the track yet");
        Files.write(grow.resolve("tracks.csv"), csv);
        Files.copy(full.resolve(RunFolder.SUMMARY), grow.resolve(RunFolder.SUMMARY));
        assertTrue(growing.refresh(), "the summary is news");
        for (String n : whole.initialNames()) {
            for (int row = 0; row < RunArchive.TRACK_ROWS; row++) {
                org.junit.jupiter.api.Assertions.assertArrayEquals(whole.track(n)[row], growing.track(n)[row], n);
            }
        }
    }
}
