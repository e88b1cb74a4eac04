package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** From what the observer sees to states relative to the home centre. */
class HomeFrameTest {

    private static final HomeFrame DEFAULT = new HomeFrame(ObserverSite.defaults("Ossel"));

    private static ObservedMember observed(String inline) {
        return ObservedReader.read(ScenarioFile.parse(Path.of("home.toml"), "observed = " + inline + "\n",
                Overrides.none(), NumberReader.PLAIN).requireTable("observed"));
    }

    private static double norm(double[] v) {
        return Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
    }

    @Test
    void homeCentreLiesAtThePublishedDistanceFromTheDefaultObserver() {
        // R0 = 8.122 kpc (GRAVITY Collaboration 2018, A&A 615, L15); z = 20.8 pc (Bennett and
        // Bovy 2019, MNRAS 482, 1417).
        double[] o = DEFAULT.observerPositionKpc();
        assertEquals(8.122, norm(o), 1e-14);
        assertEquals(0.0208, o[2], 1e-15);
        assertEquals(0.0, o[1], 0.0);
        assertTrue(o[0] < 0, "the observer is on the -x side");
    }

    @Test
    void observerVelocityIsTheDefaultSet() {
        // (U, V, W) = (12.9, 245.6, 7.78) km/s (Drimmel and Poggio 2018, RNAAS 2, 210): a body
        // at rest relative to the observer moves with the observer.
        double[] v = DEFAULT.helioToHome(new double[3], new double[3]).velocityKms();
        assertArrayEquals(new double[] {12.9, 245.6, 7.78}, v, 1e-13);
    }

    @Test
    void memberTowardTheCentreEndsAtDistanceMinusR0AlongTheSightLine() {
        // Geometry of the convention in the package note (common practice): a member seen at
        // l = 0, b = 0 at distance d lies on the line from the observer through the centre, at
        // d - R0 beyond the centre.
        double d = 50;
        MemberState s = DEFAULT.toHome(observed("{ l_deg = 0, b_deg = 0, distance_kpc = 50, v_los_kms = 0,"
                + " pm_ra_mas_yr = 0, pm_dec_mas_yr = 0 }"));
        double[] r = s.positionKpc();
        assertEquals(d - 8.122, norm(r), 1e-12);
        double[] o = DEFAULT.observerPositionKpc();
        for (int k = 0; k < 3; k++) {
            assertEquals(-o[k] / 8.122, r[k] / norm(r), 1e-12, "component " + k + " of the direction");
        }
    }

    @Test
    void properMotionBecomesTransverseSpeedOfFourPointSevenFourKmsPerMasYrKpc() {
        // 1 mas/yr at 1 kpc is 1 au/yr = 4.740470 km/s (IAU 2012 au, Julian year; project
        // physics references). At RA 0, Dec 0 the direction of increasing RA is ICRS +y, which
        // the published Hipparcos matrix (ESA 1997, sec. 1.5.3) takes to its second column.
        HomeFrame still = new HomeFrame(new ObserverSite("Ossel", 8.122, 0, 0, 0, 0));
        MemberState s = still.toHome(observed("{ ra_deg = 0, dec_deg = 0, distance_kpc = 2, v_los_kms = 0,"
                + " pm_ra_mas_yr = 1, pm_dec_mas_yr = 0 }"));
        double speed = 2 * 4.740470;
        double[] column = {-0.8734370902348850, -0.4448296299600112, -0.1980763734312015};
        double[] v = s.velocityKms();
        for (int k = 0; k < 3; k++) {
            assertEquals(speed * column[k], v[k], 1e-6 * speed, "component " + k);
        }
        assertEquals(4.740470, Units.KMS_PER_MAS_YR_KPC, 5e-7);

        // Increasing Dec at RA 0, Dec 0 is ICRS +z: the third column of the same matrix.
        double[] v2 = still.toHome(observed("{ ra_deg = 0, dec_deg = 0, distance_kpc = 2, v_los_kms = 0,"
                + " pm_ra_mas_yr = 0, pm_dec_mas_yr = 1 }")).velocityKms();
        double[] third = {-0.4838350155487132, 0.7469822444972189, 0.4559837761750669};
        for (int k = 0; k < 3; k++) {
            assertEquals(speed * third[k], v2[k], 1e-6 * speed, "component " + k + " (pm_dec)");
        }
    }

    @Test
    void observingAHomeStateAndConvertingBackIsTheIdentity() {
        // Round trip (common practice): toHome(observe(state)) = state.
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(new long[] {7, 8});
        for (int i = 0; i < 200; i++) {
            double[] r = {rng.nextDouble() * 2000 - 1000, rng.nextDouble() * 2000 - 1000, rng.nextDouble() * 2000 - 1000};
            double[] v = {rng.nextDouble() * 600 - 300, rng.nextDouble() * 600 - 300, rng.nextDouble() * 600 - 300};
            double[] seen = DEFAULT.observe(r, v);
            MemberState back = DEFAULT.toHome(new ObservedMember("m", seen[0], seen[1], seen[2], seen[3],
                    seen[4], seen[5], List.of()));
            assertArrayEquals(r, back.positionKpc(), 1e-10);
            assertArrayEquals(v, back.velocityKms(), 1e-10);
        }
    }

    @Test
    void withoutProperMotionTheVelocityRelativeToTheCentreIsAlongTheSightLine() {
        // The stated assumption: no motion across the line of sight relative to the home
        // centre. The radial part is v_los plus the observer's own motion along the line.
        ObservedMember m = observed("{ ra_deg = 10.5, dec_deg = 40.2, distance_kpc = 700, v_los_kms = -120 }");
        MemberState s = DEFAULT.toHome(m);
        double[] r = s.positionKpc();
        double[] o = DEFAULT.observerPositionKpc();
        double[] u = {r[0] - o[0], r[1] - o[1], r[2] - o[2]};
        double len = norm(u);
        for (int k = 0; k < 3; k++) {
            u[k] /= len;
        }
        double[] v = s.velocityKms();
        double along = -120 + 12.9 * u[0] + 245.6 * u[1] + 7.78 * u[2];
        assertArrayEquals(new double[] {along * u[0], along * u[1], along * u[2]}, v, 1e-10);
        assertEquals(1, s.warnings().size());
        assertTrue(s.warnings().get(0).contains("no proper motion given"), s.warnings().get(0));
        assertTrue(s.warnings().get(0).startsWith("home.toml:1: observed: "), s.warnings().get(0));
    }

    @Test
    void losVelocityOfAMemberAtRestOnTheSightLineIsMinusTheObserverMotion() {
        // A member at rest in the home frame has v_los = -(U, V, W) . u_hat (common practice:
        // the reflex of the observer's own motion), and no proper motion needs assuming.
        double[] r = {0, 300, 0};
        double[] seen = DEFAULT.observe(r, new double[3]);
        double[] o = DEFAULT.observerPositionKpc();
        double[] u = {r[0] - o[0], r[1] - o[1], r[2] - o[2]};
        double len = norm(u);
        double expected = -(12.9 * u[0] + 245.6 * u[1] + 7.78 * u[2]) / len;
        assertEquals(expected, seen[3], 1e-10);
        assertEquals(len, seen[2], 1e-10);
    }
}
