package org.holdfast.weighing;

import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.IntStream;

/**
 * How strong dark energy may be for the timing mass to agree with an independent mass
 * (Benisty, Davis &amp; Evans 2023, ApJL 953, L2): the dark-energy force on the pair is scaled
 * by a factor x = Lambda / Lambda_ref (the expansion and the age held fixed, as in their
 * two-body equation), the timing mass M(x) of every draw of the pair is found, and the
 * likelihood of x is the mean over draws of exp(-(M(x) - M_ind)^2 / (2 sigma^2)). With a flat
 * prior on x in [0, max] its cumulative gives the 95% upper bound.
 */
public final class DarkEnergyBound {

    /** Nodes at which the timing mass is solved; it is interpolated linearly between them. */
    static final int NODES = 24;
    static final int FINE = 961;

    /**
     * @param ratio x on the fine grid
     * @param likelihood relative likelihood (maximum 1)
     * @param best the most likely x
     * @param upper95 the 95% upper bound on x
     * @param lower95 the 95% lower bound on x
     * @param median the median of x
     * @param timingMassAtNodes mean timing mass of the draws at each node (Msun), for plots
     * @param nodes the node values of x
     */
    public record Result(double[] ratio, double[] likelihood, double best, double upper95, double lower95, double median,
            double[] nodes, double[] timingMassAtNodes) {
    }

    private DarkEnergyBound() {
    }

    /**
     * The bound on the scale x = Lambda / Lambda_ref of the dark-energy force, from 0 to maxRatio.
     *
     * @param pairs the draws of the pair (or the central pair alone)
     * @param reference the dark-energy force of the reference cosmology, K(t) in 1/Gyr^2
     * @param massMsun the independent mass
     * @param sigmaMsun its error
     * @param maxRatio the top of the prior on x
     */
    public static Result of(List<PairMotion> pairs, DoubleUnaryOperator reference, double massMsun, double sigmaMsun,
            double maxRatio, int threads) {
        double[] nodes = new double[NODES + 1];
        for (int j = 0; j <= NODES; j++) {
            nodes[j] = maxRatio * j / NODES;
        }
        double[] noLimit = new double[nodes.length];
        java.util.Arrays.fill(noLimit, Double.POSITIVE_INFINITY);
        return over(pairs, nodes, j -> {
            double f = nodes[j];
            return t -> f * reference.applyAsDouble(t);
        }, noLimit, false, massMsun, sigmaMsun, threads);
    }

    /**
     * The likelihood of a parameter tabulated at {@code nodes} (ascending), whose dark-energy
     * force at node j is {@code fieldAt.apply(j)} (null: that value is impossible, e.g. a
     * universe younger than the pair). A draw without a solution at a node, or older than
     * {@code ageLimitGyr[j]} (the age of that node's universe), adds nothing to its likelihood there;
     * with {@code ownAge} every pair takes that age instead (its age was the cosmology's own).
     */
    public static Result over(List<PairMotion> pairs, double[] nodes, java.util.function.IntFunction<DoubleUnaryOperator> fieldAt,
            double[] ageLimitGyr, boolean ownAge, double massMsun, double sigmaMsun, int threads) {
        DoubleUnaryOperator[] fields = new DoubleUnaryOperator[nodes.length];
        for (int j = 0; j < nodes.length; j++) {
            fields[j] = fieldAt.apply(j);
        }
        double maxRatio = nodes[nodes.length - 1];
        double minRatio = nodes[0];
        double[][] m = new double[pairs.size()][];
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, pairs.size()).parallel().forEach(i -> m[i] = masses(pairs.get(i),
                    fields, ageLimitGyr, ownAge))).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
        } finally {
            pool.shutdown();
        }
        double[] x = new double[FINE];
        double[] like = new double[FINE];
        double top = 0;
        for (int k = 0; k < FINE; k++) {
            x[k] = minRatio + (maxRatio - minRatio) * k / (FINE - 1);
            double sum = 0;
            for (double[] row : m) {
                double mk = interpolate(nodes, row, x[k]);
                if (Double.isFinite(mk)) {
                    double z = (mk - massMsun) / sigmaMsun;
                    sum += Math.exp(-0.5 * z * z);
                }
            }
            like[k] = sum / m.length;
            top = Math.max(top, like[k]);
        }
        int best = 0;
        for (int k = 0; k < FINE; k++) {
            like[k] = top > 0 ? like[k] / top : 0;
            if (like[k] > like[best]) {
                best = k;
            }
        }
        double[] meanMass = new double[nodes.length];
        for (int j = 0; j < nodes.length; j++) {
            double s = 0;
            int c = 0;
            for (double[] row : m) {
                if (Double.isFinite(row[j])) {
                    s += row[j];
                    c++;
                }
            }
            meanMass[j] = c == 0 ? Double.NaN : s / c;
        }
        return new Result(x, like, x[best], quantile(x, like, 0.95), quantile(x, like, 0.05), quantile(x, like, 0.5), nodes,
                meanMass);
    }

    private static double[] masses(PairMotion given, DoubleUnaryOperator[] fields, double[] ageLimitGyr, boolean ownAge) {
        double[] out = new double[fields.length];
        for (int j = 0; j < fields.length; j++) {
            try {
                PairMotion p = ownAge && ageLimitGyr[j] > 0 ? new PairMotion(given.separationKpc(), given.radialKms(),
                        given.tangentialKms(), ageLimitGyr[j]) : given;
                boolean tooOld = p.ageGyr() > ageLimitGyr[j] + TimingSolver.START_SLACK_GYR;
                out[j] = fields[j] == null || tooOld ? Double.NaN
                        : TimingSolver.solve(p, Background.DARK_ENERGY, fields[j]).massMsun();
            } catch (IllegalArgumentException e) {
                out[j] = Double.NaN;
            }
        }
        return out;
    }

    static double interpolate(double[] xs, double[] ys, double x) {
        int j = 0;
        while (j < xs.length - 2 && x > xs[j + 1]) {
            j++;
        }
        double u = (x - xs[j]) / (xs[j + 1] - xs[j]);
        return ys[j] + u * (ys[j + 1] - ys[j]);
    }

    /** The value below which a fraction p of the (trapezoid-integrated) likelihood lies. */
    static double quantile(double[] x, double[] like, double p) {
        double[] cdf = new double[x.length];
        for (int k = 1; k < x.length; k++) {
            cdf[k] = cdf[k - 1] + 0.5 * (like[k] + like[k - 1]) * (x[k] - x[k - 1]);
        }
        double total = cdf[x.length - 1];
        if (!(total > 0)) {
            return Double.NaN;
        }
        for (int k = 1; k < x.length; k++) {
            if (cdf[k] >= p * total) {
                double u = (p * total - cdf[k - 1]) / (cdf[k] - cdf[k - 1]);
                return x[k - 1] + u * (x[k] - x[k - 1]);
            }
        }
        return x[x.length - 1];
    }
}
