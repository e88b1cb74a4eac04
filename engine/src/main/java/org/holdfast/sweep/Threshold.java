package org.holdfast.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BisectionSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Finds the value of one parameter at which a stated outcome starts (or stops) happening.
 *
 * <p>The outcome of one run is 0 or 1, a step function of the parameter. A solver that
 * interpolates (secant, Brent) learns nothing from a flat function and falls back to halving
 * anyway, so we use bisection (Commons Math {@link BisectionSolver}) on
 * g(x) = f(x) - 1/2, where f is the fraction of runs at x in which the outcome happens: with
 * one run per value f is the indicator and bisection closes on its jump; with several samples
 * per value (the same seeds at every value, so that the draws do not change with x) f rises
 * from 0 to 1 and the result is the value where half of the realisations show the outcome.
 * Each halving costs one evaluation; values already evaluated are remembered, because the
 * solver evaluates the lower end again at every step.
 */
public final class Threshold {

    /**
     * What was found.
     *
     * @param low the largest evaluated value on the low side of the change
     * @param high the smallest evaluated value on the high side
     * @param value the solver's answer, inside [low, high]
     * @param fractionAtLow f at the low end of the search range
     * @param fractionAtHigh f at the high end
     * @param evaluations every value evaluated with its f, by value
     */
    public record Result(double low, double high, double value, double fractionAtLow, double fractionAtHigh,
            Map<Double, Double> evaluations) {

        /** The number of parameter values evaluated. */
        public int evaluated() {
            return evaluations.size();
        }
    }

    /** The outcome does not change between the ends of the range. */
    public static final class NoChangeException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        private final double fractionAtLow;
        private final double fractionAtHigh;

        NoChangeException(double fLow, double fHigh) {
            super("the outcome does not change over the range (fraction " + fLow + " at the low end, "
                    + fHigh + " at the high end)");
            this.fractionAtLow = fLow;
            this.fractionAtHigh = fHigh;
        }

        /** f at the low end. */
        public double fractionAtLow() {
            return fractionAtLow;
        }

        /** f at the high end. */
        public double fractionAtHigh() {
            return fractionAtHigh;
        }
    }

    private Threshold() {
    }

    /**
     * The levels of f between which lies a 95% confidence interval for the median of the
     * realisations' own critical values: with paired draws f(x) is the fraction of the n draws
     * whose critical value lies on one side of x, a step function stepping at each of them, so
     * its crossing of level (j - 1/2)/n is the j-th order statistic. The distribution-free
     * interval for a median is [X_(j), X_(n+1-j)] with j - 1 the largest m where
     * P(Bin(n, 1/2) &lt;= m) &lt;= 0.025, so that it covers at least 95% (Conover 1999,
     * Practical Nonparametric Statistics, 3rd ed., section 3.2, the confidence interval for a
     * quantile).
     *
     * @return {lower level, upper level}, or null when n is too small (under 6) for any such j
     */
    public static double[] medianLevels95(int n) {
        org.apache.commons.math3.distribution.BinomialDistribution b =
                new org.apache.commons.math3.distribution.BinomialDistribution(null, n, 0.5);
        int m = -1;
        while (m + 1 < n && b.cumulativeProbability(m + 1) <= 0.025) {
            m++;
        }
        if (m < 0) {
            return null;
        }
        int j = m + 1;
        return new double[] {(j - 0.5) / n, (n + 1 - j - 0.5) / n};
    }

    /**
     * @param fraction f(x): the fraction of runs at x in which the outcome happens
     * @param lo low end of the range
     * @param hi high end of the range
     * @param tolerance the width the bracket must shrink to
     * @param maxEvaluations limit on the values evaluated
     * @throws NoChangeException if f - 1/2 has the same sign at both ends
     */
    public static Result find(DoubleUnaryOperator fraction, double lo, double hi, double tolerance, int maxEvaluations) {
        return find(fraction, lo, hi, tolerance, maxEvaluations, 0.5);
    }

    /**
     * The value at which f crosses another level than one half (f - level changes sign).
     *
     * @param level in (0, 1)
     * @throws NoChangeException if f - level has the same sign at both ends
     */
    public static Result find(DoubleUnaryOperator fraction, double lo, double hi, double tolerance, int maxEvaluations,
            double level) {
        if (!(lo < hi) || !(tolerance > 0)) {
            throw new IllegalArgumentException("need lo < hi and tolerance > 0");
        }
        TreeMap<Double, Double> seen = new TreeMap<>();
        DoubleUnaryOperator f = x -> seen.computeIfAbsent(x, fraction::applyAsDouble);
        double fLo = f.applyAsDouble(lo);
        double fHi = f.applyAsDouble(hi);
        if (Math.signum(fLo - level) == Math.signum(fHi - level) && fLo != level) {
            throw new NoChangeException(fLo, fHi);
        }
        BisectionSolver solver = new BisectionSolver(tolerance);
        double root;
        try {
            // The solver counts calls, remembered ones included; allow for its repeats.
            root = solver.solve(4 * maxEvaluations + 8, x -> f.applyAsDouble(x) - level, lo, hi);
        } catch (TooManyEvaluationsException e) {
            throw new IllegalStateException("no answer within " + maxEvaluations + " evaluations", e);
        }
        double[] bracket = bracket(seen, root, lo, hi, level);
        return new Result(bracket[0], bracket[1], root, fLo, fHi, seen);
    }

    /** The neighbouring evaluated values across which the sign of f - level changes, nearest the root. */
    static double[] bracket(TreeMap<Double, Double> seen, double root, double lo, double hi, double level) {
        List<Map.Entry<Double, Double>> e = new ArrayList<>(seen.entrySet());
        List<double[]> changes = new ArrayList<>();
        for (int i = 0; i + 1 < e.size(); i++) {
            double a = Math.signum(e.get(i).getValue() - level);
            double b = Math.signum(e.get(i + 1).getValue() - level);
            if (a != b) {
                changes.add(new double[] {e.get(i).getKey(), e.get(i + 1).getKey()});
            }
        }
        return changes.stream()
                .min(Comparator.comparingDouble(c -> Math.abs(0.5 * (c[0] + c[1]) - root)))
                .orElse(new double[] {lo, hi});
    }
}
