package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** {@code holdfast timing} end to end. */
@Tag("slow")
class TimingCommandTest {

    private static final String[] PAIR = {"timing", "--separation-kpc", "784", "--radial-velocity-kms", "-130",
        "--h0", "70", "--omega-m", "0.2", "--omega-k", "0.1"};

    private static String[] with(String... more) {
        String[] all = java.util.Arrays.copyOf(PAIR, PAIR.length + more.length);
        System.arraycopy(more, 0, all, PAIR.length, more.length);
        return all;
    }

    @Test
    void jsonGivesBothMassesThePhaseAndTheTurnaround() throws Exception {
        CommandRunner.Result r = CommandRunner.run(with("--age-gyr", "13.73", "--json"));
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        // Kahn & Woltjer 1959 (from memory) radial Kepler solution for these inputs: 5.32e12 Msun, eta = 4.2777 rad
        assertEquals(5.32e12, j.get("mass_msun_no_dark_energy").asDouble(), 0.01 * 5.32e12);
        assertEquals(4.2777, j.get("eta_rad").asDouble(), 2e-3);
        // with the Lambda force (Omega_Lambda = 0.7, h = 0.7) 6.03e12 Msun; Partridge, Lahav & Hoffman 2013: ~13% more
        assertEquals(6.03e12, j.get("mass_msun").asDouble(), 0.01 * 6.03e12);
        assertTrue(j.get("max_separation_kpc").asDouble() > 784);
    }

    @Test
    void theDefaultAgeIsTheCosmologysOwn() throws Exception {
        // As the README runs it: flat H0 = 70, Omega_m = 0.3, no --age-gyr (13.467 Gyr).
        CommandRunner.Result r = CommandRunner.run("timing", "--separation-kpc", "784", "--radial-velocity-kms",
                "-130", "--h0", "70", "--omega-m", "0.3", "--json");
        assertEquals(0, r.exitCode(), r.err());
        com.fasterxml.jackson.databind.JsonNode j = new com.fasterxml.jackson.databind.ObjectMapper().readTree(r.out());
        // A younger universe needs more mass than the 5.32e12 Msun of t = 13.73 Gyr (Kahn & Woltjer
        // 1959: M ~ r^3 / (G t^2 f(eta))), and the dark-energy force raises it by about 13%
        // (Partridge, Lahav & Hoffman 2013).
        double m = j.get("mass_msun").asDouble();
        double m0 = j.get("mass_msun_no_dark_energy").asDouble();
        org.junit.jupiter.api.Assertions.assertTrue(m0 > 5.32e12, "no-DE mass " + m0);
        org.junit.jupiter.api.Assertions.assertEquals(1.13, m / m0, 0.02);
    }

    @Test
    void anAgeOlderThanTheCosmologyKeepsTheClassicalMassAndRefusesTheDarkEnergyOnes() throws Exception {
        CommandRunner.Result r = CommandRunner.run(with("--age-gyr", "30", "--json"));
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertTrue(j.get("mass_msun").isNull());
        assertTrue(j.get("backgrounds").get("dark_energy").get("refused").asText().contains("age"));
        assertTrue(j.get("backgrounds").get("full").get("refused").asText().contains("age"));
        // the classical radial mass takes any age (Kahn & Woltjer 1959 closed form, from memory)
        double m = org.holdfast.weighing.KeplerTiming.solve(new org.holdfast.weighing.PairMotion(784, -130, 0, 30))
                .massMsun();
        assertEquals(m, j.get("mass_msun_no_dark_energy").asDouble(), 1e-6 * m);
    }

    @Test
    void tangentialMotionGivesAnEccentricOrbit() throws Exception {
        CommandRunner.Result r = CommandRunner.run(with("--age-gyr", "13.73", "--tangential-velocity-kms", "50",
                "--json"));
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode none = j.get("backgrounds").get("none");
        assertTrue(none.get("eccentricity").asDouble() < 1 && none.get("eccentricity").asDouble() > 0.5);
        assertTrue(none.get("pericentre_kpc").asDouble() > 0);
        assertTrue(none.get("mass_msun").asDouble() > 5.32e12);
    }

    @Test
    void drawsAreTheSameOnAnyThreadCountAndWriteTheirFiles(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        java.nio.file.Path f = dir.resolve("pair.toml");
        java.nio.file.Files.writeString(f, """
                [pair]
                separation_kpc = { mean = 690, sigma = 35 }
                radial_velocity_kms = { mean = -95, sigma = 6 }
                tangential_velocity_kms = { min = 0, max = 40 }
                age_gyr = { mean = 13.2, sigma = 0.05 }
                [cosmology]
                h0 = 70.0
                omega_m = { mean = 0.3, sigma = 0.01 }
                [independent_mass]
                mass_msun = 3.0e12
                sigma_msun = 0.8e12
                """);
        CommandRunner.Result one = CommandRunner.run("timing", f.toString(), "--samples", "12", "--seed", "5",
                "--threads", "1", "--out", dir.resolve("a").toString());
        CommandRunner.Result two = CommandRunner.run("timing", f.toString(), "--samples", "12", "--seed", "5",
                "--threads", "2", "--out", dir.resolve("b").toString());
        assertEquals(0, one.exitCode(), one.err());
        assertEquals(0, two.exitCode(), two.err());
        String a = java.nio.file.Files.readString(dir.resolve("a/draws.csv"));
        assertEquals(a, java.nio.file.Files.readString(dir.resolve("b/draws.csv")));
        assertEquals(13, a.strip().lines().count());
        for (String png : new String[] {"mass-histogram.png", "orbit.png", "bound.png"}) {
            assertTrue(java.nio.file.Files.size(dir.resolve("a").resolve(png)) > 1000, png);
        }
        JsonNode s = new ObjectMapper().readTree(dir.resolve("a/summary.json").toFile());
        JsonNode de = s.get("samples").get("dark_energy");
        assertTrue(de.get("lo68_msun").asDouble() < de.get("median_msun").asDouble()
                && de.get("median_msun").asDouble() < de.get("hi68_msun").asDouble());
        assertTrue(s.get("dark_energy_bound").get("upper95").asDouble() > 0);
        // another seed gives other draws
        CommandRunner.Result other = CommandRunner.run("timing", f.toString(), "--samples", "12", "--seed", "6",
                "--out", dir.resolve("c").toString());
        assertEquals(0, other.exitCode(), other.err());
        assertTrue(!a.equals(java.nio.file.Files.readString(dir.resolve("c/draws.csv"))));
    }

    @Test
    void aBadKeyInTheWeighingFileIsOneLineNamingFileLineAndKey(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        java.nio.file.Path f = dir.resolve("pair.toml");
        java.nio.file.Files.writeString(f, "[pair]\nseparation_kpc = 700\nradial_velocty_kms = -100\nage_gyr = 13\n");
        CommandRunner.Result r = CommandRunner.run("timing", f.toString(), "--out", dir.resolve("o").toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("pair.toml:3") && r.err().contains("radial_velocty_kms"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(!java.nio.file.Files.exists(dir.resolve("o")));
    }

    @Test
    void theFlowFitRecoversTheDemoGroupsMass(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        // scenarios/brisk-flow.csv was drawn from 3e12 Msun with Lambda (H0 70, Omega_m 0.3) and 25 km/s scatter
        CommandRunner.Result r = CommandRunner.run("timing", "flow", "../scenarios/brisk-flow.csv", "--h0", "70",
                "--omega-m", "0.3", "--scatter-kms", "25", "--json", "--out", dir.resolve("f").toString());
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode m = j.get("mass_msun");
        assertTrue(m.get("lo95").asDouble() < 3e12 && m.get("hi95").asDouble() > 3e12, r.out());
        assertTrue(java.nio.file.Files.size(dir.resolve("f/flow.png")) > 1000);
    }

    @Test
    void aMissingSeparationIsAUsageError() {
        CommandRunner.Result r = CommandRunner.run("timing", "--radial-velocity-kms", "-130", "--h0", "70",
                "--omega-m", "0.3");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--separation-kpc"), r.err());
    }
    @Test
    void theFlowFitReadsAScenarioSectionAndNamesItsBadKeys(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        CommandRunner.Result r = CommandRunner.run("timing", "flow", "../scenarios/brisk-flow.toml", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(25, j.get("scatter_kms").asDouble(), 0);
        assertEquals("dark_energy", j.get("background").asText());
        java.nio.file.Path f = dir.resolve("flow.toml");
        java.nio.file.Files.writeString(f, "[cosmology]\nh0 = 70.0\nomega_m = 0.3\n[flow]\ngalaxies = \"x.csv\"\nscater_kms = 3\n");
        CommandRunner.Result bad = CommandRunner.run("timing", "flow", f.toString());
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().contains("flow.toml:6") && bad.err().contains("scater_kms"), bad.err());
    }
}
