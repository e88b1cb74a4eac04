package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.cli.CommandRunner;
import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.uncertain.UncertainValue;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Sweeps through the real physics: outcomes that do not depend on labels, and uncertainty from --set. */
class RealSweepOutcomesTest {

    static final Path PAIR = Path.of("../scenarios/tethered-pair.toml");

    @TempDir
    Path tmp;

    @BeforeEach
    @AfterEach
    void realPhysics() {
        RunFunctions.install(null);
    }

    private List<List<String>> sweep(String out, String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("sweep", PAIR.toString(), "--out", tmp.resolve(out).toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3,-1.15,-1.0", "--until", "40", "--workers", "2"));
        args.addAll(List.of(extra));
        CommandRunner.Result r = CommandRunner.run(args.toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        return SweepFiles.rows(tmp.resolve(out).resolve(Fractions.FILE));
    }

    /**
     * The tethered pair with its masses swapped (Harl 4e11, Wrenna 1.2e12): the relative orbit is
     * the same (same total mass, separation and relative velocity: the two-body problem, common
     * practice), so the fractions of together, of the pair and of the group's verdicts must be the
     * same whichever member is the heavier. Since a pair torn apart gives both members the fate that
     * tore it, the per-member fates are the same too.
     */
    @Test
    void aTwoMemberSweepsFractionsDoNotDependOnWhichMemberIsHeavier() throws Exception {
        List<List<String>> a = sweep("a", "--pair", "Harl,Wrenna");
        List<List<String>> b = sweep("b", "--pair", "Harl,Wrenna", "--set", "galaxy.Harl.mass_msun=4e11", "--set",
                "galaxy.Wrenna.mass_msun=1.2e12", "--set", "galaxy.Wrenna.velocity_kms.1=0", "--set",
                "galaxy.Harl.velocity_kms.1=-129.05");
        assertEquals(a.size(), b.size());
        int compared = 0;
        boolean someRip = false;
        for (int i = 1; i < a.size(); i++) {
            List<String> ra = a.get(i);
            List<String> rb = b.get(i);
            String outcome = ra.get(4);
            boolean labelFree = outcome.equals("together") || ra.get(2).equals("group");
            if (labelFree) {
                assertEquals(ra, rb, "row " + i);
                compared++;
            }
            if (outcome.equals("ripped") && !ra.get(7).equals("0.000000")) {
                someRip = true;
            }
        }
        assertTrue(someRip, "the grid reaches the rip, so the check can fail");
        assertEquals(3 * (2 + 1 + 4), compared);
        // a dissolved pair gives both members the fate that tore it, whichever is the heavier
        String ripA = a.stream().filter(r -> r.get(0).equals("0") && r.get(3).equals("Wrenna")
                && r.get(4).equals("ripped")).findFirst().orElseThrow().get(7);
        String ripB = b.stream().filter(r -> r.get(0).equals("0") && r.get(3).equals("Wrenna")
                && r.get(4).equals("ripped")).findFirst().orElseThrow().get(7);
        assertEquals(ripA, ripB);
    }

    /**
     * --set with an inline table makes a number uncertain: it is read as the same table written in
     * the file would be (same distribution, same draw for the same seed, draw and key path).
     */
    @Test
    void anInlineTableOnTheCommandLineIsAnUncertainNumber() throws Exception {
        String table = "{ median = 1.2e12, sigma_dex = 0.2 }";
        Scenario fromSet = ScenarioReader.read(PAIR, Overrides.parse(List.of("galaxy.Harl.mass_msun=" + table)),
                UncertainNumbers.sampling(7, 3), Double.NaN);
        Path inFile = tmp.resolve("pair-uncertain.toml");
        java.nio.file.Files.writeString(inFile, java.nio.file.Files.readString(PAIR)
                .replace("mass_msun = 1.2e12", "mass_msun = " + table));
        Scenario fromFile = ScenarioReader.read(inFile, Overrides.none(), UncertainNumbers.sampling(7, 3), Double.NaN);
        List<UncertainValue> u = fromSet.uncertain();
        assertEquals(1, u.size());
        assertEquals("galaxy.Harl.mass_msun", u.get(0).path());
        assertEquals(fromFile.uncertain().get(0).value(), u.get(0).value());
        assertNotEquals(1.2e12, u.get(0).value());
        CommandRunner.Result bad = CommandRunner.run("evolve", PAIR.toString(), "--set",
                "galaxy.Harl.mass_msun={ median = 1.2e12, sigma_dex = }", "--out", tmp.resolve("bad").toString());
        assertEquals(2, bad.exitCode(), bad.err());
        assertTrue(bad.err().contains(": --set: galaxy.Harl.mass_msun: expected a number or an inline table such as"
                + " { median = 1.2e12, sigma_dex = 0.2 }, got '{ median = 1.2e12, sigma_dex = }'"), bad.err());
        assertTrue(!bad.err().contains("Exception"), bad.err());
        assertEquals(1, bad.err().strip().lines().count(), bad.err());
        // the sweep draws it, the same at every grid point, and shows the values drawn
        List<String> args = List.of("sweep", PAIR.toString(), "--out", tmp.resolve("u").toString(), "--vary",
                "cosmology.dark_energy.w0=-1.2,-1.0", "--until", "5", "--samples", "3", "--set",
                "galaxy.Harl.mass_msun=" + table);
        CommandRunner.Result r = CommandRunner.run(args.toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        List<List<String>> rows = SweepFiles.rows(tmp.resolve("u").resolve(ResultsTable.FILE));
        int col = rows.get(0).indexOf("galaxy.Harl.mass_msun");
        assertTrue(col > 0, rows.get(0).toString());
        for (int i = 1; i <= 3; i++) {
            assertEquals(rows.get(i).get(col), rows.get(i + 3).get(col), "draw " + (i - 1) + " paired");
            Scenario drawn = ScenarioReader.read(PAIR, Overrides.parse(List.of("galaxy.Harl.mass_msun=" + table)),
                    UncertainNumbers.sampling(1, i - 1), Double.NaN);
            assertEquals(Double.toString(drawn.uncertain().get(0).value()), rows.get(i).get(col),
                    "draw s of the sweep is evolve --seed 1 --sample s");
        }
    }
}
