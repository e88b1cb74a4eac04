package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.holdfast.cli.CommandRunner;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Sweeps with the real engine on the shipped tethered pair: a wide circular binary whose fate
 * depends on w. With a cosmological constant the effective potential keeps a fixed barrier
 * and a circular orbit inside it stays bound for ever; with phantom dark energy k(t) grows
 * without bound and every orbit is torn open before the big rip (Caldwell, Kamionkowski &amp;
 * Weinberg 2003, PRL 91, 071301), so the fraction ripped within a fixed time must rise from 0
 * at w = -1 to 1 at strongly phantom w.
 */
@Tag("slow")
class EngineSweepTest {

    static final Path PAIR = Path.of("..", "scenarios", "tethered-pair.toml");

    @TempDir
    static Path dir;

    static JsonNode threshold;

    @BeforeAll
    static void findTheThreshold() throws IOException {
        RunFunctions.install(null);
        CommandRunner.Result r = CommandRunner.run("threshold", PAIR.toString(),
                "--vary", "cosmology.dark_energy.w0=-1.3:-1.0", "--member", "Wrenna", "--fate", "ripped",
                "--within-gyr", "60", "--tolerance", "0.002", "--json");
        assertEquals(0, r.exitCode(), r.err());
        threshold = new ObjectMapper().readTree(r.out());
    }

    @Test
    void theFractionRippedRisesFromNoneToAll() throws IOException {
        Path out = dir.resolve("w");
        CommandRunner.Result r = CommandRunner.run("sweep", PAIR.toString(),
                "--vary", "cosmology.dark_energy.w0=-1.0,-1.2,-1.5", "--until", "60", "--workers", "2",
                "--out", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<String> rows = Files.readAllLines(out.resolve("fractions.csv"));
        assertTrue(rows.contains("0,-1.0,member,Wrenna,ripped,0,1,0.000000,0.000000,0.793451"), rows.toString());
        assertTrue(rows.stream().anyMatch(l -> l.startsWith("1,-1.2,member,Wrenna,ripped,1,1,1.000000")), rows.toString());
        assertTrue(rows.stream().anyMatch(l -> l.startsWith("2,-1.5,member,Wrenna,ripped,1,1,1.000000")), rows.toString());
    }

    @Test
    void thresholdBracketsTheCrossingAndDirectRunsOnEitherSideAgree() throws IOException {
        double lo = threshold.get("low").asDouble();
        double hi = threshold.get("high").asDouble();
        assertTrue(lo < hi && hi - lo <= 0.002, threshold.toString());
        assertTrue(lo > -1.3 && hi < -1.0, threshold.toString());
        assertEquals("ripped", fateOfWrenna(lo - 0.003));
        assertEquals("bound", fateOfWrenna(hi + 0.003));
    }

    private static String fateOfWrenna(double w0) throws IOException {
        Path out = dir.resolve("evolve" + w0);
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--quiet",
                "--set", "cosmology.dark_energy.w0=" + w0, "--until", "60", "--out", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        for (JsonNode m : s.get("members")) {
            if (m.get("name").asText().equals("Wrenna")) {
                return m.get("fate").asText();
            }
        }
        throw new AssertionError("no Wrenna in " + s);
    }
}
