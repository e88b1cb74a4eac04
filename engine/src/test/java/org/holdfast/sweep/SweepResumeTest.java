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
        Set<Long> seedsBefore = new HashSet<>();
        Journal.read(out).forEach(r -> seedsBefore.add(r.seed()));

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
        for (String s : made) {
            assertFalse(seedsBefore.contains(Long.parseLong(s)), "run with seed " + s + " was made again");
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

    private static long lines(Path f) throws IOException {
        if (!Files.exists(f)) {
            return 0;
        }
        return Files.readString(f).chars().filter(c -> c == '\n').count();
    }
}
