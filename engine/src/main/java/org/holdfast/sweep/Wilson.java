package org.holdfast.sweep;

import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.WilsonScoreInterval;

/**
 * The Wilson score interval for a binomial proportion (Wilson 1927, "Probable inference, the law
 * of succession, and statistical inference", JASA 22, 209): the set of p with
 * |k/n - p| &lt;= z sqrt(p (1 - p) / n), in closed form
 * (p&#770; + z&sup2;/2n &plusmn; z sqrt(p&#770;(1-p&#770;)/n + z&sup2;/4n&sup2;)) / (1 + z&sup2;/n).
 * Computed by Commons Math's {@link WilsonScoreInterval}; the ends at k = 0 and k = n are set to
 * exactly 0 and 1, where the closed form only rounds to them. Unlike the normal-approximation
 * interval it stays inside [0, 1] and is not empty at k = 0 or k = n, which matters for
 * fractions near 0 and 1 from a few dozen samples.
 */
public final class Wilson {

    /** The two-sided 95% standard normal quantile, Phi^-1(0.975). */
    public static final double Z95 = 1.959963984540054;

    /** The confidence level of the intervals in the tables and plots. */
    public static final double LEVEL = 0.95;

    private static final WilsonScoreInterval SCORE = new WilsonScoreInterval();

    /**
     * 95% intervals already computed, by (n, k): a sweep asks for the same few counts thousands of
     * times, and each call of Commons Math builds a normal distribution to find z.
     */
    private static final java.util.Map<Long, double[]> CACHE95 = new java.util.concurrent.ConcurrentHashMap<>();

    private Wilson() {
    }

    /**
     * The interval {lower, upper} for k successes in n trials at a confidence level.
     *
     * @throws IllegalArgumentException unless 0 &lt;= k &lt;= n and n &gt; 0
     */
    public static double[] interval(long k, long n, double level) {
        if (n <= 0 || k < 0 || k > n || n > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("need 0 <= k <= n, n > 0; got k = " + k + ", n = " + n);
        }
        ConfidenceInterval ci = SCORE.createInterval((int) n, (int) k, level);
        double lo = k == 0 ? 0.0 : Math.max(0.0, ci.getLowerBound());
        double hi = k == n ? 1.0 : Math.min(1.0, ci.getUpperBound());
        return new double[] {lo, hi};
    }

    /** The 95% interval. */
    public static double[] interval95(long k, long n) {
        if (n <= 0 || k < 0 || k > n || n > Integer.MAX_VALUE) {
            return interval(k, n, LEVEL); // the same check, the same message
        }
        if (CACHE95.size() > 100_000) {
            CACHE95.clear();
        }
        return CACHE95.computeIfAbsent((n << 32) | k, key -> interval(k, n, LEVEL)).clone();
    }
}
