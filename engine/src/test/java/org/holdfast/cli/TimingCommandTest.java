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
    void anAgeOlderThanTheCosmologyIsRefusedNamingTheOption() {
        CommandRunner.Result r = CommandRunner.run(with("--age-gyr", "30"));
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--age-gyr"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertEquals("", r.out());
    }

    @Test
    void aMissingSeparationIsAUsageError() {
        CommandRunner.Result r = CommandRunner.run("timing", "--radial-velocity-kms", "-130", "--h0", "70",
                "--omega-m", "0.3");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--separation-kpc"), r.err());
    }
}
