package org.holdfast.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.jhdf.HdfFile;
import org.holdfast.cli.Holdfast;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * kill -9 at random moments of real {@code holdfast} processes, then the same command again,
 * asserting what the README promises: a killed run leaves only whole snapshots and whole
 * snapshot blocks of tracks.csv and no summary; the same command run again finishes it, with
 * the same tracks and fates as a run never interrupted and no temporary file left; a killed
 * sweep resumes to the same results. Seeded: the kill moments are the same on every run of the
 * test (the moment a process reaches when killed still depends on the machine's speed).
 */
class CrashTest {

    private static final long SEED = 0xC0FFEEL;
    private static final int KILLS = Integer.getInteger("holdfast.crash.kills", 3);
    private static final Path PAIR = Path.of("..", "scenarios", "tethered-pair.toml");

    @TempDir
    Path tmp;

    @Test
    void aKilledEvolveLeavesWholeFilesAndTheSameCommandFinishesIt() throws Exception {
        Random rnd = new Random(SEED);
        Path ref = tmp.resolve("ref");
        long ms = timed(evolve(ref));
        String refTracks = Files.readString(ref.resolve("tracks.csv"));
        JsonNode refSummary = json(ref.resolve("summary.json"));
        List<String> refSnaps = names(ref.resolve("snapshots"));
        for (int k = 0; k < KILLS; k++) {
            Path out = tmp.resolve("killed-" + k);
            long at = (long) (rnd.nextDouble() * ms * 1.1);
            killAfter(evolve(out), at);
            boolean whole = Files.exists(out.resolve("summary.json"));
            System.out.printf("crash test: evolve killed at %d ms of %d: %s%n", at, ms, whole ? "it had finished"
                    : Files.isDirectory(out.resolve("snapshots")) ? names(out.resolve("snapshots")).size() + " snapshot files"
                    : "before its first snapshot");
            if (Files.isDirectory(out)) {
                checkWholeFiles(out, "killed at " + at + " ms of " + ms);
            }
            if (whole) {
                // it finished before the kill: a whole run folder is not run again
                assertEquals(2, run(evolve(out)), "a finished run folder is refused");
            } else {
                assertEquals(0, run(evolve(out)), "the same command again, after a kill at " + at + " ms");
            }
            assertEquals(refTracks, Files.readString(out.resolve("tracks.csv")), "tracks after a kill at " + at);
            assertEquals(refSnaps, names(out.resolve("snapshots")));
            assertEquals(fates(refSummary), fates(json(out.resolve("summary.json"))));
            for (String png : List.of("distances.png", "energy.png", "hubble.png")) {
                assertTrue(Files.size(out.resolve(png)) > 1000, png);
            }
            assertEquals(List.of(), leftovers(out), "temporary files after the second run");
        }
    }

    @Test
    void aKilledSweepResumesToTheSameResults() throws Exception {
        Random rnd = new Random(SEED + 1);
        Path ref = tmp.resolve("sweep-ref");
        long ms = timed(sweep(ref, null));
        String refResults = withoutWallTime(Files.readString(ref.resolve("results.csv")));
        for (int k = 0; k < Math.max(1, KILLS / 2); k++) {
            Path out = tmp.resolve("sweep-" + k);
            long at = (long) (rnd.nextDouble() * ms);
            killAfter(sweep(out, null), at);
            assertEquals(0, run(sweep(out, null)), "the same sweep again, after a kill at " + at + " ms");
            assertEquals(refResults, withoutWallTime(Files.readString(out.resolve("results.csv"))));
            assertEquals(List.of(), leftovers(out));
        }
    }

    @Test
    void aKilledSweepMergeCanBeRunAgain() throws Exception {
        Random rnd = new Random(SEED + 2);
        Path one = tmp.resolve("shard-1");
        Path two = tmp.resolve("shard-2");
        assertEquals(0, run(sweep(one, "1/2")));
        assertEquals(0, run(sweep(two, "2/2")));
        Path ref = tmp.resolve("merged-ref");
        List<String> merge = List.of("sweep-merge", one.toString(), two.toString(), "--out", ref.toString());
        long ms = timed(merge);
        String refResults = withoutWallTime(Files.readString(ref.resolve("results.csv")));
        for (int k = 0; k < Math.max(1, KILLS / 2); k++) {
            Path out = tmp.resolve("merged-" + k);
            List<String> again = List.of("sweep-merge", one.toString(), two.toString(), "--out", out.toString());
            long at = (long) (rnd.nextDouble() * ms);
            killAfter(again, at);
            assertEquals(0, run(again), "the same merge again, after a kill at " + at + " ms");
            assertEquals(refResults, withoutWallTime(Files.readString(out.resolve("results.csv"))));
            assertEquals(List.of(), leftovers(out));
        }
    }

    // ---- what a killed run folder must hold ---------------------------------------------------

    private static void checkWholeFiles(Path out, String when) throws IOException {
        Path snaps = out.resolve("snapshots");
        if (Files.isDirectory(snaps)) {
            for (String n : names(snaps)) {
                if (n.endsWith(".h5")) {
                    try (HdfFile h = new HdfFile(snaps.resolve(n))) {
                        double t = ((Number) h.getAttribute("t_gyr").getData()).doubleValue();
                        assertTrue(Double.isFinite(t), n);
                        assertEquals(2, ((double[][]) h.getDatasetByPath("galaxies/position_kpc").getData())[0].length);
                    }
                }
            }
        }
        Path tracks = out.resolve("tracks.csv");
        if (Files.exists(tracks)) {
            String text = Files.readString(tracks);
            if (!text.isEmpty()) {
                assertTrue(text.endsWith("\n"), "tracks.csv ends with a whole row, " + when);
                Map<String, Long> perSnapshot = text.lines().skip(1)
                        .collect(Collectors.groupingBy(l -> l.substring(0, l.indexOf(',')), Collectors.counting()));
                for (Map.Entry<String, Long> e : perSnapshot.entrySet()) {
                    assertEquals(2L, e.getValue(), "whole snapshot blocks in tracks.csv, t = " + e.getKey() + ", " + when);
                }
            }
        }
    }

    private static List<String> leftovers(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".part") || n.endsWith(".tmp"))
                    .toList();
        }
    }

    private static Map<String, String> fates(JsonNode summary) {
        Map<String, String> m = new HashMap<>();
        for (JsonNode f : summary.get("members")) {
            m.put(f.get("name").asText(), f.get("fate").asText() + " " + f.get("at_gyr").asText());
        }
        m.put("verdict", summary.get("verdict").asText());
        m.put("end", summary.get("end_gyr").asText());
        return m;
    }

    static String withoutWallTime(String csv) {
        List<String> rows = csv.lines().toList();
        int col = Arrays.asList(rows.get(0).split(",")).indexOf("wall_s");
        return rows.stream().map(r -> {
            List<String> cells = new ArrayList<>(Arrays.asList(r.split(",", -1)));
            cells.remove(col);
            return String.join(",", cells);
        }).collect(Collectors.joining("\n"));
    }

    // ---- processes ----------------------------------------------------------------------------

    private List<String> evolve(Path out) {
        return List.of("evolve", PAIR.toString(), "--out", out.toString(), "--until", "30", "--quiet",
                "--set", "run.snapshot_every_myr=100");
    }

    private List<String> sweep(Path out, String shard) {
        List<String> a = new ArrayList<>(List.of("sweep", PAIR.toString(), "--vary",
                "cosmology.dark_energy.w0=-1.0:-2.0:6", "--samples", "1", "--until", "30", "--workers", "1",
                "--out", out.toString()));
        if (shard != null) {
            a.addAll(List.of("--shard", shard));
        }
        return a;
    }

    private Process start(List<String> args) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = new ArrayList<>(List.of(java, "-Xmx512m", "-cp", System.getProperty("java.class.path"),
                Holdfast.class.getName()));
        cmd.addAll(args);
        return new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(tmp.resolve("log-" + System.nanoTime() + ".txt").toFile()).start();
    }

    /** Runs to the end; returns the exit code. */
    private int run(List<String> args) throws Exception {
        Process p = start(args);
        assertTrue(p.waitFor(180, TimeUnit.SECONDS), "finishes: " + args);
        return p.exitValue();
    }

    /** Runs to the end, which must be exit 0; returns how long it took, ms. */
    private long timed(List<String> args) throws Exception {
        long t0 = System.nanoTime();
        assertEquals(0, run(args), "the uninterrupted run");
        return Math.max(1, (System.nanoTime() - t0) / 1_000_000);
    }

    /** Starts the command and kills it (SIGKILL) after ms milliseconds, unless it ended before. */
    private void killAfter(List<String> args, long ms) throws Exception {
        Process p = start(args);
        if (!p.waitFor(ms, TimeUnit.MILLISECONDS)) {
            p.destroyForcibly();
            assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        }
        assertFalse(p.isAlive());
    }

    private static JsonNode json(Path f) throws IOException {
        return new ObjectMapper().readTree(f.toFile());
    }

    private static List<String> names(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
