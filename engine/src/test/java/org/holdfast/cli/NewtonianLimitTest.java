package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.holdfast.units.Units;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Near a big rip the Newtonian model lets a member torn away pass the speed of light; evolve
 * records when a member first passed 0.1 c and says so.
 */
@Tag("slow")
class NewtonianLimitTest {

    static final Path PAIR = Path.of("..", "scenarios", "tethered-pair.toml");

    @TempDir
    Path tmp;

    @Test
    void aPhantomRunRecordsWhenAMemberPassedATenthOfC() throws IOException {
        Path out = tmp.resolve("phantom");
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(),
                "--set", "cosmology.dark_energy.w0=-1.5");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        double passed = s.get("newtonian_limit_passed_gyr").asDouble();
        assertEquals("Wrenna", s.get("newtonian_limit_member").asText());
        double kms = s.get("newtonian_limit_kms").asDouble();
        assertTrue(kms > 0.1 * 299792.458 && kms < 0.2 * 299792.458, "speed then: " + kms);
        assertTrue(passed > 0 && passed < s.get("end_gyr").asDouble(), "passed at " + passed);
        assertTrue(r.out().contains("Note: Wrenna moved faster than 0.1 c relative to the centre of mass from t = "),
                r.out());
        // Consistency with tracks.csv (centre-of-mass frame): every snapshot before that time is
        // below 0.1 c, every one after it above (the speed only grows once the member is torn away).
        double limit = Units.NEWTONIAN_LIMIT_FRACTION_OF_C * Units.C_KMS;
        int before = 0;
        int after = 0;
        List<String> rows = Files.readAllLines(out.resolve("tracks.csv"));
        for (String row : rows.subList(1, rows.size())) {
            String[] c = row.split(",");
            if (!c[2].equals("Wrenna")) {
                continue;
            }
            double t = Double.parseDouble(c[0]);
            double rel = relativeSpeedKms(rows, t, c);
            if (t < passed) {
                assertTrue(rel <= limit, "at " + t + " Gyr: " + rel + " km/s");
                before++;
            } else {
                assertTrue(rel > limit, "at " + t + " Gyr: " + rel + " km/s");
                after++;
            }
        }
        assertTrue(before > 10 && after >= 1, before + " snapshots before, " + after + " after");
    }

    /** Wrenna's speed relative to the pair's centre of mass at time t, from the two rows of that time. */
    private static double relativeSpeedKms(List<String> rows, double t, String[] wrenna) {
        for (String row : rows.subList(1, rows.size())) {
            String[] c = row.split(",");
            if (c[2].equals("Harl") && Double.parseDouble(c[0]) == t) {
                double mh = Double.parseDouble(c[9]);
                double mw = Double.parseDouble(wrenna[9]);
                double s2 = 0;
                for (int k = 6; k <= 8; k++) {
                    double vc = (mh * Double.parseDouble(c[k]) + mw * Double.parseDouble(wrenna[k])) / (mh + mw);
                    double d = Double.parseDouble(wrenna[k]) - vc;
                    s2 += d * d;
                }
                return Math.sqrt(s2);
            }
        }
        throw new AssertionError("no Harl row at " + t);
    }

    @Test
    void aCosmologicalConstantRunNeverComesNearIt() throws IOException {
        Path out = tmp.resolve("lambda");
        CommandRunner.Result r = CommandRunner.run("evolve", PAIR.toString(), "--out", out.toString(), "--until", "10");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertTrue(s.has("newtonian_limit_passed_gyr"));
        assertTrue(s.get("newtonian_limit_passed_gyr").isNull());
        assertTrue(s.get("newtonian_limit_member").isNull());
        assertTrue(s.get("newtonian_limit_kms").isNull(), "never passed: " + s.get("newtonian_limit_kms"));
        assertFalse(r.out().contains("Note:"), r.out());
    }
}
