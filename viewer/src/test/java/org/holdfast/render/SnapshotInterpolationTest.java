package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * Cubic Hermite interpolation matches value and derivative at both ends and so reproduces any
 * cubic polynomial exactly (Burden and Faires, Numerical Analysis, the Hermite interpolation
 * section; edition from memory).
 */
class SnapshotInterpolationTest {

    static double cubic(double t) {
        return 3 - 2 * t + 0.7 * t * t - 0.15 * t * t * t;
    }

    static double cubicRate(double t) {
        return -2 + 1.4 * t - 0.45 * t * t;
    }

    @Test
    void reproducesACubicExactly() {
        double t0 = 1.5;
        double t1 = 4.0;
        for (double t = t0; t <= t1; t += 0.1) {
            double h = SnapshotInterpolation.hermite(t0, cubic(t0), cubicRate(t0), t1, cubic(t1), cubicRate(t1), t);
            assertEquals(cubic(t), h, 1e-13, "t = " + t);
        }
    }

    @Test
    void arraysAgreeWithTheScalarFormAndHitTheEnds() {
        double[] x0 = {1, -2, 5};
        double[] v0 = {0.3, 4, -1};
        double[] x1 = {2, 0, 4};
        double[] v1 = {-0.2, 1, 2};
        double[] out = new double[3];
        SnapshotInterpolation.hermite(0.5, x0, v0, 0.9, x1, v1, 0.5, 3, out);
        assertEquals(1, out[0], 1e-15);
        SnapshotInterpolation.hermite(0.5, x0, v0, 0.9, x1, v1, 0.9, 3, out);
        assertEquals(4, out[2], 1e-14);
        SnapshotInterpolation.hermite(0.5, x0, v0, 0.9, x1, v1, 0.63, 3, out);
        for (int i = 0; i < 3; i++) {
            assertEquals(SnapshotInterpolation.hermite(0.5, x0[i], v0[i], 0.9, x1[i], v1[i], 0.63), out[i], 1e-14);
        }
    }

    @Test
    void slopeAtTheEndsIsTheGivenVelocity() {
        double eps = 1e-6;
        double a = SnapshotInterpolation.hermite(0, 1, 3, 2, 5, -1, eps);
        assertEquals(3, (a - 1) / eps, 1e-5);
        double b = SnapshotInterpolation.hermite(0, 1, 3, 2, 5, -1, 2 - eps);
        assertEquals(-1, (5 - b) / eps, 1e-5);
    }

    /** The rate is the interpolant's own derivative: central differences agree to O(eps^2) (common practice). */
    @Test
    void rateIsTheDerivativeOfTheInterpolant() {
        double eps = 1e-5;
        for (double t = 0.5; t <= 0.9; t += 0.05) {
            double ahead = SnapshotInterpolation.hermite(0.5, 1, 0.3, 0.9, 2, -0.2, t + eps);
            double behind = SnapshotInterpolation.hermite(0.5, 1, 0.3, 0.9, 2, -0.2, t - eps);
            assertEquals((ahead - behind) / (2 * eps), SnapshotInterpolation.hermiteRate(0.5, 1, 0.3, 0.9, 2, -0.2, t),
                    1e-8, "at " + t);
        }
        assertEquals(0.3, SnapshotInterpolation.hermiteRate(0.5, 1, 0.3, 0.9, 2, -0.2, 0.5), 1e-14);
        assertEquals(-0.2, SnapshotInterpolation.hermiteRate(0.5, 1, 0.3, 0.9, 2, -0.2, 0.9), 1e-14);
    }

    @Test
    void linearBlendOfTracers() {
        float[] out = new float[2];
        SnapshotInterpolation.linear(1, new float[] {0, 10}, 3, new float[] {4, 20}, 1.5, 2, out);
        assertEquals(1f, out[0], 1e-6f);
        assertEquals(12.5f, out[1], 1e-6f);
        assertThrows(IllegalArgumentException.class,
                () -> SnapshotInterpolation.linear(1, new float[1], 3, new float[1], 3.5, 1, out));
    }
}
