package org.holdfast.integrators;

/**
 * A system of second-order equations x'' = f(t, x, x') for a {@link Ias15} integrator, over
 * flat coordinate arrays (how a system lays its coordinates out is its own business). It may
 * carry extra quantities q with q' = r(t, x, x') (work integrals of a time-dependent or
 * dissipative force), which the integrator integrates with the same quadrature as the motion.
 */
public interface SecondOrderSystem {

    /** Number of coordinates. */
    int size();

    /** Number of extra rates, 0 if none. */
    default int rateCount() {
        return 0;
    }

    /**
     * Sets a = f(t, x, v), and the extra rates into {@code rates} (length {@link #rateCount}).
     * Must not keep the arrays.
     */
    void evaluate(double t, double[] x, double[] v, double[] a, double[] rates);
}
