package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** w = -1 is a cosmological constant: the dark-energy density never changes (common practice). */
class ConstantWTest {

    @Test
    void wMinusOneKeepsItsDensityExactlyAtEveryScaleFactor() {
        ConstantW lambda = new ConstantW(-1);
        for (double lnA : new double[] {Double.NEGATIVE_INFINITY, -40, -1e-9, 0, 3, 600}) {
            assertEquals(0.0, lambda.lnDensityRatio(lnA), "ln a = " + lnA);
        }
        assertEquals(-1.0, lambda.w(0.3));
        assertEquals("cosmological constant (w = -1)", lambda.describe());
    }

    @Test
    void otherConstantsScaleAsAToTheMinusThreeOnePlusW() {
        // rho_de ~ a^(-3(1+w)) (Caldwell 2002, Phys. Lett. B 545, 23)
        assertEquals(-3 * (1 - 1.2) * 2.5, new ConstantW(-1.2).lnDensityRatio(2.5), 1e-15);
    }
}
