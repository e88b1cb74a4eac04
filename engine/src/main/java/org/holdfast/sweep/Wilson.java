package org.holdfast.sweep;

/**
 * The Wilson score interval for a binomial proportion (Wilson 1927, JASA 22, 209): the set of
 * p with |k/n - p| &lt;= z sqrt(p (1 - p) / n), in closed form
 * (p&#770; + z&sup2;/2n &plusmn; z sqrt(p&#770;(1-p&#770;)/n + z&sup2;/4n&sup2;)) / (1 + z&sup2;/n).
 * Unlike the normal-approximation interval it stays inside [0, 1] and is not empty at k = 0 or
 * k = n, which matters for fractions near 0 and 1 from a few dozen samples.
 */
public final class Wilson {

    /** The two-sided 95% standard normal quantile, Phi^-1(0.975). */
    public static final double Z95 = 1.959963984540054;

    private Wilson() {
    }

    /**
     * The interval {lower, upper} for k successes in n trials.
     *
     * @throws IllegalArgumentException unless 0 &lt;= k &lt;= n and n &gt; 0
     */
    public static double[] interval(long k, long n, double z) {
        if (n <= 0 || k < 0 || k > n) {
            throw new IllegalArgumentException("need 0 <= k <= n, n > 0; got k = " + k + ", n = " + n);
        }
        double p = (double) k / n;
        double z2 = z * z;
        double denom = 1 + z2 / n;
        double centre = (p + z2 / (2.0 * n)) / denom;
        double half = z / denom * Math.sqrt(p * (1 - p) / n + z2 / (4.0 * n * n));
        // Exact ends where the closed form only rounds to them.
        double lo = k == 0 ? 0.0 : Math.max(0.0, centre - half);
        double hi = k == n ? 1.0 : Math.min(1.0, centre + half);
        return new double[] {lo, hi};
    }

    /** The 95% interval. */
    public static double[] interval95(long k, long n) {
        return interval(k, n, Z95);
    }
}
