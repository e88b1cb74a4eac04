package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;

/** {@code holdfast timing} end to end. */
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
