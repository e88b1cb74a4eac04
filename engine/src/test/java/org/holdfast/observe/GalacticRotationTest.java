package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.joml.Matrix3d;
import org.joml.Matrix3dc;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/** Checks of the ICRS-to-Galactic rotation against the Hipparcos definition (ESA 1997, sec. 1.5.3). */
class GalacticRotationTest {

    /** Round-off of a few operations on numbers of order one (common practice: a few ulps of 1). */
    private static final double ROUND_OFF = 1e-15;

    private static double[] lb(double raDeg, double decDeg) {
        Vector3d u = GalacticRotation.toGalactic(GalacticRotation.unitVector(raDeg, decDeg, new Vector3d()),
                new Vector3d());
        return new double[] {GalacticRotation.longitudeDeg(u), GalacticRotation.latitudeDeg(u)};
    }

    @Test
    void northGalacticPoleMapsToLatitudeNinety() {
        // ESA 1997, The Hipparcos and Tycho Catalogues, vol. 1, sec. 1.5.3: the north Galactic
        // pole lies at ICRS RA 192.85948 deg, Dec +27.12825 deg.
        assertEquals(90.0, lb(192.85948, 27.12825)[1], 1e-12);
    }

    @Test
    void northCelestialPoleHasTheDefiningLongitude() {
        // ESA 1997, sec. 1.5.3: the north celestial pole is at l = 122.93192 deg; its latitude
        // equals the declination of the Galactic pole, 27.12825 deg (same definition).
        double[] p = lb(0, 90);
        assertEquals(122.93192, p[0], 1e-10);
        assertEquals(27.12825, p[1], 1e-10);
    }

    @Test
    void workedExampleGivesLongitude320LatitudeMinus45() {
        // ESA 1997, sec. 1.5.3 (worked example): RA 339.98212 deg, Dec -67.52233 deg is
        // l = 320 deg, b = -45 deg. The inputs are rounded to 1e-5 deg, hence the tolerance.
        double[] p = lb(339.98212, -67.52233);
        assertEquals(320.0, p[0], 1e-5);
        assertEquals(-45.0, p[1], 1e-5);
    }

    @Test
    void matrixBuiltFromTheAnglesIsThePublishedMatrix() {
        // Matrix A_G' of ESA 1997, sec. 1.5.3, to 16 digits as listed in the project's
        // physics references (computed from the same three defining angles).
        double[][] published = {
            {-0.0548755604162154, -0.8734370902348850, -0.4838350155487132},
            {+0.4941094278755837, -0.4448296299600112, +0.7469822444972189},
            {-0.8676661490190047, -0.1980763734312015, +0.4559837761750669}};
        Matrix3dc r = GalacticRotation.icrsToGalactic();
        for (int row = 0; row < 3; row++) {
            for (int col = 0; col < 3; col++) {
                assertEquals(published[row][col], r.get(col, row), ROUND_OFF, "R[" + row + "][" + col + "]");
            }
        }
    }

    @Test
    void rotationIsOrthogonalToRoundOff() {
        // A rotation satisfies R R^T = I and det R = +1 (common practice).
        Matrix3d p = new Matrix3d(GalacticRotation.icrsToGalactic()).mul(GalacticRotation.galacticToIcrs());
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(i == j ? 1.0 : 0.0, p.get(j, i), ROUND_OFF, "(R R^T)[" + i + "][" + j + "]");
            }
        }
        assertEquals(1.0, GalacticRotation.icrsToGalactic().determinant(), ROUND_OFF);
    }

    @Test
    void icrsToGalacticAndBackIsTheIdentity() {
        // Round trip (common practice): R^T R v = v for any vector.
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(new long[] {3, 4});
        Vector3d v = new Vector3d();
        Vector3d w = new Vector3d();
        for (int i = 0; i < 1000; i++) {
            v.set(rng.nextDouble() * 2 - 1, rng.nextDouble() * 2 - 1, rng.nextDouble() * 2 - 1);
            GalacticRotation.toIcrs(GalacticRotation.toGalactic(v, w), w);
            assertEquals(0.0, w.distance(v), 2 * ROUND_OFF, "vector " + v);
        }
    }
}
