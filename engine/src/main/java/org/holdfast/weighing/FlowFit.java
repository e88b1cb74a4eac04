package org.holdfast.weighing;

import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

/**
 * The mass (and optionally one cosmological parameter) whose velocity-distance relation fits
 * the galaxies around a group best. The likelihood of each galaxy is Gaussian in velocity with
 * the effective variance sigma_v^2 + sigma_int^2 + (dv/dr sigma_r)^2 (the "effective variance"
 * method, Orear 1982, Am. J. Phys. 50, 912 — from memory); the prior is flat in ln M (and in the
 * parameter), on a grid; intervals are the central 68% and 95% of the marginal posterior.
 */
public final class FlowFit {

    /** One model of the background: a parameter value and its relation. */
    public record Model(double parameter, FlowCurve curve) {
    }

    /**
     * The fit.
     *
     * @param bestMassMsun the mass of the highest posterior on the grid
     * @param bestParameter the parameter there
     * @param mass spread of the marginal posterior of the mass (median and intervals)
     * @param zeroVelocityKpc the same for the zero-velocity radius
     * @param parameter the same for the parameter (null when there is one model)
     * @param chi2 chi-square at the best point
     * @param massGrid the mass grid
     * @param massPosterior the marginal posterior of the mass on it (maximum 1)
     */
    public record Result(double bestMassMsun, double bestParameter, Interval mass, Interval zeroVelocityKpc,
            Interval parameter, double chi2, double[] massGrid, double[] massPosterior, Model bestModel) {
    }

    /** A median with its 68% and 95% intervals. */
    public record Interval(double median, double lo68, double hi68, double lo95, double hi95) {
    }

    private FlowFit() {
    }

    /**
     * @param data the galaxies
     * @param models the background for each parameter value (one model: nothing else fitted)
     * @param scatterKms intrinsic scatter added in quadrature
     * @param massGrid masses to try, ascending
     */
    public static Result fit(FlowData data, List<Model> models, double scatterKms, double[] massGrid, int threads) {
        int nm = massGrid.length;
        double[][] lnL = grid(data, models, scatterKms, massGrid, threads);
        double top = Double.NEGATIVE_INFINITY;
        int bj = 0;
        int bi = 0;
        for (int j = 0; j < models.size(); j++) {
            for (int i = 0; i < nm; i++) {
                if (lnL[j][i] > top) {
                    top = lnL[j][i];
                    bj = j;
                    bi = i;
                }
            }
        }
        double[] pm = new double[nm];
        double[] pp = new double[models.size()];
        double[] r0Weights = new double[models.size() * nm];
        double[] r0Values = new double[models.size() * nm];
        for (int j = 0; j < models.size(); j++) {
            for (int i = 0; i < nm; i++) {
                double w = Math.exp(lnL[j][i] - top);
                pm[i] += w;
                pp[j] += w;
                r0Values[j * nm + i] = models.get(j).curve().zeroVelocityKpc(massGrid[i]);
                r0Weights[j * nm + i] = w;
            }
        }
        double[] lnM = new double[nm];
        for (int i = 0; i < nm; i++) {
            lnM[i] = Math.log(massGrid[i]);
        }
        Interval mass = interval(lnM, pm, true);
        Interval param = null;
        if (models.size() > 1) {
            double[] xs = models.stream().mapToDouble(Model::parameter).toArray();
            param = interval(xs, pp, false);
        }
        Interval r0 = weighted(r0Values, r0Weights);
        double pmTop = 0;
        for (double v : pm) {
            pmTop = Math.max(pmTop, v);
        }
        for (int i = 0; i < nm; i++) {
            pm[i] /= pmTop;
        }
        Model best = models.get(bj);
        return new Result(massGrid[bi], best.parameter(), mass, r0, param,
                chi2(data, best.curve(), scatterKms, massGrid[bi]), massGrid, pm, best);
    }

    /** ln L on the grid of models and masses, one model per task (the same on any thread count). */
    private static double[][] grid(FlowData data, List<Model> models, double scatterKms, double[] massGrid, int threads) {
        double[][] lnL = new double[models.size()][massGrid.length];
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, models.size()).parallel().forEach(j -> {
                for (int i = 0; i < massGrid.length; i++) {
                    lnL[j][i] = lnLikelihood(data, models.get(j).curve(), scatterKms, massGrid[i]);
                }
            })).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
        } finally {
            pool.shutdown();
        }
        return lnL;
    }

    /** ln L of the data for one relation and mass; -infinity if a galaxy is off the table. */
    static double lnLikelihood(FlowData d, FlowCurve c, double scatterKms, double massMsun) {
        double sum = 0;
        for (int k = 0; k < d.size(); k++) {
            double r = d.distanceKpc()[k];
            if (!c.covers(r, massMsun)) {
                return Double.NEGATIVE_INFINITY;
            }
            double model = c.velocityKms(r, massMsun);
            double slope = c.slope(r, massMsun) * d.distanceErrKpc()[k];
            double var = d.velocityErrKms()[k] * d.velocityErrKms()[k] + scatterKms * scatterKms + slope * slope;
            double z = d.velocityKms()[k] - model;
            sum += -0.5 * (z * z / var + Math.log(2 * Math.PI * var));
        }
        return sum;
    }

    static double chi2(FlowData d, FlowCurve c, double scatterKms, double massMsun) {
        double sum = 0;
        for (int k = 0; k < d.size(); k++) {
            double r = d.distanceKpc()[k];
            double slope = c.slope(r, massMsun) * d.distanceErrKpc()[k];
            double var = d.velocityErrKms()[k] * d.velocityErrKms()[k] + scatterKms * scatterKms + slope * slope;
            double z = d.velocityKms()[k] - c.velocityKms(r, massMsun);
            sum += z * z / var;
        }
        return sum;
    }

    /** Median and central intervals of a posterior tabulated at x (trapezoid rule). */
    static Interval interval(double[] x, double[] p, boolean exp) {
        double[] q = {0.5, 0.16, 0.84, 0.025, 0.975};
        double[] out = new double[5];
        if (x.length == 1) {
            java.util.Arrays.fill(out, exp ? Math.exp(x[0]) : x[0]);
        } else {
            for (int k = 0; k < 5; k++) {
                double v = DarkEnergyBound.quantile(x, p, q[k]);
                out[k] = exp ? Math.exp(v) : v;
            }
        }
        return new Interval(out[0], out[1], out[2], out[3], out[4]);
    }

    /** Weighted quantiles of scattered values (the zero-velocity radius over the grid). */
    static Interval weighted(double[] values, double[] weights) {
        Integer[] order = new Integer[values.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(values[a], values[b]));
        double total = 0;
        for (double w : weights) {
            total += w;
        }
        double[] q = {0.5, 0.16, 0.84, 0.025, 0.975};
        double[] out = new double[5];
        for (int k = 0; k < 5; k++) {
            double acc = 0;
            out[k] = values[order[order.length - 1]];
            for (Integer i : order) {
                acc += weights[i];
                if (acc >= q[k] * total) {
                    out[k] = values[i];
                    break;
                }
            }
        }
        return new Interval(out[0], out[1], out[2], out[3], out[4]);
    }
}
