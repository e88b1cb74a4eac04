package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.SeedPlan;
import org.holdfast.sweep.SweepFiles;
import org.holdfast.sweep.ToyRunFunction;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sweep command over the toy physics ({@link ToyRunFunction}): files, determinism across
 * workers and shards, resumption and bad input. The physics checks come later with the real
 * engine; here only the machinery is tested.
 */
@Tag("slow")
class SweepCommandTest {

    @TempDir
    Path tmp;

    Path scenario;

    @BeforeEach
    void setUp() throws IOException {
        RunFunctions.install(new ToyRunFunction());
        scenario = ToyRunFunction.writeScenario(tmp);
    }

    @AfterEach
    void tearDown() {
        RunFunctions.install(null);
    }

    private CommandRunner.Result sweep(String out, String... extra) {
        List<String> args = new ArrayList<>(List.of("sweep", scenario.toString(), "--out", tmp.resolve(out).toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3:-0.9:5", "--samples", "4", "--seed", "42"));
        args.addAll(List.of(extra));
        return CommandRunner.run(args.toArray(String[]::new));
    }

    @Test
    void resultsHaveOneRowPerRunWithTheDocumentedColumns() throws IOException {
        CommandRunner.Result r = sweep("a", "--workers", "2");
        assertEquals(0, r.exitCode(), r.err());
        List<List<String>> rows = SweepFiles.rows(tmp.resolve("a/results.csv"));
        assertEquals(1 + 5 * 4, rows.size());
        List<String> header = new ArrayList<>(List.of("point", "sample", "seed", "cosmology.dark_energy.w0",
                "toy.w_noise", "verdict", "bound_until_gyr"));
        for (String m : List.of("Orrimal", "Vesk", "Tupala")) {
            for (String c : List.of("fate", "at_gyr", "left_gyr", "with", "together", "group", "bound_at_start")) {
                header.add(m + "." + c);
            }
        }
        header.addAll(List.of("energy_budget_error", "wall_s"));
        assertEquals(header, rows.get(0));
        Set<String> draws = new HashSet<>();
        for (int i = 1; i < rows.size(); i++) {
            List<String> row = rows.get(i);
            int point = Integer.parseInt(row.get(0));
            int sample = Integer.parseInt(row.get(1));
            assertEquals((i - 1) / 4, point, "rows sorted by point");
            assertEquals((i - 1) % 4, sample, "then by sample");
            assertEquals(42, Long.parseLong(row.get(2)), "paired draws: draw s of the master seed at every point");
            assertEquals(-1.3 + 0.1 * point, Double.parseDouble(row.get(3)), 1e-12);
            // Paired draws, visible in the table: sample s drew the same value at every grid point.
            assertEquals(rows.get(1 + sample).get(4), row.get(4), "row " + i);
            draws.add(row.get(4));
        }
        assertEquals(4, draws.size(), "four different draws, each the same at all five points");
    }

    @Test
    void independentDrawsDifferBetweenGridPoints() throws IOException {
        CommandRunner.Result r = sweep("ind", "--draws", "independent");
        assertEquals(0, r.exitCode(), r.err());
        List<List<String>> rows = SweepFiles.rows(tmp.resolve("ind/results.csv"));
        Set<String> draws = new HashSet<>();
        for (int i = 1; i < rows.size(); i++) {
            List<String> row = rows.get(i);
            assertEquals(SeedPlan.seedOf(42, Integer.parseInt(row.get(0)), Integer.parseInt(row.get(1))),
                    Long.parseLong(row.get(2)));
            draws.add(row.get(4));
        }
        assertEquals(20, draws.size(), "every run draws afresh");
        assertBadInput("--draws: sometimes: choose paired or independent", "sweep", scenario.toString(), "--out",
                tmp.resolve("bad-draws").toString(), "--draws", "sometimes");
    }

    @Test
    void fractionRippedRisesFromZeroToOneAcrossTheToyThreshold() throws IOException {
        // Toy: the 1e10 Msun member is ripped for w0 + noise < -1.0 with noise ~ N(0, 0.03), so
        // w0 = -1.3 (10 sigma below) gives fraction 1 and w0 = -0.9 (3.3 sigma above) gives 0.
        assertEquals(0, sweep("f", "--workers", "2").exitCode());
        List<List<String>> rows = SweepFiles.rows(tmp.resolve("f/fractions.csv"));
        assertEquals(List.of("point", "cosmology.dark_energy.w0", "level", "name", "outcome", "count", "runs",
                "fraction", "wilson95_low", "wilson95_high"), rows.get(0));
        double first = Double.NaN;
        double last = Double.NaN;
        for (List<String> row : rows.subList(1, rows.size())) {
            if (row.get(3).equals("Tupala") && row.get(4).equals("bound")) {
                double f = Double.parseDouble(row.get(7));
                if (row.get(0).equals("0")) {
                    first = f;
                }
                last = f;
                assertTrue(Double.parseDouble(row.get(8)) <= f && f <= Double.parseDouble(row.get(9)));
            }
        }
        assertEquals(0.0, first);
        assertEquals(1.0, last);
        for (String picture : List.of("fractions.png", "fate-times.png")) {
            assertTrue(Files.size(tmp.resolve("f/" + picture)) > 1000, picture);
            byte[] png = Files.readAllBytes(tmp.resolve("f/" + picture));
            assertEquals((byte) 0x89, png[0]);
            assertEquals('P', png[1]);
        }
    }

    @Test
    void oneAndTwoWorkersGiveTheSameResults() throws IOException {
        assertEquals(0, sweep("w1", "--workers", "1").exitCode());
        assertEquals(0, sweep("w2", "--workers", "2").exitCode());
        assertEquals(SweepFiles.resultsWithoutWall(tmp.resolve("w1")), SweepFiles.resultsWithoutWall(tmp.resolve("w2")));
        assertEquals(Files.readString(tmp.resolve("w1/fractions.csv")), Files.readString(tmp.resolve("w2/fractions.csv")));
    }

    @Test
    void shardsMergedEqualTheWholeSweep() throws IOException {
        assertEquals(0, sweep("whole", "--workers", "2").exitCode());
        List<String> dirs = new ArrayList<>(List.of("sweep-merge"));
        for (int i = 1; i <= 4; i++) {
            CommandRunner.Result r = sweep("shard" + i, "--shard", i + "/4", "--workers", "1");
            assertEquals(0, r.exitCode(), r.err());
            assertFalse(Files.exists(tmp.resolve("shard" + i + "/fractions.csv")), "a shard alone has no fractions");
            dirs.add(tmp.resolve("shard" + i).toString());
        }
        dirs.addAll(List.of("--out", tmp.resolve("merged").toString()));
        CommandRunner.Result m = CommandRunner.run(dirs.toArray(String[]::new));
        assertEquals(0, m.exitCode(), m.err());
        assertEquals(SweepFiles.resultsWithoutWall(tmp.resolve("whole")), SweepFiles.resultsWithoutWall(tmp.resolve("merged")));
        assertEquals(Files.readString(tmp.resolve("whole/fractions.csv")), Files.readString(tmp.resolve("merged/fractions.csv")));
        // The merged folder is a finished sweep: the unsharded command has nothing left to do.
        CommandRunner.Result again = sweep("merged");
        assertEquals(0, again.exitCode(), again.err());
        assertTrue(again.out().contains("0 made now, 20 already done"), again.out());
    }

    /**
     * A sweep-merge stopped at any point leaves a folder the same command finishes: empty but for
     * a temporary file, the plan alone, the plan and journal without tables, or a finished merge.
     */
    @Test
    void aMergeStoppedPartWayIsFinishedByTheSameCommand() throws IOException {
        assertEquals(0, sweep("whole", "--pair", "Vesk,Tupala").exitCode());
        List<String> merge = new ArrayList<>(List.of("sweep-merge"));
        for (int i = 1; i <= 2; i++) {
            assertEquals(0, sweep("p" + i, "--shard", i + "/2", "--pair", "Vesk,Tupala").exitCode());
            merge.add(tmp.resolve("p" + i).toString());
        }
        Path m = tmp.resolve("m");
        merge.addAll(List.of("--out", m.toString()));
        String[] cmd = merge.toArray(String[]::new);
        Files.createDirectories(m);
        Files.writeString(m.resolve("sweep.json.tmp"), "{ half a pl");
        CommandRunner.Result first = CommandRunner.run(cmd);
        assertEquals(0, first.exitCode(), first.err());
        List<String> expected = SweepFiles.resultsWithoutWall(tmp.resolve("whole"));
        String fractions = Files.readString(tmp.resolve("whole/fractions.csv"));
        assertTrue(fractions.contains(",pair,Vesk+Tupala,together,"), "the shards' pairs are counted");
        assertEquals(expected, SweepFiles.resultsWithoutWall(m));
        // killed after the plan, before the journal and the tables
        Files.delete(m.resolve("runs.jsonl"));
        Files.delete(m.resolve("results.csv"));
        Files.delete(m.resolve("fractions.csv"));
        CommandRunner.Result again = CommandRunner.run(cmd);
        assertEquals(0, again.exitCode(), again.err());
        assertEquals(expected, SweepFiles.resultsWithoutWall(m));
        assertEquals(fractions, Files.readString(m.resolve("fractions.csv")));
        // killed after the journal, before the tables; and a finished merge run once more
        Files.delete(m.resolve("results.csv"));
        assertEquals(0, CommandRunner.run(cmd).exitCode());
        assertEquals(0, CommandRunner.run(cmd).exitCode());
        assertEquals(expected, SweepFiles.resultsWithoutWall(m));
        // a folder that holds another sweep is still refused
        assertEquals(0, CommandRunner.run("sweep", scenario.toString(), "--out", tmp.resolve("x-other").toString(),
                "--vary", "cosmology.dark_energy.w0=-1.2,-1.0").exitCode());
        assertBadInput("--out: " + tmp.resolve("x-other") + ": already holds a different sweep", cmd[0], cmd[1],
                cmd[2], "--out", tmp.resolve("x-other").toString());
    }

    @Test
    void pairsAndTogetherAreCountedSymmetricallyAndUnknownNamesGetASuggestion() throws IOException {
        assertEquals(0, sweep("ab", "--pair", "Vesk,Tupala").exitCode());
        assertEquals(0, sweep("ba", "--pair", "Tupala,Vesk").exitCode());
        List<List<String>> ab = SweepFiles.rows(tmp.resolve("ab/fractions.csv"));
        List<List<String>> ba = SweepFiles.rows(tmp.resolve("ba/fractions.csv"));
        int pairs = 0;
        for (int i = 1; i < ab.size(); i++) {
            if (ab.get(i).get(2).equals("pair")) {
                assertEquals("Vesk+Tupala", ab.get(i).get(3));
                assertEquals("Tupala+Vesk", ba.get(i).get(3));
                assertEquals(ab.get(i).subList(4, 10), ba.get(i).subList(4, 10), "symmetric in A and B");
                pairs++;
            } else {
                assertEquals(ab.get(i), ba.get(i));
            }
        }
        assertEquals(5, pairs, "one pair row per grid point");
        assertTrue(ab.stream().anyMatch(r -> r.get(3).equals("Tupala") && r.get(4).equals("together")));
        assertBadInput("--pair: Vesc: no such member (did you mean 'Vesk'?)", "sweep", scenario.toString(), "--out",
                tmp.resolve("bad-pair").toString(), "--pair", "Vesc,Tupala");
        assertBadInput("--pair: Vesk,Vesk: names the same member twice", "sweep", scenario.toString(), "--out",
                tmp.resolve("bad-pair").toString(), "--pair", "Vesk,Vesk");
        assertBadInput("--vary: galaxy.Vesc.mass_msun: no such key in this scenario (did you mean "
                + "'galaxy.Vesk.mass_msun'?)", "sweep", scenario.toString(), "--out", tmp.resolve("bad-pair").toString(),
                "--vary", "galaxy.Vesc.mass_msun=1e10,1e11");
        assertBadInput("--set: galaxy.Tupalla.mass_msun: no such key in this scenario (did you mean "
                + "'galaxy.Tupala.mass_msun'?)", "sweep", scenario.toString(), "--out", tmp.resolve("bad-pair").toString(),
                "--set", "galaxy.Tupalla.mass_msun=1e10");
        assertFalse(Files.exists(tmp.resolve("bad-pair")), "nothing written");
    }

    @Test
    void mergeRefusesMissingShardsAndOtherSweeps() {
        assertEquals(0, sweep("s1", "--shard", "1/2").exitCode());
        CommandRunner.Result missing = CommandRunner.run("sweep-merge", tmp.resolve("s1").toString(), "--out",
                tmp.resolve("m1").toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, missing.exitCode());
        assertTrue(missing.err().contains("missing shard(s) [2] of 2"), missing.err());
        List<String> other = new ArrayList<>(List.of("sweep", scenario.toString(), "--out", tmp.resolve("s2").toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3:-0.9:5", "--samples", "4", "--seed", "43", "--shard", "2/2"));
        assertEquals(0, CommandRunner.run(other.toArray(String[]::new)).exitCode());
        CommandRunner.Result mixed = CommandRunner.run("sweep-merge", tmp.resolve("s1").toString(),
                tmp.resolve("s2").toString(), "--out", tmp.resolve("m2").toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, mixed.exitCode());
        assertTrue(mixed.err().contains("different sweep") && mixed.err().contains(
                "it was made with --seed 43, " + tmp.resolve("s1") + " with --seed 42"), mixed.err());
    }

    @Test
    void restartAfterALostTailMakesOnlyTheMissingRuns() throws IOException {
        assertEquals(0, sweep("r", "--workers", "2").exitCode());
        List<String> before = SweepFiles.resultsWithoutWall(tmp.resolve("r"));
        Path journal = tmp.resolve("r/runs.jsonl");
        List<String> lines = Files.readAllLines(journal);
        // Keep 8 whole lines and half of the 9th, as a kill in the middle of a write leaves it.
        String kept = String.join("\n", lines.subList(0, 8)) + "\n" + lines.get(8).substring(0, lines.get(8).length() / 2);
        Files.writeString(journal, kept);
        Files.delete(tmp.resolve("r/results.csv"));
        CommandRunner.Result r = sweep("r", "--workers", "2");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("12 made now, 8 already done"), r.out());
        assertEquals(20, Files.readAllLines(journal).size());
        assertEquals(before, SweepFiles.resultsWithoutWall(tmp.resolve("r")));
    }

    @Test
    void aFolderOfAnotherSweepIsRefused() {
        assertEquals(0, sweep("x").exitCode());
        CommandRunner.Result r = CommandRunner.run("sweep", scenario.toString(), "--out", tmp.resolve("x").toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3:-0.9:7", "--samples", "4", "--seed", "42");
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertTrue(r.err().contains("holds a different sweep: the folder was made with --vary cosmology.dark_energy.w0"
                + " (5 values from -1.3 to -0.9), this command asks for --vary cosmology.dark_energy.w0"
                + " (7 values from -1.3 to -0.9); choose another folder"), r.err());
    }

    @Test
    void twoVariedKeysGiveAMap() throws IOException {
        CommandRunner.Result r = CommandRunner.run("sweep", scenario.toString(), "--out", tmp.resolve("map").toString(),
                "--vary", "cosmology.dark_energy.w0=-1.25,-1.15,-1.05,-0.95", "--vary", "galaxy.Vesk.mass_msun=1e10:1e12:3",
                "--workers", "2");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(1 + 12, SweepFiles.rows(tmp.resolve("map/results.csv")).size());
        assertTrue(Files.size(tmp.resolve("map/map.png")) > 1000);
    }

    private void assertBadInput(String expected, String... args) {
        CommandRunner.Result r = CommandRunner.run(args);
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), r.err());
        assertTrue(r.err().contains(expected), r.err());
        assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void badInputIsOneLineAndExitCodeTwo() {
        String s = scenario.toString();
        String out = tmp.resolve("bad").toString();
        assertBadInput("--vary: cosmology.dark_energy.w1: no such key", "sweep", s, "--out", out, "--vary",
                "cosmology.dark_energy.w1=-1.2:-1:3");
        assertBadInput("--vary: galaxy.Vesk.name: is the string \"Vesk\", not a number", "sweep", s, "--out", out,
                "--vary", "galaxy.Vesk.name=1,2");
        assertBadInput("--vary: galaxy.Vesk.position_kpc: is a vector", "sweep", s, "--out", out,
                "--vary", "galaxy.Vesk.position_kpc=1,2");
        assertBadInput("--vary: cosmology.dark_energy.w0: COUNT must be at least 1, got 0", "sweep", s, "--out", out,
                "--vary", "cosmology.dark_energy.w0=-1.2:-1:0");
        assertBadInput("--vary: cosmology.dark_energy.w0: expected a number, got 'abc'", "sweep", s, "--out", out,
                "--vary", "cosmology.dark_energy.w0=abc,-1");
        assertBadInput("--yes: the sweep has 200000 runs", "sweep", s, "--out", out,
                "--vary", "cosmology.dark_energy.w0=-1.2:-1:2000", "--samples", "100");
        assertBadInput("--shard: 3/2: expected I/N", "sweep", s, "--out", out, "--shard", "3/2");
        assertBadInput("--samples: must be at least 1", "sweep", s, "--out", out, "--samples", "0");
        assertBadInput("--set: cosmology.nonsense: no such key in this scenario", "sweep", s, "--out", out,
                "--set", "cosmology.nonsense=3");
        assertFalse(Files.exists(tmp.resolve("bad/sweep.json")), "nothing half-written");
        assertBadInput("--set: galaxy.Vesk.halo.concentration: no such key in this scenario", "sweep", s, "--out", out,
                "--set", "galaxy.Vesk.halo.concentration=9");
        // An optional key that passes the check before the runs but that the (toy) run's reader
        // does not use: the first run reports it, and the folder is left as it was found.
        assertBadInput("--set: run.accuracy: no such key in this scenario", "sweep", s, "--out", out,
                "--set", "run.accuracy=0.02");
        assertFalse(Files.exists(tmp.resolve("bad/sweep.json")), "nothing half-written");
        assertFalse(Files.exists(tmp.resolve("bad/runs.jsonl")), "nothing half-written");
    }

    @Test
    void aBadVariedValueIsBlamedOnVaryAndLeavesNoFolder() {
        Path out = tmp.resolve("new/deeper");
        assertBadInput("--vary: galaxy.Vesk.mass_msun: must be > 0 (got -1.00000e+11)", "sweep", scenario.toString(),
                "--out", out.toString(), "--vary", "galaxy.Vesk.mass_msun=-1e11,1e11");
        assertFalse(Files.exists(tmp.resolve("new")), "no folder left behind");
        // The bad value last: still refused before anything is written.
        assertBadInput("--vary: cosmology.h0: must be > 0 km/s/Mpc", "sweep", scenario.toString(),
                "--out", out.toString(), "--vary", "cosmology.h0=70,-70");
        assertFalse(Files.exists(tmp.resolve("new")), "no folder left behind");
        assertBadInput("--set: galaxy.Vesk.mass_msun: must be > 0", "sweep", scenario.toString(),
                "--out", out.toString(), "--set", "galaxy.Vesk.mass_msun=-5");
        assertFalse(Files.exists(tmp.resolve("new")), "no folder left behind");
    }

    @Test
    void valuesThatFailOnlyTogetherAreFoundByTheirRunAndTheNewFolderIsRemoved() {
        // Vesk at (0, 0, 0) is where Orrimal is. Each value alone is fine, so the check before
        // the runs passes; the fourth run meets the combination after three runs were made.
        Path out = tmp.resolve("combo");
        assertBadInput("--vary: galaxy.Vesk.position_kpc: galaxy 'Vesk' is at the same place as 'Orrimal'", "sweep",
                scenario.toString(), "--out", out.toString(), "--workers", "1",
                "--vary", "galaxy.Vesk.position_kpc.0=300,0", "--vary", "galaxy.Vesk.position_kpc.1=5,0");
        assertFalse(Files.exists(out), "the folder this sweep made is gone");
    }

    @Test
    void anOutputFolderThatCannotBeMadeIsOneLineNamingOut() throws IOException {
        Path blocker = tmp.resolve("a-file");
        Files.writeString(blocker, "not a folder");
        assertBadInput("--out: cannot create the folder " + blocker.resolve("s") + ": ", "sweep", scenario.toString(),
                "--out", blocker.resolve("s").toString(), "--vary", "cosmology.dark_energy.w0=-1.2,-1");
        assertEquals(0, sweep("whole").exitCode());
        assertBadInput("--out: cannot create the folder " + blocker.resolve("m") + ": ", "sweep-merge",
                tmp.resolve("whole").toString(), "--out", blocker.resolve("m").toString());
    }

    @Test
    void varyingAnOptionalKeyTheFileLeavesOutIsAllowed() {
        CommandRunner.Result r = CommandRunner.run("sweep", scenario.toString(), "--out", tmp.resolve("opt").toString(),
                "--vary", "galaxy.Vesk.velocity_kms.2=0,10");
        // The toy reads velocity_kms, so both runs use the override.
        assertEquals(0, r.exitCode(), r.err());
    }

    @Test
    void helpTextsRenderCleanlyWithAnExample() {
        PrintStream old = System.err;
        ByteArrayOutputStream warnings = new ByteArrayOutputStream();
        System.setErr(new PrintStream(warnings, true));
        try {
            for (String c : List.of("sweep", "sweep-merge", "threshold", "new")) {
                CommandRunner.Result r = CommandRunner.run(c, "--help");
                assertEquals(0, r.exitCode());
                assertTrue(r.out().contains("Example:\n  holdfast " + c + " "), r.out());
            }
        } finally {
            System.setErr(old);
        }
        assertEquals("", warnings.toString(), "picocli could not format a help text");
    }

    @Test
    void sparkEngineWithoutSparkOrLocalUnknownEngineIsBadInput() {
        assertBadInput("--engine: warp: unknown engine", "sweep", scenario.toString(), "--out",
                tmp.resolve("e").toString(), "--engine", "warp");
    }
}
