package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.ToyRunFunction;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The threshold command over the toy physics, whose crossings are known in closed form
 * ({@link ToyRunFunction#criticalW}, {@link ToyRunFunction#ripTimeGyr}). Machinery only.
 */
@Tag("slow")
class ThresholdCommandTest {

    @TempDir
    Path tmp;

    Path scenario;

    @BeforeEach
    void setUp() throws Exception {
        RunFunctions.install(new ToyRunFunction());
        scenario = ToyRunFunction.writeScenario(tmp);
    }

    @AfterEach
    void tearDown() {
        RunFunctions.install(null);
    }

    @Test
    void findsTheToysCriticalWOfAMember() throws Exception {
        CommandRunner.Result r = CommandRunner.run("threshold", scenario.toString(), "--vary",
                "cosmology.dark_energy.w0=-2.0:-1.0", "--member", "Vesk", "--fate", "ripped", "--tolerance", "1e-4",
                "--within-gyr", "200", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        // Runs to 200 Gyr: the toy rip at w = -1.1 comes at 93 Gyr, so the mass threshold decides.
        double wc = ToyRunFunction.criticalW(1e11); // -1.1
        assertTrue(j.get("low").asDouble() <= wc && wc <= j.get("high").asDouble(), r.out());
        assertTrue(j.get("high").asDouble() - j.get("low").asDouble() <= 1e-4, r.out());
        assertEquals(wc, j.get("value").asDouble(), 1e-4);
        assertEquals(1.0, j.get("fraction_at_low_end").asDouble());
        assertEquals(0.0, j.get("fraction_at_high_end").asDouble());
        // Bisection halves [-2, -1] to 1e-4 in about log2(1e4) = 14 steps, plus the two ends.
        int values = j.get("values_evaluated").asInt();
        assertTrue(values >= 14 && values <= 17, "values evaluated: " + values);
        assertEquals(values, j.get("runs").asInt());
    }

    @Test
    void withinATimeTheCrossingMovesToWhereTheRipComesInTime() throws Exception {
        // Toy rip time 28 / (3 |1 + w|) <= 20 Gyr needs w <= -1 - 28/60 = -1.4667, more phantom
        // than the mass threshold -1.2 of the heaviest member, so that one decides.
        CommandRunner.Result r = CommandRunner.run("threshold", scenario.toString(), "--vary",
                "cosmology.dark_energy.w0=-2.0:-1.0", "--member", "Orrimal", "--fate", "ripped", "--within-gyr", "20",
                "--tolerance", "1e-5", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(-1 - 28.0 / 60, j.get("value").asDouble(), 1e-5);
    }

    @Test
    void groupVerdictWithSamplesFindsTheMedianCrossing() throws Exception {
        // With noise ~ N(0, 0.03) the lightest member (w_c = -1.0) is ripped in half of the
        // realisations at w0 = -1.0; "dissolved" needs all three, so the heaviest decides:
        // half of the draws have w0 + noise < -1.2 at w0 = -1.2. 41 samples leave a sampling
        // spread of about 0.03 * 1.25 / sqrt(41) = 0.006 on that median.
        CommandRunner.Result r = CommandRunner.run("threshold", scenario.toString(), "--vary",
                "cosmology.dark_energy.w0=-1.5:-0.9", "--fate", "dissolved", "--samples", "41", "--tolerance", "1e-3",
                "--workers", "2");
        assertEquals(0, r.exitCode(), r.err());
        double value = Double.parseDouble(r.out().lines().filter(l -> l.strip().startsWith("value"))
                .findFirst().orElseThrow().strip().substring(5).strip());
        assertEquals(-1.2, value, 0.02);
        assertTrue(r.out().contains("bracket"), r.out());
    }

    /**
     * A critical curve with 10 paired draws: at each mass the draws' own critical values are
     * c_s = w_c(m) - noise_s, known exactly from the toy; the curve's point is their median and
     * its interval [c_(2), c_(9)], the distribution-free 95% interval for a median of 10
     * (Conover 1999, Practical Nonparametric Statistics, 3rd ed., section 3.2: coverage
     * 1 - 2 P(Bin(10, 1/2) &lt;= 1) = 97.9%).
     */
    @Test
    void aCriticalCurveWithPairedDrawsGivesTheMedianAndItsOrderStatisticInterval() throws Exception {
        Path out = tmp.resolve("curve");
        CommandRunner.Result r = CommandRunner.run("threshold", scenario.toString(), "--vary",
                "cosmology.dark_energy.w0=-1.6:-0.9", "--along", "galaxy.Vesk.mass_msun=1e11,1e12", "--member", "Vesk",
                "--fate", "ripped", "--within-gyr", "200", "--samples", "10", "--tolerance", "1e-4", "--out",
                out.toString(), "--workers", "2");
        assertEquals(0, r.exitCode(), r.err());
        java.util.List<java.util.List<String>> rows = org.holdfast.sweep.SweepFiles.rows(out.resolve("critical-curve.csv"));
        assertEquals(3, rows.size());
        for (java.util.List<String> row : rows.subList(1, 3)) {
            double m = Double.parseDouble(row.get(0));
            double[] c = new double[10];
            for (int s = 0; s < 10; s++) {
                c[s] = ToyRunFunction.criticalW(m) - ToyRunFunction.noise(1, s);
            }
            java.util.Arrays.sort(c);
            double value = Double.parseDouble(row.get(2));
            assertTrue(c[4] - 1e-4 <= value && value <= c[5] + 1e-4, row + " vs " + java.util.Arrays.toString(c));
            assertEquals(c[1], Double.parseDouble(row.get(7)), 1e-4, row.toString());
            assertEquals(c[8], Double.parseDouble(row.get(8)), 1e-4, row.toString());
            assertEquals("10", row.get(9));
        }
        assertEquals(null, org.holdfast.sweep.Threshold.medianLevels95(5), "5 draws are too few for a 95% interval");
        assertEquals(java.util.List.of(1.5 / 10, 8.5 / 10),
                java.util.Arrays.stream(org.holdfast.sweep.Threshold.medianLevels95(10)).boxed().toList());
    }

    @Test
    void badInputIsExitCodeTwo() {
        String s = scenario.toString();
        CommandRunner.Result noChange = CommandRunner.run("threshold", s, "--vary", "cosmology.dark_energy.w0=-0.9:-0.5",
                "--member", "Vesk", "--fate", "ripped");
        assertEquals(Holdfast.EXIT_BAD_INPUT, noChange.exitCode());
        assertTrue(noChange.err().contains("the same at both ends"), noChange.err());
        CommandRunner.Result fate = CommandRunner.run("threshold", s, "--vary", "cosmology.dark_energy.w0=-2:-1",
                "--fate", "ripped");
        assertEquals(Holdfast.EXIT_BAD_INPUT, fate.exitCode());
        assertTrue(fate.err().contains("--fate: ripped: choose one of bound, partly-bound, dissolved"), fate.err());
        CommandRunner.Result member = CommandRunner.run("threshold", s, "--vary", "cosmology.dark_energy.w0=-2:-1",
                "--member", "Nobody", "--fate", "ripped");
        assertEquals(Holdfast.EXIT_BAD_INPUT, member.exitCode());
        assertTrue(member.err().contains("--member: Nobody: no such member"), member.err());
        CommandRunner.Result range = CommandRunner.run("threshold", s, "--vary", "cosmology.dark_energy.w0=-1:-2",
                "--fate", "bound");
        assertEquals(Holdfast.EXIT_BAD_INPUT, range.exitCode());
        for (String t : new String[] {"-5", "0"}) {
            CommandRunner.Result past = CommandRunner.run("threshold", s, "--vary", "cosmology.dark_energy.w0=-2:-1",
                    "--member", "Vesk", "--fate", "ripped", "--within-gyr", t);
            assertEquals(Holdfast.EXIT_BAD_INPUT, past.exitCode(), past.err());
            assertEquals(1, past.err().strip().lines().count(), past.err());
            assertTrue(past.err().contains("--within-gyr: must be later than the runs' start (0.000 Gyr from today)"),
                    past.err());
        }
        CommandRunner.Result end = CommandRunner.run("threshold", s, "--vary", "galaxy.Vesk.mass_msun=-1e11:1e11",
                "--member", "Vesk", "--fate", "ripped");
        assertEquals(Holdfast.EXIT_BAD_INPUT, end.exitCode(), end.err());
        assertTrue(end.err().contains("--vary: galaxy.Vesk.mass_msun: must be > 0"), end.err());
    }
}
