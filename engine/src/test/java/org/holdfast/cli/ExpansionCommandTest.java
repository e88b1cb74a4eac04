package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

@Tag("slow")
class ExpansionCommandTest {

    /** The shipped scenarios, from the engine module's folder where Surefire runs. */
    private static final Path SCENARIOS = Path.of("..", "scenarios");

    @TempDir
    Path dir;

    private static JsonNode json(CommandRunner.Result r) throws IOException {
        assertEquals(0, r.exitCode(), r.err());
        return new ObjectMapper().readTree(r.out());
    }

    /**
     * The rip ladder: the scenario's own pair as the group (1.6e12 Msun, 400 kpc apart), then a
     * galaxy, a solar system, a planet, an atom; the rough rule is Caldwell, Kamionkowski &amp;
     * Weinberg 2003's P sqrt(2|1+3w|)/(6 pi |1+w|), a factor 0.2807 of the period for w = -1.5.
     */
    @Test
    void phantomPairGetsTheRipLadder() throws IOException {
        JsonNode j = json(CommandRunner.run("expansion", SCENARIOS.resolve("tethered-pair.toml").toString(),
                "--set", "cosmology.dark_energy.w0=-1.5", "--json"));
        JsonNode ladder = j.get("rip_ladder");
        assertEquals(5, ladder.size());
        assertEquals("group", ladder.get(0).get("system").asText());
        assertEquals(1.6e12, ladder.get(0).get("mass_msun").asDouble(), 1);
        assertEquals(400, ladder.get(0).get("radius_kpc").asDouble(), 1e-9);
        double rip = j.get("rip_gyr").asDouble();
        for (JsonNode r : ladder) {
            assertEquals(0.2807, r.get("ckw2003_before_rip_gyr").asDouble() / r.get("period_gyr").asDouble(), 1e-4);
            assertEquals(rip, r.get("ckw2003_gyr").asDouble() + r.get("ckw2003_before_rip_gyr").asDouble(), 1e-12);
        }
        JsonNode atom = ladder.get(4);
        assertEquals("atom", atom.get("system").asText());
        assertEquals("order of magnitude", atom.get("estimate").asText());
        assertTrue(atom.get("holdfast_before_rip_gyr").isNull());
        String text = CommandRunner.run("expansion", SCENARIOS.resolve("tethered-pair.toml").toString(),
                "--set", "cosmology.dark_energy.w0=-1.5").out();
        assertTrue(text.contains("Rip ladder") && text.contains("order of magnitude"), text);
        // no rip, no ladder
        JsonNode lambda = json(CommandRunner.run("expansion", SCENARIOS.resolve("lambda-steady.toml").toString(),
                "--json"));
        assertTrue(lambda.get("rip_ladder").isNull());
    }

    /** H0 = 70, Om = 0.3 flat Lambda: 13.467 Gyr (Carroll, Press &amp; Turner 1992 closed form; see ClosedFormHistoriesTest). */
    @Test
    void lambdaScenarioGivesTheKnownAge() throws IOException {
        JsonNode j = json(CommandRunner.run("expansion", SCENARIOS.resolve("lambda-steady.toml").toString(), "--json"));
        assertEquals(13.467, j.get("age_gyr").asDouble(), 5e-4);
        assertTrue(j.get("rip_gyr").isNull());
        assertTrue(j.get("crunch_gyr").isNull());
        assertEquals(-0.55, j.get("q0").asDouble(), 1e-12);
        assertTrue(j.get("acceleration_began_gyr").asDouble() < 0);
        assertTrue(j.get("samples").size() > 3);
    }

    /** w = -1.5: rip 21.68 Gyr from today (Caldwell, Kamionkowski &amp; Weinberg 2003, exact integral; BigRipTest). */
    @Test
    void phantomScenarioReportsTheRipAndSamplesWhereAsked() throws IOException {
        JsonNode j = json(CommandRunner.run("expansion", SCENARIOS.resolve("phantom-tide.toml").toString(),
                "--json", "--at", "-5,0,10"));
        assertEquals(21.68, j.get("rip_gyr").asDouble(), 0.006);
        JsonNode s = j.get("samples");
        assertEquals(3, s.size());
        assertEquals(-5, s.get(0).get("t_gyr").asDouble());
        assertEquals(1.0, s.get(1).get("a").asDouble(), 1e-12);
        assertEquals(70.0, s.get(1).get("h_kms_mpc").asDouble(), 1e-9);
        // k today = -(1/2) H0^2 Omega_de (1 + 3w) (the interface's definition)
        double h0 = 70 / 977.792;
        assertEquals(-0.5 * h0 * h0 * 0.7 * (1 - 4.5), s.get(1).get("de_accel_per_gyr2").asDouble(), 1e-5 * 0.0063);
        assertTrue(s.get(2).get("a").asDouble() > 1);
    }

    @Test
    void tableScenarioAndOptionsAgree() throws IOException {
        JsonNode file = json(CommandRunner.run("expansion", SCENARIOS.resolve("drifting-w.toml").toString(), "--json"));
        JsonNode opts = json(CommandRunner.run("expansion", "--h0", "68", "--omega-m", "0.31", "--omega-r", "cmb",
                "--w-table", SCENARIOS.resolve("drifting-w.csv").toString(), "--json"));
        assertEquals(file.get("age_gyr").asDouble(), opts.get("age_gyr").asDouble(), 0);
        assertFalse(file.get("rip_gyr").isNull(), "w is held at -1.2 beyond the table: a rip");
    }

    @Test
    void readableTableNamesTheLandmarks() {
        CommandRunner.Result r = CommandRunner.run("expansion", "--h0", "70", "--omega-m", "2", "--omega-k", "-1");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("maximum expansion") && r.out().contains("big crunch"), r.out());
        assertTrue(r.out().contains("age"), r.out());
    }

    @Test
    void overridesReachTheCosmology() throws IOException {
        JsonNode j = json(CommandRunner.run("expansion", SCENARIOS.resolve("lambda-steady.toml").toString(),
                "--set", "cosmology.omega_m=1", "--set", "cosmology.omega_k=0", "--json"));
        // Einstein–de Sitter, t0 = 2/(3 H0) (common practice) -- Omega_de = 1 - 1 - 0 - 0 = 0
        assertEquals(2.0 / 3 * 977.792 / 70, j.get("age_gyr").asDouble(), 1e-4);
    }

    @Test
    void plotIsAPngAndABadNameWritesNothing() throws IOException {
        Path png = dir.resolve("a.png");
        CommandRunner.Result r = CommandRunner.run("expansion", SCENARIOS.resolve("phantom-tide.toml").toString(),
                "--plot", png.toString());
        assertEquals(0, r.exitCode(), r.err());
        byte[] head = Files.readAllBytes(png);
        assertTrue(head.length > 1000 && head[1] == 'P' && head[2] == 'N' && head[3] == 'G');
        Path bad = dir.resolve("a.jpg");
        CommandRunner.Result b = CommandRunner.run("expansion", SCENARIOS.resolve("phantom-tide.toml").toString(),
                "--plot", bad.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, b.exitCode());
        assertTrue(b.err().contains("--plot"), b.err());
        assertFalse(Files.exists(bad));
    }

    private CommandRunner.Result withFile(String name, String text, String... more) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        String[] args = new String[more.length + 2];
        args[0] = "expansion";
        args[1] = f.toString();
        System.arraycopy(more, 0, args, 2, more.length);
        return CommandRunner.run(args);
    }

    private static void oneLineError(CommandRunner.Result r, String... mustContain) {
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), r.out() + r.err());
        String err = r.err().strip();
        assertEquals(1, err.lines().count(), err);
        assertFalse(err.contains("Exception"), err);
        for (String s : mustContain) {
            assertTrue(err.contains(s), "'" + s + "' missing from: " + err);
        }
        assertTrue(r.out().isEmpty(), "nothing half-written: " + r.out());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--h0|abc|--h0",
        "--h0|-70|--h0",
        "--omega-m|-0.2|--omega-m",
        "--omega-r|lots|--omega-r",
        "--w0|-1.5e400|--w0"
    })
    void malformedOptionsAreOneLine(String option, String value, String named) {
        String[] args = option.equals("--h0")
                ? new String[] {"expansion", "--h0", value, "--omega-m", "0.3"}
                : new String[] {"expansion", "--h0", "70", "--omega-m", "0.3", option, value};
        if (option.equals("--omega-m")) {
            args = new String[] {"expansion", "--h0", "70", "--omega-m", value};
        }
        oneLineError(CommandRunner.run(args), named);
    }

    @Test
    void missingOptionsAndTimesPastTheRipAreOneLine() {
        oneLineError(CommandRunner.run("expansion", "--omega-m", "0.3"), "--h0");
        oneLineError(CommandRunner.run("expansion", "--h0", "70", "--omega-m", "0.3", "--w0", "-1.5", "--at", "0,30"),
                "--at", "big rip");
        oneLineError(CommandRunner.run("expansion", "--h0", "70", "--omega-m", "0.3", "--at", "-20"),
                "--at", "before the Big Bang");
        oneLineError(CommandRunner.run("expansion", "--h0", "70", "--omega-m", "0.3", "--no-such"), "--no-such");
        oneLineError(CommandRunner.run("expansion", "--h0", "70", "--omega-m", "0.01", "--omega-k", "-1.5"),
                "no Big Bang");
    }

    @Test
    void badScenarioFilesNameFileLineAndKey() throws IOException {
        oneLineError(withFile("typo.toml", "name = \"x\"\n[cosmology]\nh0 = 70\nomega_n = 0.3\n"),
                "typo.toml:4", "cosmology.omega_n", "did you mean 'omega_m'");
        oneLineError(withFile("neg.toml", "[cosmology]\nh0 = -70\nomega_m = 0.3\n"), "neg.toml:2", "cosmology.h0");
        oneLineError(withFile("cmb.toml", "[cosmology]\nh0 = 70\nomega_m = 0.3\nomega_r = \"cmbb\"\n"),
                "cmb.toml:4", "cosmology.omega_r");
        oneLineError(withFile("str.toml", "[cosmology]\nh0 = \"seventy\"\nomega_m = 0.3\n"), "str.toml:2", "expected a number");
        oneLineError(withFile("none.toml", "name = \"x\"\n"), "none.toml", "[cosmology]");
        oneLineError(withFile("both.toml", "[cosmology]\nh0 = 70\nomega_m = 0.3\n[cosmology.dark_energy]\nw0 = -1\n"
                + "table = \"w.csv\"\n"), "both.toml:6", "cosmology.dark_energy.table");
        oneLineError(withFile("miss.toml", "[cosmology]\nh0 = 70\nomega_m = 0.3\n[cosmology.dark_energy]\n"
                + "table = \"nowhere.csv\"\n"), "miss.toml:5", "no such w(a) table");
        oneLineError(withFile("bounce.toml", "[cosmology]\nh0 = 70\nomega_m = 0.01\nomega_k = -1.5\n"),
                "bounce.toml:1", "no Big Bang");
        oneLineError(withFile("syntax.toml", "[cosmology\nh0 = 70\n"), "syntax.toml:1", "TOML");
        oneLineError(withFile("set.toml", "[cosmology]\nh0 = 70\nomega_m = 0.3\n", "--set", "cosmology.h1=3"),
                "--set", "cosmology.h1");
    }

    @Test
    void badWTablesNameFileAndLine() throws IOException {
        Path scenario = dir.resolve("t.toml");
        Files.writeString(scenario, "[cosmology]\nh0 = 70\nomega_m = 0.3\n[cosmology.dark_energy]\ntable = \"w.csv\"\n");
        Path csv = dir.resolve("w.csv");
        Files.writeString(csv, "a,w\n0.5,-1\n0.8,minus one\n2,-1\n");
        oneLineError(CommandRunner.run("expansion", scenario.toString()), "w.csv:3", "expected a number");
        Files.writeString(csv, "a,w\n0.5,-1\n0.4,-1\n2,-1\n");
        oneLineError(CommandRunner.run("expansion", scenario.toString()), "w.csv:3", "increase");
        Files.writeString(csv, "a,w\n0.5,-1\n0.8,-1\n");
        oneLineError(CommandRunner.run("expansion", scenario.toString()), "w.csv", "past and future");
        Files.writeString(csv, "scale,eos\n0.5,-1\n2,-1\n");
        oneLineError(CommandRunner.run("expansion", scenario.toString()), "w.csv:1", "header");
    }
}
