package org.holdfast.uncertain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.junit.jupiter.api.Test;

/** Reading uncertain numbers through the scenario schema layer. */
class UncertainNumbersTest {

    private static final Path FILE = Path.of("uncertain.toml");

    private static final String GROUP = String.join("\n",
            "[[galaxy]]",
            "name = \"Ossel\"",
            "mass_msun = { median = 1.5e12, sigma_dex = 0.2 }",
            "speed_kms = { mean = 770, sigma = 40 }",
            "w = { min = -1.3, max = -0.7 }",
            "plain = 3",
            "velocity_kms = [ { mean = 10, sigma = 1 }, 20, { mean = 10, sigma = 1 } ]",
            "");

    private static Node galaxy(String text, UncertainNumbers reader) {
        return ScenarioFile.parse(FILE, text, Overrides.none(), reader).tables("galaxy", "name").get(0);
    }

    @Test
    void centralReaderUsesMeanMedianAndMidPointAndSaysSo() {
        UncertainNumbers reader = UncertainNumbers.central();
        Node g = galaxy(GROUP, reader);
        assertEquals(1.5e12, g.positive("mass_msun"));
        assertEquals(770, g.number("speed_kms"));
        assertEquals(-1.0, g.number("w"), 1e-15);
        assertEquals(3, g.number("plain"));
        assertArrayEquals(new double[] {10, 20, 10}, g.vector("velocity_kms", 3));
        List<String> paths = reader.used().stream().map(UncertainValue::path).toList();
        assertEquals(List.of("galaxy.Ossel.mass_msun", "galaxy.Ossel.speed_kms", "galaxy.Ossel.w",
                "galaxy.Ossel.velocity_kms.0", "galaxy.Ossel.velocity_kms.2"), paths);
        assertTrue(reader.summary().startsWith("used central values for 5 uncertain values: "
                + "galaxy.Ossel.mass_msun = 1.5e+12 (log-normal(median 1.5e+12, sigma 0.2 dex))"),
                reader.summary());
        assertTrue(reader.warnings().isEmpty());
    }

    @Test
    void sameSeedAndDrawGiveTheSameScenarioWhateverTheReadingOrder() {
        UncertainNumbers a = UncertainNumbers.sampling(42, 7);
        Node ga = galaxy(GROUP, a);
        double massA = ga.positive("mass_msun");
        double speedA = ga.number("speed_kms");
        double[] velA = ga.vector("velocity_kms", 3);

        UncertainNumbers b = UncertainNumbers.sampling(42, 7);
        Node gb = galaxy(GROUP, b);
        double[] velB = gb.vector("velocity_kms", 3);
        double speedB = gb.number("speed_kms");
        double massB = gb.positive("mass_msun");

        assertEquals(massA, massB);
        assertEquals(speedA, speedB);
        assertArrayEquals(velA, velB);
        // Two components with the same distribution still get independent draws.
        assertNotEquals(velA[0], velA[2]);
        assertNotEquals(1.5e12, massA);

        Node gc = galaxy(GROUP, UncertainNumbers.sampling(42, 8));
        assertNotEquals(massA, gc.positive("mass_msun"));
    }

    @Test
    void sigmaBelowZeroNamesFileLineAndKey() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\n\nspeed_kms = { mean = 770, sigma = -40 }\n",
                        UncertainNumbers.central()).number("speed_kms"));
        assertEquals("uncertain.toml:4", e.where());
        assertEquals("galaxy.Ossel.speed_kms", e.key());
        assertTrue(e.getMessage().contains("sigma must be >= 0"), e.getMessage());
    }

    @Test
    void minAboveMaxIsRefused() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nw = { min = -0.7, max = -1.3 }\n",
                        UncertainNumbers.sampling(1, 0)).number("w"));
        assertEquals("uncertain.toml:3", e.where());
        assertEquals("galaxy.Ossel.w", e.key());
        assertTrue(e.getMessage().contains("min must not exceed max"), e.getMessage());
    }

    @Test
    void unknownFormListsTheKnownOnes() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nw = { mean = -1, sd = 0.1 }\n",
                        UncertainNumbers.central()).number("w"));
        assertEquals("galaxy.Ossel.w", e.key());
        assertTrue(e.getMessage().contains("{ median = M, sigma_dex = S } (log-normal)"), e.getMessage());
    }

    @Test
    void aVectorComponentErrorSaysWhichComponent() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nv = [1, { mean = 2, sigma = -1 }, 3]\n",
                        UncertainNumbers.central()).vector("v", 3));
        assertEquals("uncertain.toml:3", e.where());
        assertTrue(e.getMessage().contains("v component 1: sigma must be >= 0"), e.getMessage());
    }

    @Test
    void aNormalMassWithAppreciableNegativeWeightIsRefused() {
        // P(x <= 0) for mean 1e12, sigma 5e11 is Phi(-2) = 2.275% (standard normal table, e.g.
        // Abramowitz and Stegun 1964, Handbook of Mathematical Functions, Table 26.1).
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nmass_msun = { mean = 1e12, sigma = 5e11 }\n",
                        UncertainNumbers.central()).positive("mass_msun"));
        assertEquals("uncertain.toml:3", e.where());
        assertEquals("galaxy.Ossel.mass_msun", e.key());
        assertTrue(e.getMessage().contains("probability 2.3%"), e.getMessage());
        assertTrue(e.getMessage().contains("use a log-normal"), e.getMessage());
    }

    @Test
    void aSmallNegativeWeightIsAcceptedWithAWarningAndDrawsStayPositive() {
        // Phi(-4) = 3.17e-5 (Abramowitz and Stegun 1964, Table 26.1): between 1e-6 and 1e-3.
        UncertainNumbers reader = UncertainNumbers.sampling(5, 3);
        Node g = galaxy("[[galaxy]]\nname = \"Ossel\"\ndistance_kpc = { mean = 400, sigma = 100 }\n", reader);
        assertTrue(g.positive("distance_kpc") > 0);
        assertEquals(1, reader.warnings().size());
        assertTrue(reader.warnings().get(0).startsWith("uncertain.toml:3: galaxy.Ossel.distance_kpc: "),
                reader.warnings().get(0));
        assertTrue(reader.warnings().get(0).contains("0.0032%"), reader.warnings().get(0));
    }

    @Test
    void aUniformReachingZeroIsRefusedForAPositiveKey() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nmass_msun = { min = -1e11, max = 9e11 }\n",
                        UncertainNumbers.central()).positive("mass_msun"));
        assertTrue(e.getMessage().contains("probability 10%"), e.getMessage());
    }

    @Test
    void aLogNormalNeedsAPositiveMedian() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> galaxy("[[galaxy]]\nname = \"Ossel\"\nw = { median = -1, sigma_dex = 0.1 }\n",
                        UncertainNumbers.central()).number("w"));
        assertTrue(e.getMessage().contains("median > 0"), e.getMessage());
    }
}
