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
     * @param fraction f(x): the fraction of runs at x in which the outcome happens
     * @param lo low end of the range
     * @param hi high end of the range
     * @param tolerance the width the bracket must shrink to
     * @param maxEvaluations limit on the values evaluated
     * @throws NoChangeException if f - 1/2 has the same sign at both ends
     */
    public static Result find(DoubleUnaryOperator fraction, double lo, double hi, double tolerance, int maxEvaluations) {
        if (!(lo < hi) || !(tolerance > 0)) {
            throw new IllegalArgumentException("need lo < hi and tolerance > 0");
        }
        TreeMap<Double, Double> seen = new TreeMap<>();
        DoubleUnaryOperator f = x -> seen.computeIfAbsent(x, fraction::applyAsDouble);
        double fLo = f.applyAsDouble(lo);
        double fHi = f.applyAsDouble(hi);
        if (Math.signum(fLo - 0.5) == Math.signum(fHi - 0.5) && fLo != 0.5) {
            throw new NoChangeException(fLo, fHi);
        }
        BisectionSolver solver = new BisectionSolver(tolerance);
        double root;
        try {
            // The solver counts calls, remembered ones included; allow for its repeats.
            root = solver.solve(4 * maxEvaluations + 8, x -> f.applyAsDouble(x) - 0.5, lo, hi);
        } catch (TooManyEvaluationsException e) {
            throw new IllegalStateException("no answer within " + maxEvaluations + " evaluations", e);
        }
        double[] bracket = bracket(seen, root, lo, hi);
        return new Result(bracket[0], bracket[1], root, fLo, fHi, seen);
    }

    /** The neighbouring evaluated values across which the sign of f - 1/2 changes, nearest the root. */
    static double[] bracket(TreeMap<Double, Double> seen, double root, double lo, double hi) {
        List<Map.Entry<Double, Double>> e = new ArrayList<>(seen.entrySet());
        List<double[]> changes = new ArrayList<>();
        for (int i = 0; i + 1 < e.size(); i++) {
            double a = Math.signum(e.get(i).getValue() - 0.5);
            double b = Math.signum(e.get(i + 1).getValue() - 0.5);
            if (a != b) {
                changes.add(new double[] {e.get(i).getKey(), e.get(i + 1).getKey()});
            }
        }
        return changes.stream()
                .min(Comparator.comparingDouble(c -> Math.abs(0.5 * (c[0] + c[1]) - root)))
                .orElse(new double[] {lo, hi});
    }
}
