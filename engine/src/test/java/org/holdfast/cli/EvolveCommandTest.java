package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** A whole `evolve` as a user runs it, on a small pair with tracers. */
@Tag("slow")
class EvolveCommandTest {

    static final String SCENARIO = """
            name = "Small pair"
            [cosmology]
            h0 = 70
            omega_m = 0.3
            [cosmology.dark_energy]
            w0 = -0.9
            wa = -0.2
            [run]
            until_gyr = 2
            snapshot_every_myr = 500
            [[galaxy]]
            name = "Arn"
            mass_msun = 1e12
            position_kpc = [0, 0, 0]
            halo = { profile = "nfw", concentration = 10 }
            stars = { count = 300, shape = "disk", radius_kpc = 4, normal = [0, 0, 1] }
            [[galaxy]]
            name = "Bel"
            mass_msun = 2e11
            position_kpc = [300, 0, 0]
            velocity_kms = [0, 80, 0]
            halo = { profile = "hernquist", scale_kpc = 8 }
            stars = { count = 100, shape = "sphere", radius_kpc = 2 }
            [flow]
            count = 200
            inner_kpc = 1500
            outer_kpc = 3000
            """;

    @TempDir
    static Path dir;

    static Path run;
    static CommandRunner.Result result;

    @BeforeAll
    static void evolveOnce() throws IOException {
        Path f = dir.resolve("pair.toml");
        Files.writeString(f, SCENARIO);
        run = dir.resolve("out");
        result = CommandRunner.run("evolve", f.toString(), "--out", run.toString());
    }

    @Test
    void theRunSucceedsAndSaysWhatBecomesOfEachMember() {
        assertEquals(0, result.exitCode(), result.err());
        assertTrue(result.out().contains("What becomes of each member:"), result.out());
        assertTrue(result.out().contains("Arn"), result.out());
    }

    @Test
    void summaryHoldsTheKeysOtherToolsReadAndACentreOfMassFrame() throws IOException {
        JsonNode s = new ObjectMapper().readTree(run.resolve("summary.json").toFile());
        for (String k : List.of("scenario", "version", "start_gyr", "end_gyr", "stop_reason", "steps", "wall_s",
                "energy_budget_error", "cosmology", "galaxies", "members", "verdict", "bound_until_gyr", "events")) {
            assertTrue(s.has(k), "summary.json lacks " + k);
        }
        assertEquals(2.0, s.get("end_gyr").asDouble(), 1e-12);
        assertEquals("reached_end", s.get("stop_reason").asText());
        // Centre of mass of (1e12 at 0, 2e11 at 300 kpc): 50 kpc along x.
        assertEquals(50.0, s.get("frame").get("offset_kpc").get(0).asDouble(), 1e-9);
        assertTrue(s.get("energy_budget_error").asDouble() < 1e-3);
    }

    @Test
    void fatesSayWhyPerMemberPerSnapshot() throws IOException {
        List<String> lines = Files.readAllLines(run.resolve("fates.csv"), StandardCharsets.UTF_8);
        assertEquals("t_gyr,name,in_main_group,separation_kpc,energy_kms2,barrier_kms2,barrier_kpc,zero_gravity_kpc,"
                + "k_gyr2,mass_msun,stripped_msun", lines.get(0));
        assertEquals(1 + 5 * 2, lines.size());
        String[] arn = lines.get(1).split(",", -1);
        String[] bel = lines.get(2).split(",", -1);
        // both judged against each other: 300 kpc apart at the start, bound (energy below the barrier top)
        assertEquals(300.0, Double.parseDouble(arn[3]), 1e-9);
        assertEquals(300.0, Double.parseDouble(bel[3]), 1e-9);
        assertTrue(Double.parseDouble(bel[4]) < Double.parseDouble(bel[5]), lines.get(2));
        JsonNode members = new ObjectMapper().readTree(run.resolve("summary.json").toFile()).get("members");
        for (JsonNode m : members) {
            assertTrue(m.has("left_gyr") && m.has("stripped_msun"), m.toString());
        }
    }

    @Test
    void tracksHaveOneRowPerGalaxyPerSnapshot() throws IOException {
        List<String> lines = Files.readAllLines(run.resolve("tracks.csv"), StandardCharsets.UTF_8);
        assertEquals("t_gyr,a,name,x_kpc,y_kpc,z_kpc,vx_kms,vy_kms,vz_kms,mass_msun,stripped_msun", lines.get(0));
        // Snapshots at 0, 0.5, 1, 1.5, 2 Gyr: five, two galaxies each.
        assertEquals(1 + 5 * 2, lines.size());
        String[] first = lines.get(1).split(",");
        assertEquals(0.0, Double.parseDouble(first[0]));
        assertEquals(1.0, Double.parseDouble(first[1]), 1e-12);
        assertEquals("Arn", first[2]);
        assertEquals(-50.0, Double.parseDouble(first[3]), 1e-9);
    }

    @Test
    void snapshotsAndPicturesAreThere() throws IOException {
        try (var s = Files.list(run.resolve("snapshots"))) {
            assertEquals(5, s.filter(p -> p.toString().endsWith(".h5")).count());
        }
        for (String png : List.of("distances.png", "energy.png", "hubble.png")) {
            assertTrue(Files.size(run.resolve(png)) > 10_000, png);
        }
        assertTrue(Files.exists(run.resolve("scenario.toml")));
        assertTrue(Files.exists(run.resolve("resolved.json")));
    }

    @Test
    void anIndependentReaderOpensTheSnapshots() throws Exception {
        // h5py from Debian's python3-h5py, installed by .ci/run.
        Path py = Path.of("/usr/bin/python3");
        assumeTrue(Files.isExecutable(py), "no /usr/bin/python3");
        Process check = new ProcessBuilder(py.toString(), "-c", "import h5py").start();
        assumeTrue(check.waitFor(30, TimeUnit.SECONDS) && check.exitValue() == 0, "python3-h5py is not installed");
        String code = "import h5py,sys\n"
                + "f = h5py.File(sys.argv[1], 'r')\n"
                + "print(f['galaxies/position_kpc'].shape, f['tracers/position_kpc'].shape, f['tracers/host'].shape,"
                + " f.attrs['t_gyr'], f['galaxies/name'][1].decode() if isinstance(f['galaxies/name'][1], bytes)"
                + " else f['galaxies/name'][1])\n";
        Process p = new ProcessBuilder(py.toString(), "-c", code,
                run.resolve("snapshots/state_000002.h5").toString()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals("(3, 2) (3, 600) (600,) 1.0 Bel", out);
    }

    @Test
    void badInputWritesNothing() throws IOException {
        Path f = dir.resolve("bad.toml");
        Files.writeString(f, SCENARIO.replace("mass_msun = 2e11", "mass_msun = -2e11"));
        Path out = dir.resolve("never");
        CommandRunner.Result r = CommandRunner.run("evolve", f.toString(), "--out", out.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertTrue(r.err().contains("galaxy.Bel.mass_msun: must be > 0"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void aBadOverrideIsBlamedOnTheOptionNotOnTheFilesLine() throws IOException {
        // Bel's mass is 2e11 on line 20 of the file; the bad value is the one given with --set.
        Path f = dir.resolve("pair.toml");
        Path out = dir.resolve("never-set");
        CommandRunner.Result r = CommandRunner.run("evolve", f.toString(), "--out", out.toString(),
                "--set", "galaxy.Bel.mass_msun=-1e12");
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), r.err());
        assertEquals("holdfast evolve: --set: galaxy.Bel.mass_msun: must be > 0 (got -1.00000e+12)", r.err().strip());
        assertFalse(Files.exists(out));
    }

    @Test
    void anOutputFolderThatCannotBeMadeIsBadInputBeforeTheRunIsAnnounced() throws IOException {
        Path blocker = dir.resolve("a-file");
        Files.writeString(blocker, "not a folder");
        Path out = blocker.resolve("run");
        CommandRunner.Result r = CommandRunner.run("evolve", dir.resolve("pair.toml").toString(), "--out", out.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().startsWith("holdfast evolve: --out: cannot create the folder " + out + ": "), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertEquals("", r.out(), "nothing announced");
    }

    @Test
    void sampleOnAScenarioWithoutUncertainNumbersSaysItChangesNothing() throws IOException {
        Path f = dir.resolve("plain-pair.toml");
        Files.writeString(f, SCENARIO.substring(0, SCENARIO.indexOf("[[galaxy]]")) + """
                [[galaxy]]
                name = "Arn"
                mass_msun = 1e12
                position_kpc = [0, 0, 0]
                [[galaxy]]
                name = "Bel"
                mass_msun = 2e11
                position_kpc = [300, 0, 0]
                velocity_kms = [0, 80, 0]
                """);
        CommandRunner.Result r = CommandRunner.run("evolve", f.toString(), "--out", dir.resolve("sampled").toString(),
                "--sample", "3", "--until", "0.2");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("\n  the scenario has no uncertain numbers, so --sample 3 changes nothing\n"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void tracersThatCannotFitInTheHeapAreRefusedBeforeAnythingIsAllocated() throws IOException {
        Path f = dir.resolve("huge.toml");
        Files.writeString(f, SCENARIO.replace("count = 300", "count = 90000000"));
        Path out = dir.resolve("huge-out");
        CommandRunner.Result r = CommandRunner.run("evolve", f.toString(), "--out", out.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), r.err());
        assertTrue(r.err().contains("more than the") && r.err().contains("lower the star and flow counts"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void aFullOutputFolderIsRefused() throws IOException {
        Path f = dir.resolve("pair.toml");
        CommandRunner.Result r = CommandRunner.run("evolve", f.toString(), "--out", run.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertTrue(r.err().contains("--out: " + run + " already exists"), r.err());
    }
}
