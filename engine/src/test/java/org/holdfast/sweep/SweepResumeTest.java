package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.holdfast.cli.CommandRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a real sweep process (destroyForcibly: SIGKILL on Linux) in the middle of its runs,
 * starts the same command again, and checks that the sweep finishes with every run recorded
 * once, that the second process made exactly the runs the first had not recorded, and that the
 * results equal those of an uninterrupted sweep.
 */
@Tag("slow")
class SweepResumeTest {

    @TempDir
    Path tmp;

    private List<String> command(Path scenario, Path out, Path callLog) {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return List.of(java, "-Xmx256m", "-cp", System.getProperty("java.class.path"), ToySweepMain.class.getName(),
                "20", callLog.toString(), "sweep", scenario.toString(), "--out", out.toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3:-0.9:9", "--samples", "6", "--seed", "5", "--workers", "2");
    }

    @Test
    void aKilledSweepFinishesTheMissingRunsOnly() throws Exception {
        Path scenario = ToyRunFunction.writeScenario(tmp);
        Path out = tmp.resolve("killed");
        Path journal = out.resolve(Journal.FILE);
        Process first = new ProcessBuilder(command(scenario, out, tmp.resolve("calls-1.txt")))
                .redirectErrorStream(true).redirectOutput(tmp.resolve("log-1.txt").toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (lines(journal) < 10 && first.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        first.destroyForcibly();
        assertTrue(first.waitFor(30, TimeUnit.SECONDS));
        int recorded = Journal.read(out).size();
        assertTrue(recorded >= 10 && recorded < 54, "killed mid-sweep, with " + recorded + " of 54 runs recorded");
        assertFalse(Files.exists(out.resolve(ResultsTable.FILE)), "no results from a killed sweep");
        // A run is known by its seed, draw and w0 (with paired draws the seed is the same for all).
        List<Double> w0 = Axis.parse("w0=-1.3:-0.9:9").values();
        Set<String> runsBefore = new HashSet<>();
        Journal.read(out).forEach(r -> runsBefore.add(r.seed() + " " + r.sample() + " " + w0.get(r.point())));

        Path calls2 = tmp.resolve("calls-2.txt");
        Process second = new ProcessBuilder(command(scenario, out, calls2)).redirectErrorStream(true)
                .redirectOutput(tmp.resolve("log-2.txt").toFile()).start();
        assertTrue(second.waitFor(120, TimeUnit.SECONDS));
        assertEquals(0, second.exitValue(), Files.readString(tmp.resolve("log-2.txt")));

        List<RunRecord> all = Journal.read(out);
        assertEquals(54, all.size());
        Set<Long> runs = new HashSet<>();
        all.forEach(r -> runs.add(r.run()));
        assertEquals(54, runs.size(), "no run recorded twice");
        List<String> made = Files.readAllLines(calls2);
        assertEquals(54 - recorded, made.size(), "the restart made only the missing runs");
        assertEquals(54 - recorded, new HashSet<>(made).size(), "no run made twice by the restart");
        for (String s : made) {
            assertFalse(runsBefore.contains(s), "run (seed, draw, w0) = " + s + " was made again");
        }

        RunFunctions.install(new ToyRunFunction());
        try {
            Path ref = tmp.resolve("reference");
            List<String> full = command(scenario, ref, tmp.resolve("unused"));
            List<String> args = new ArrayList<>(full.subList(7, full.size()));
            assertEquals(0, CommandRunner.run(args.toArray(String[]::new)).exitCode());
            assertEquals(SweepFiles.resultsWithoutWall(ref), SweepFiles.resultsWithoutWall(out));
        } finally {
            RunFunctions.install(null);
        }
    }

    /**
     * Ctrl+C (SIGINT) in the middle of a sweep: exit 130 and one line that says how many runs were
     * saved, which is exactly what the journal holds; the same command then finishes the sweep.
     */
    @Test
    void anInterruptedSweepSaysWhatItKept() throws Exception {
        Path scenario = ToyRunFunction.writeScenario(tmp);
        Path out = tmp.resolve("interrupted");
        Path journal = out.resolve(Journal.FILE);
        Path log = tmp.resolve("log-int.txt");
        Process p = new ProcessBuilder(command(scenario, out, tmp.resolve("calls-int.txt")))
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (lines(journal) < 6 && p.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        Process kill = new ProcessBuilder("kill", "-INT", Long.toString(p.pid())).start();
        assertTrue(kill.waitFor(10, TimeUnit.SECONDS));
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        String text = Files.readString(log);
        assertEquals(130, p.exitValue(), text);
        int saved = Journal.read(out).size();
        assertTrue(saved >= 6 && saved < 54, saved + " runs saved");
        assertTrue(text.contains("stopped: " + saved + " of 54 runs saved; run the same command to go on"), text);
        assertFalse(text.contains("Exception"), text);
        Process again = new ProcessBuilder(command(scenario, out, tmp.resolve("calls-int-2.txt")))
                .redirectErrorStream(true).redirectOutput(tmp.resolve("log-int-2.txt").toFile()).start();
        assertTrue(again.waitFor(120, TimeUnit.SECONDS));
        assertEquals(0, again.exitValue());
        assertEquals(54 - saved, Files.readAllLines(tmp.resolve("calls-int-2.txt")).size());
    }

    /**
     * sweep-merge killed (SIGKILL) at seeded random moments, again and again into the same folder,
     * then run to the end: the same command always finishes it, and the result equals the sweep
     * made whole.
     */
    @Test
    void aMergeKilledAtRandomMomentsIsFinishedByTheSameCommand() throws Exception {
        Path scenario = ToyRunFunction.writeScenario(tmp);
        RunFunctions.install(new ToyRunFunction());
        List<String> merge = new ArrayList<>(List.of("sweep-merge"));
        Path whole = tmp.resolve("whole");
        try {
            List<String> base = command(scenario, whole, tmp.resolve("unused"));
            List<String> args = new ArrayList<>(base.subList(7, base.size()));
            assertEquals(0, CommandRunner.run(args.toArray(String[]::new)).exitCode());
            for (int i = 1; i <= 3; i++) {
                List<String> shard = new ArrayList<>(args);
                shard.set(shard.indexOf("--out") + 1, tmp.resolve("shard" + i).toString());
                shard.addAll(List.of("--shard", i + "/3"));
                assertEquals(0, CommandRunner.run(shard.toArray(String[]::new)).exitCode());
                merge.add(tmp.resolve("shard" + i).toString());
            }
        } finally {
            RunFunctions.install(null);
        }
        Path out = tmp.resolve("merged");
        merge.addAll(List.of("--out", out.toString()));
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = new ArrayList<>(List.of(java, "-Xmx256m", "-cp", System.getProperty("java.class.path"),
                ToySweepMain.class.getName(), "0", tmp.resolve("merge-calls").toString()));
        cmd.addAll(merge);
        java.util.Random random = new java.util.Random(18);
        for (int round = 0; round < 4; round++) {
            Process p = new ProcessBuilder(cmd).redirectErrorStream(true)
                    .redirectOutput(tmp.resolve("merge-" + round + ".log").toFile()).start();
            Thread.sleep(300 + random.nextInt(1500));
            p.destroyForcibly();
            assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        }
        Process last = new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(tmp.resolve("merge-last.log").toFile()).start();
        assertTrue(last.waitFor(120, TimeUnit.SECONDS));
        assertEquals(0, last.exitValue(), Files.readString(tmp.resolve("merge-last.log")));
        assertEquals(SweepFiles.resultsWithoutWall(whole), SweepFiles.resultsWithoutWall(out));
        assertEquals(Files.readString(whole.resolve(Fractions.FILE)), Files.readString(out.resolve(Fractions.FILE)));
    }

    private static long lines(Path f) throws IOException {
        if (!Files.exists(f)) {
            return 0;
        }
        return Files.readString(f).chars().filter(c -> c == '\n').count();
    }
}
