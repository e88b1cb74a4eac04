package org.holdfast.weighing;

import java.util.Arrays;

/**
 * The spread of a sample: median, central 68% and 95% intervals (percentiles 16-84 and
 * 2.5-97.5, linear interpolation between order statistics: Hyndman &amp; Fan 1996, Am. Stat.
 * 50, 361, definition 7), mean and standard deviation. Values that are not finite (draws that
 * had no solution) are counted apart.
 *
 * @param count finite values used
 * @param missing values left out
 */
public record Spread(int count, int missing, double median, double lo68, double hi68, double lo95, double hi95,
        double mean, double sd) {

    /** The spread of the finite values. */
    public static Spread of(double[] values) {
        double[] v = Arrays.stream(values).filter(Double::isFinite).sorted().toArray();
        int n = v.length;
        if (n == 0) {
            return new Spread(0, values.length, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN);
        }
        double sum = 0;
        for (double x : v) {
            sum += x;
        }
        double mean = sum / n;
        double ss = 0;
        for (double x : v) {
            ss += (x - mean) * (x - mean);
        }
        double sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
        return new Spread(n, values.length - n, quantile(v, 0.5), quantile(v, 0.16), quantile(v, 0.84),
                quantile(v, 0.025), quantile(v, 0.975), mean, sd);
    }

    /** Quantile p of sorted values (definition 7 of Hyndman &amp; Fan 1996). */
    public static double quantile(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int i = (int) Math.floor(h);
        if (i + 1 >= sorted.length) {
            return sorted[sorted.length - 1];
        }
        return sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]);
    }
}
