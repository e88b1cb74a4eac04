package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

class WilsonTest {

    /**
     * Worked examples of the Wilson score interval without continuity correction (method 3)
     * in Newcombe 1998, Statistics in Medicine 17, 857, Table II: 81/263, 15/148, 0/20 and
     * 1/29, to the four decimals printed there (values from memory).
     */
    @Test
    void matchesNewcombesWorkedExamples() {
        double[][] cases = {
            {81, 263, 0.2553, 0.3662},
            {15, 148, 0.0624, 0.1605},
            {0, 20, 0.0000, 0.1611},
            {1, 29, 0.0061, 0.1718},
        };
        for (double[] c : cases) {
            double[] ci = Wilson.interval95((long) c[0], (long) c[1]);
            assertEquals(c[2], ci[0], 5e-5, "lower, " + c[0] + "/" + c[1]);
            assertEquals(c[3], ci[1], 5e-5, "upper, " + c[0] + "/" + c[1]);
        }
    }

    /**
     * The ends are the roots p of the score equation (k/n - p)^2 = z^2 p (1 - p) / n
     * (Wilson 1927, JASA 22, 209): check the closed form against that definition.
     */
    @Test
    void endsSolveTheScoreEquation() {
        double z = Wilson.Z95;
        for (long n : new long[] {1, 7, 50, 1000}) {
            for (long k = 0; k <= n; k += Math.max(1, n / 7)) {
                double[] ci = Wilson.interval95(k, n);
                double ph = (double) k / n;
                for (double p : ci) {
                    double lhs = (ph - p) * (ph - p);
                    double rhs = z * z * p * (1 - p) / n;
                    assertEquals(lhs, rhs, 1e-12, "k=" + k + " n=" + n + " p=" + p);
                }
                assertTrue(ci[0] <= ph && ph <= ci[1]);
            }
        }
    }

    /** Symmetry of the binomial: the interval for k/n mirrors the one for (n-k)/n. */
    @Test
    void isSymmetricUnderSwappingSuccessAndFailure() {
        for (long k = 0; k <= 30; k++) {
            double[] a = Wilson.interval95(k, 30);
            double[] b = Wilson.interval95(30 - k, 30);
            assertEquals(a[0], 1 - b[1], 1e-15);
            assertEquals(a[1], 1 - b[0], 1e-15);
        }
    }

    /** Z95 is the 0.975 quantile of the standard normal (common practice; checked by Commons Math). */
    @Test
    void z95IsTheNormalQuantile() {
        assertEquals(new NormalDistribution().inverseCumulativeProbability(0.975), Wilson.Z95, 1e-9);
    }

    @Test
    void rejectsImpossibleCounts() {
        assertThrows(IllegalArgumentException.class, () -> Wilson.interval95(3, 2));
        assertThrows(IllegalArgumentException.class, () -> Wilson.interval95(0, 0));
    }
}
