package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.holdfast.schema.Node;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.uncertain.UncertainNumbers;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/** Reading {@code observed = { ... }} and {@code [observer]}, and what their errors name. */
class ObservedReaderTest {

    private static final Path FILE = Path.of("sky.toml");

    private static Node galaxy(String lines, NumberReader numbers) {
        return ScenarioFile.parse(FILE, "[[galaxy]]\nname = \"Vell\"\n" + lines + "\n", Overrides.none(), numbers)
                .tables("galaxy", "name").get(0).requireTable("observed");
    }

    private static ScenarioException error(String lines) {
        return assertThrows(ScenarioException.class, () -> ObservedReader.read(galaxy(lines, NumberReader.PLAIN)));
    }

    @Test
    void icrsMemberReadsAsGiven() {
        ObservedMember m = ObservedReader.read(galaxy("observed = { ra_deg = 10.5, dec_deg = -40.25,"
                + " distance_kpc = 700, v_los_kms = -120, pm_ra_mas_yr = 0.05, pm_dec_mas_yr = -0.02 }",
                NumberReader.PLAIN));
        assertEquals(10.5, m.raDeg());
        assertEquals(-40.25, m.decDeg());
        assertEquals(700, m.distanceKpc());
        assertEquals(-120, m.vLosKms());
        assertTrue(m.hasProperMotion());
        assertTrue(m.warnings().isEmpty());
        assertEquals("galaxy.Vell.observed", m.path());
    }

    @Test
    void galacticPositionIsTurnedIntoTheSameDirection() {
        // l, b and RA, Dec of one direction are related by the Hipparcos rotation (ESA 1997,
        // sec. 1.5.3): reading l = 320, b = -45 must give back its worked-example RA and Dec
        // within the 1e-5 deg the example is rounded to.
        ObservedMember m = ObservedReader.read(galaxy("observed = { l_deg = 320, b_deg = -45,"
                + " distance_kpc = 700, v_los_kms = 0 }", NumberReader.PLAIN));
        assertEquals(339.98212, m.raDeg(), 1e-5);
        assertEquals(-67.52233, m.decDeg(), 1e-5);
        Vector3d u = GalacticRotation.unitVector(m.raDeg(), m.decDeg(), new Vector3d());
        assertEquals(1.0, u.length(), 1e-15);
    }

    @Test
    void distanceModulusFollowsItsDefinition() {
        // mu = 5 log10(d / 10 pc) (definition of the distance modulus; common practice):
        // mu = 10 is 1 kpc, mu = 25 is 1000 kpc, mu = 24.5 is 10^2.9 kpc.
        assertEquals(1.0, ObservedReader.kpcFromModulus(10), 1e-15);
        assertEquals(1000.0, ObservedReader.kpcFromModulus(25), 1e-12);
        ObservedMember m = ObservedReader.read(galaxy("observed = { ra_deg = 1, dec_deg = 2,"
                + " distance_modulus = 24.5, v_los_kms = 0 }", NumberReader.PLAIN));
        assertEquals(Math.pow(10, 2.9), m.distanceKpc(), 1e-10);
    }

    @Test
    void missingProperMotionGivesAStatedAssumptionNotASilentZero() {
        ObservedMember m = ObservedReader.read(galaxy("\nobserved = { ra_deg = 1, dec_deg = 2,"
                + " distance_kpc = 300, v_los_kms = 50 }", NumberReader.PLAIN));
        assertFalse(m.hasProperMotion());
        assertEquals(1, m.warnings().size());
        assertEquals("sky.toml:4: galaxy.Vell.observed: no proper motion given; assumed no motion across"
                + " the line of sight relative to the home galaxy's centre", m.warnings().get(0));
    }

    @Test
    void oneProperMotionWithoutTheOtherIsAnError() {
        ScenarioException e = error("observed = { ra_deg = 1, dec_deg = 2, distance_kpc = 300,"
                + " v_los_kms = 50, pm_ra_mas_yr = 0.1 }");
        assertEquals("sky.toml:3", e.where());
        assertEquals("galaxy.Vell.observed.pm_ra_mas_yr", e.key());
        assertTrue(e.getMessage().contains("needs pm_dec_mas_yr as well"), e.getMessage());
    }

    @Test
    void twoSkyPositionsAreAnError() {
        ScenarioException e = error("[galaxy.observed]\nra_deg = 1\ndec_deg = 2\nl_deg = 3\nb_deg = 4\n"
                + "distance_kpc = 300\nv_los_kms = 50");
        assertEquals("sky.toml:6", e.where());
        assertEquals("galaxy.Vell.observed.l_deg", e.key());
    }

    @Test
    void twoSkyPositionsNameTheOneThatComesSecond() {
        ScenarioException e = error("[galaxy.observed]\nb_deg = 4\nl_deg = 3\ndec_deg = 2\n"
                + "distance_kpc = 300\nv_los_kms = 50");
        assertEquals("sky.toml:6", e.where());
        assertEquals("galaxy.Vell.observed.dec_deg", e.key());
    }

    @Test
    void anObservedMemberWithoutAnObserverIsAnError() {
        Node root = ScenarioFile.parse(FILE, "[[galaxy]]\nname = \"Vell\"\nobserved = { ra_deg = 1 }\n",
                Overrides.none(), NumberReader.PLAIN);
        Node observed = root.tables("galaxy", "name").get(0).requireTable("observed");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ObserverReader.forObserved(root, observed));
        assertEquals("sky.toml:3", e.where());
        assertEquals("galaxy.Vell.observed", e.key());
        assertTrue(e.getMessage().contains("needs an [observer] table"), e.getMessage());
    }

    @Test
    void missingSkyPositionIsAnError() {
        ScenarioException e = error("observed = { distance_kpc = 300, v_los_kms = 50 }");
        assertEquals("sky.toml:3", e.where());
        assertTrue(e.getMessage().contains("missing sky position"), e.getMessage());
    }

    @Test
    void declinationOutOfRangeNamesItsLineAndKey() {
        ScenarioException e = error("[galaxy.observed]\nra_deg = 1\ndec_deg = 95\ndistance_kpc = 300\nv_los_kms = 50");
        assertEquals("sky.toml:5", e.where());
        assertEquals("galaxy.Vell.observed.dec_deg", e.key());
        assertTrue(e.getMessage().contains("[-90, 90]"), e.getMessage());
    }

    @Test
    void distanceGivenTwiceIsAnError() {
        ScenarioException e = error("[galaxy.observed]\nra_deg = 1\ndec_deg = 2\ndistance_kpc = 300\n"
                + "distance_modulus = 22\nv_los_kms = 50");
        assertEquals("sky.toml:7", e.where());
        assertEquals("galaxy.Vell.observed.distance_modulus", e.key());
    }

    @Test
    void anImplausibleDistanceModulusIsRefused() {
        // 3.4 is an apparent magnitude, not a distance modulus: outside 10..40 (1 kpc .. 1 Gpc).
        ScenarioException e = error("[galaxy.observed]\nra_deg = 1\ndec_deg = 2\ndistance_modulus = 3.4\nv_los_kms = 50");
        assertEquals("sky.toml:6", e.where());
        assertEquals("galaxy.Vell.observed.distance_modulus", e.key());
        assertTrue(e.getMessage().contains("between 10.0 and 40.0"), e.getMessage());
    }

    @Test
    void aTypoInAKeyIsCaughtWithASuggestion() {
        ScenarioException e = error("observed = { ra_deg = 1, dec_deg = 2, distance_kpc = 300,"
                + " v_los_kms = 50, pm_ra_mas = 0.1, pm_dec_mas_yr = 0 }");
        assertEquals("galaxy.Vell.observed.pm_ra_mas", e.key());
        assertTrue(e.getMessage().contains("did you mean 'pm_ra_mas_yr'"), e.getMessage());
    }

    @Test
    void aNormalDistanceThatReachesZeroIsRefused() {
        // P(d <= 0) for mean 700, sigma 400 is Phi(-1.75) = 4.0% (Abramowitz and Stegun 1964,
        // Handbook of Mathematical Functions, Table 26.1).
        ScenarioException e = assertThrows(ScenarioException.class, () -> ObservedReader.read(galaxy(
                "observed = { ra_deg = 1, dec_deg = 2, distance_kpc = { mean = 700, sigma = 400 }, v_los_kms = 5 }",
                UncertainNumbers.central())));
        assertEquals("galaxy.Vell.observed.distance_kpc", e.key());
        assertTrue(e.getMessage().contains("probability 4.0%"), e.getMessage());
    }

    @Test
    void uncertainObservablesAreDrawnPerKey() {
        UncertainNumbers reader = UncertainNumbers.sampling(9, 0);
        ObservedMember m = ObservedReader.read(galaxy("observed = { ra_deg = 1, dec_deg = 2,"
                + " distance_modulus = { mean = 24.4, sigma = 0.1 }, v_los_kms = { mean = -300, sigma = 5 } }", reader));
        assertEquals(2, reader.used().size());
        assertEquals("galaxy.Vell.observed.distance_modulus", reader.used().get(0).path());
        assertEquals(ObservedReader.kpcFromModulus(reader.used().get(0).value()), m.distanceKpc(), 1e-12);
        assertEquals(reader.used().get(1).value(), m.vLosKms());
    }

    @Test
    void observerDefaultsAndTheirErrors() {
        ObserverSite o = ObserverReader.read(ScenarioFile.parse(FILE, "[observer]\ngalaxy = \"Vell\"\n",
                Overrides.none(), NumberReader.PLAIN).requireTable("observer"));
        assertEquals(ObserverSite.defaults("Vell"), o);

        ScenarioException e = assertThrows(ScenarioException.class, () -> ObserverReader.read(ScenarioFile.parse(
                FILE, "[observer]\ngalaxy = \"Vell\"\ndistance_to_centre_kpc = 8\nheight_kpc = 9\n",
                Overrides.none(), NumberReader.PLAIN).requireTable("observer")));
        assertEquals("sky.toml:4", e.where());
        assertEquals("observer.height_kpc", e.key());

        e = assertThrows(ScenarioException.class, () -> ObserverReader.read(ScenarioFile.parse(
                FILE, "[observer]\ndistance_to_centre_kpc = 8\n", Overrides.none(), NumberReader.PLAIN)
                .requireTable("observer")));
        assertTrue(e.getMessage().contains("missing required key 'observer.galaxy'"), e.getMessage());

        ObserverSite given = ObserverReader.read(ScenarioFile.parse(FILE, "[observer]\ngalaxy = \"Vell\"\n"
                + "distance_to_centre_kpc = 8.178\nheight_kpc = 0\nvelocity_kms = [11.1, 12.24, 7.25]\n",
                Overrides.none(), NumberReader.PLAIN).requireTable("observer"));
        assertEquals(new ObserverSite("Vell", 8.178, 0, 11.1, 12.24, 7.25), given);
    }
}
