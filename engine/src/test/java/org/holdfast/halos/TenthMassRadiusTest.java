package org.holdfast.halos;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The radius holding a tenth of a halo's mass, which sets the default merge distance. */
class TenthMassRadiusTest {

    /**
     * Hernquist 1990, ApJ 356, 359: M(&lt;r) = M r^2 / (r + a)^2, so a tenth of the mass lies
     * inside r = a sqrt(0.1) / (1 - sqrt(0.1)).
     */
    @Test
    void aHernquistHaloHoldsATenthOfItsMassWhereTheClosedFormSays() {
        for (double a : new double[] {0.3, 7.5, 40}) {
            double exact = a * Math.sqrt(0.1) / (1 - Math.sqrt(0.1));
            assertEquals(exact, Halos.tenthMassRadius(new HernquistHalo(1e12, a)), 1e-11 * exact, "a = " + a);
        }
    }

    @Test
    void aBarePointHasNone() {
        assertEquals(0, Halos.tenthMassRadius(new PointHalo(1e11, 0)));
    }
}
