package org.holdfast.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.jhdf.HdfFile;
import org.holdfast.cli.CommandRunner;
import org.holdfast.expansion.CosmologyReader;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The faults a fault tester found, each as a case: bad input gets one line naming the file and
 * line or the option, exit code 2 and nothing written; a run never gives a confident answer
 * past where it can be trusted.
 */
class BadInputFaultsTest {

    static final Path PAIR = Path.of("..", "scenarios", "tethered-pair.toml");

    @TempDir
    Path tmp;

    /** Exit 2, one line on stderr that starts as given, nothing on stdout, and no output folder. */
    static void assertRefused(CommandRunner.Result r, String start, Path... notWritten) {
        assertEquals(2, r.exitCode(), r.out() + r.err());
        String err = r.err().strip();
        assertEquals(1, err.lines().count(), err);
        assertTrue(err.startsWith(start), err);
        assertFalse(err.matches("(?s).*\\b[A-Za-z]+(Exception|Error)\\b.*"), "no exception name: " + err);
        for (Path p : notWritten) {
            assertFalse(Files.exists(p), p + " was written");
        }
    }

    // ---- 1, 2: a run far into the future keeps a bound pair bound ---------------------------------

    @Test
    void aPairBoundForEverStaysBoundFarInTheFuture() throws IOException {
        // The tethered pair is a circular orbit of the two-body problem (Goldstein, Classical
        // Mechanics, 3rd ed., ch. 3 — chapter from memory), with the cosmological constant's push k r
        // balanced in its speed, well inside its zero-gravity radius: it stays at 400 kpc for ever.
        // The background term also acts on the centre of mass, d'' = k d, which amplifies rounding
        // left in it e-fold every 1/sqrt(k) = 17 Gyr (the linear instability of d'' = c d is common
        // practice); without the run loop taking that drift out, the pair was torn apart and
        // reported merged by 1443 Gyr, its separation 1e9 kpc.
        Path out = tmp.resolve("far");
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "1500",
                "--set", "run.snapshot_every_myr=20000", "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals("bound", s.get("verdict").asText());
        assertEquals(1500, s.get("end_gyr").asDouble(), 1e-9);
        for (JsonNode m : s.get("members")) {
            assertEquals("bound", m.get("fate").asText(), m.toString());
        }
        // every snapshot (76 of them, one every 20 Gyr) has the pair within 0.05 kpc of 400 kpc
        // (the scenario keeps it within 0.02 kpc over 60 Gyr; 0.0052 kpc was seen over 1500 Gyr)
        java.util.Map<String, double[]> at = new java.util.HashMap<>();
        int pairs = 0;
        List<String> rows = Files.readAllLines(out.resolve("tracks.csv"));
        for (String line : rows.subList(1, rows.size())) {
            String[] f = line.split(",");
            at.put(f[0] + f[2], new double[] {Double.parseDouble(f[3]), Double.parseDouble(f[4]), Double.parseDouble(f[5])});
            double[] a = at.get(f[0] + "Harl");
            double[] b = at.get(f[0] + "Wrenna");
            if (a != null && b != null) {
                double d = Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
                assertEquals(400, d, 0.05, "separation at " + f[0] + " Gyr");
                pairs++;
            }
        }
        assertEquals(76, pairs);
    }

    @Test
    void aRunPastWhereTheExpansionTableIsFiniteIsRefused() throws IOException {
        // far along a cosmological constant's exponential expansion the table's k(t) is no longer a
        // finite number (about 5924 Gyr for H0 = 70, Omega_L = 0.7): such a run is refused, not
        // stopped half-way on a bad number
        Path out = tmp.resolve("beyond");
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "12000",
                "--set", "run.snapshot_every_myr=100000");
        assertRefused(r, "holdfast evolve: --until: a run to 1.200e+04 Gyr goes beyond what holdfast can follow", out);
        assertTrue(r.err().contains("end the run by 59"), r.err());

        Path file = tmp.resolve("beyond.toml");
        Files.writeString(file, Files.readString(PAIR).replace("until_gyr = 60", "until_gyr = 12000")
                .replace("snapshot_every_myr = 500", "snapshot_every_myr = 100000"));
        CommandRunner.Result f = CommandRunner.run("validate", file.toString());
        assertRefused(f, "holdfast validate: " + file + ":22: run.until_gyr: a run to 1.200e+04 Gyr");
    }

    @Test
    void aRunToABigRipIsNotLimitedByTheRoundingCheck() throws IOException {
        Path out = tmp.resolve("rip");
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "3000",
                "--set", "cosmology.dark_energy.w0=-1.5", "--set", "run.snapshot_every_myr=5000", "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals("ripped", s.get("members").get(1).get("fate").asText());
    }

    @Test
    void aVeryLongRunIsRefusedBeforeAnythingIsWritten() {
        Path out = tmp.resolve("long");
        assertRefused(CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "1e5",
                "--set", "run.snapshot_every_myr=100000"), "holdfast evolve: --until: ", out);
        assertRefused(CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "-1e5"),
                "holdfast evolve: ", out);
    }

    // ---- 3: numbers that are not numbers ------------------------------------------------------

    @Test
    void untilThatIsNotAFiniteNumberIsRefused() {
        Path out = tmp.resolve("nan");
        for (String v : List.of("NaN", "Infinity", "-Infinity")) {
            assertRefused(CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", v),
                    "holdfast evolve: --until: must be a finite number", out);
        }
    }

    // ---- 4: absurd snapshot counts --------------------------------------------------------------

    @Test
    void absurdSnapshotCountsAreRefusedBeforeRunning() throws IOException {
        Path out = tmp.resolve("snaps");
        assertRefused(CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--set",
                "run.snapshot_every_myr=1e-9"), "holdfast evolve: --set: run.snapshot_every_myr: 1.00000e-09 Myr over",
                out);
        Path file = tmp.resolve("snaps.toml");
        Files.writeString(file, Files.readString(PAIR).replace("snapshot_every_myr = 500", "snapshot_every_myr = 0.1"));
        assertRefused(CommandRunner.run("evolve", file.toString(), "--out", out.toString()),
                "holdfast evolve: " + file + ":24: run.snapshot_every_myr: ", out);
    }

    // ---- 6: inputs too big or too deep for memory or stack --------------------------------------

    @Test
    void aHugeStringOrDeepNestingIsOneLineNotAnError() throws IOException {
        Path big = tmp.resolve("big.toml");
        byte[] head = Files.readAllBytes(PAIR);
        try (var o = Files.newOutputStream(big)) {
            o.write(head);
            o.write("\n[flow]\ncomment = \"".getBytes(StandardCharsets.US_ASCII));
            byte[] chunk = "x".repeat(1 << 20).getBytes(StandardCharsets.US_ASCII);
            for (int i = 0; i < 50; i++) {
                o.write(chunk);
            }
            o.write("\"\n".getBytes(StandardCharsets.US_ASCII));
        }
        assertRefused(CommandRunner.run("validate", big.toString()), "holdfast validate: " + big + ": the scenario file is");

        Path line = tmp.resolve("line.toml");
        Files.writeString(line, "description = \"" + "y".repeat(3 << 20) + "\"\n" + Files.readString(PAIR)
                .replaceFirst("description = .*\n", ""));
        assertRefused(CommandRunner.run("validate", line.toString()), "holdfast validate: " + line + ":1: a line longer");

        Path deep = tmp.resolve("deep.toml");
        Files.writeString(deep, Files.readString(PAIR) + "\nx = " + "[".repeat(100_000) + "]".repeat(100_000) + "\n");
        assertRefused(CommandRunner.run("validate", deep.toString()), "holdfast validate: " + deep + ":");
        assertRefused(CommandRunner.run("evolve", deep.toString(), "--out", tmp.resolve("o").toString()),
                "holdfast evolve: " + deep + ":", tmp.resolve("o"));
    }

    // ---- 7: output paths through an ordinary file ------------------------------------------------

    @Test
    void outputPathsThroughAFileAreBadInputBeforeAnyWork() throws IOException {
        Path file = tmp.resolve("a-file");
        Files.writeString(file, "in the way");
        assertRefused(CommandRunner.run("evolve", PAIR.toString(), "--out", file.resolve("run").toString()),
                "holdfast evolve: --out: ");
        assertRefused(CommandRunner.run("sweep", PAIR.toString(), "--vary", "cosmology.dark_energy.w0=-1.0,-1.5",
                "--until", "5", "--out", file.resolve("s").toString()), "holdfast sweep: --out: ");
        assertRefused(CommandRunner.run("expansion", PAIR.toString(), "--plot", file.resolve("p.png").toString()),
                "holdfast expansion: --plot: ");
        assertRefused(CommandRunner.run("new", "--out", file.resolve("n.toml").toString()), "holdfast new: --out: ");
        assertEquals("in the way", Files.readString(file));
    }

    // ---- 10: a killed run's folder is started over by the next run into it ----------------------

    @Test
    void aRunKilledBeforeItsEndIsStartedOverAndItsTemporaryFilesGo() throws IOException {
        Path out = tmp.resolve("killed");
        List<String> cmd = List.of("evolve", PAIR.toString(), "--out", out.toString(), "--until", "5", "--quiet");
        assertEquals(0, CommandRunner.run(cmd.toArray(String[]::new)).exitCode());
        String tracks = Files.readString(out.resolve("tracks.csv"));
        // what kill -9 leaves: no summary, temporary files, a snapshot past where the next run ends
        Files.delete(out.resolve("summary.json"));
        Files.writeString(out.resolve("summary.json.part"), "{\"half");
        Files.writeString(out.resolve("snapshots/state_000011.h5.part"), "half");
        Files.copy(out.resolve("snapshots/state_000001.h5"), out.resolve("snapshots/state_000099.h5"));
        CommandRunner.Result r = CommandRunner.run(cmd.toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(Files.exists(out.resolve("summary.json")));
        assertEquals(tracks, Files.readString(out.resolve("tracks.csv")));
        try (Stream<Path> s = Files.walk(out)) {
            List<String> left = s.map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".part") || n.equals("state_000099.h5")).toList();
            assertEquals(List.of(), left);
        }
        // a folder with anything else in it is not ours to clear
        Files.delete(out.resolve("summary.json"));
        Files.writeString(out.resolve("notes.txt"), "mine");
        assertRefused(CommandRunner.run(cmd.toArray(String[]::new)), "holdfast evolve: --out: ");
        assertEquals("mine", Files.readString(out.resolve("notes.txt")));
    }

    @Test
    void tracksComeInWholeSnapshotBlocks() throws IOException {
        Path out = tmp.resolve("blocks");
        assertEquals(0, CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "5",
                "--quiet").exitCode());
        List<String> rows = Files.readAllLines(out.resolve("tracks.csv"));
        assertEquals("t_gyr,a,name,x_kpc,y_kpc,z_kpc,vx_kms,vy_kms,vz_kms,mass_msun,stripped_msun", rows.get(0));
        assertEquals(1 + 2 * 11, rows.size(), "two galaxies at each of 11 snapshots");
        assertTrue(Files.readString(out.resolve("tracks.csv")).endsWith("\n"));
    }

    // ---- 11: text encodings, byte-order marks, tiny radiation densities -------------------------

    @Test
    void aFileThatIsNotUtf8IsNamedWithItsLine() throws IOException {
        Path bad = tmp.resolve("latin1.toml");
        byte[] text = Files.readString(PAIR).replace("Harl", "H\u00e9rl").getBytes(StandardCharsets.ISO_8859_1);
        Files.write(bad, text);
        int line = lineOf(Files.readString(PAIR), "Harl");
        assertRefused(CommandRunner.run("validate", bad.toString()),
                "holdfast validate: " + bad + ":" + line + ": not UTF-8 text (byte 0xE9");

        Path dir = tmp.resolve("w");
        Files.createDirectories(dir);
        Path toml = dir.resolve("drift.toml");
        Files.copy(Path.of("..", "scenarios", "drifting-w.toml"), toml);
        List<String> rows = Files.readAllLines(Path.of("..", "scenarios", "drifting-w.csv"));
        byte[] csv = (String.join("\n", rows) + "\n").replace("0.25,", "0.25\u00a0,").getBytes(StandardCharsets.ISO_8859_1);
        Files.write(dir.resolve("drifting-w.csv"), csv);
        CommandRunner.Result r = CommandRunner.run("expansion", toml.toString());
        assertRefused(r, "holdfast expansion: " + dir.resolve("drifting-w.csv") + ":4: not UTF-8 text");
    }

    @Test
    void aByteOrderMarkIsAccepted() throws IOException {
        Path bom = tmp.resolve("bom.toml");
        Files.writeString(bom, "\uFEFF" + Files.readString(PAIR));
        CommandRunner.Result r = CommandRunner.run("validate", bom.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("Wrenna"), r.out());
    }

    @Test
    void aRadiationDensityNearZeroGivesTheSameHistoryAsNone() {
        ExpansionTable none = table("omega_r = 0");
        for (String v : List.of("1e-308", "4.9e-324", "1e-20")) {
            ExpansionTable tiny = table("omega_r = " + v);
            // radiation this small changes the age by far less than 1e-10 of it
            assertEquals(none.ageGyr(), tiny.ageGyr(), 1e-10 * none.ageGyr(), v);
            assertEquals(none.scaleFactor(-10), tiny.scaleFactor(-10), 1e-10, v);
        }
        CommandRunner.Result r = CommandRunner.run("expansion", "--h0", "70", "--omega-m", "0.3", "--omega-r", "1e-308");
        assertEquals(0, r.exitCode(), r.err());
    }

    @Test
    void aHubbleConstantTheTableCannotDescribeIsRefused() {
        assertRefused(CommandRunner.run("expansion", "--h0", "1e-300", "--omega-m", "0.3"),
                "holdfast expansion: --h0: must be from 0.001 to 1e6 km/s/Mpc");
        assertEquals(0, CommandRunner.run("expansion", "--h0", "0.001", "--omega-m", "0.3").exitCode());
    }

    private ExpansionTable table(String omegaR) {
        Path f = tmp.resolve("c" + Math.abs(omegaR.hashCode()) + ".toml");
        try {
            Files.writeString(f, "[cosmology]\nh0 = 70\nomega_m = 0.3\n" + omegaR + "\n");
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return CosmologyReader.solve(ScenarioFile.open(f, Overrides.none()).requireTable("cosmology"));
    }

    // ---- 12: what the run folder says ----------------------------------------------------------

    @Test
    void snapshotsCarryOnlyHoldfastsOwnAttributes() throws IOException {
        Path out = tmp.resolve("attrs");
        assertEquals(0, CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "1",
                "--quiet").exitCode());
        try (HdfFile h = new HdfFile(out.resolve("snapshots/state_000001.h5"))) {
            Set<String> keys = h.getAttributes().keySet();
            assertEquals(Set.of("t_gyr", "scale_factor", "index", "scenario", "holdfast_version", "frame",
                    "length_unit", "velocity_unit", "mass_unit", "initial_galaxies"), keys.stream()
                            .collect(Collectors.toSet()));
            assertEquals("kpc", h.getAttribute("length_unit").getData());
        }
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertTrue(s.get("newtonian_limit_kms").isNull(), s.toString());
    }

    private static int lineOf(String text, String what) {
        int at = text.indexOf(what);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }
}
