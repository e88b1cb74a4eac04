package org.holdfast.integrators;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The convergence order of a scheme, measured (in the manner of Hipparchus's abstract integrator
 * tests): the position error after a fixed time on a Kepler ellipse at fixed steps, fitted by
 * least squares against the number of steps on log-log axes; the slope is the order. One
 * subclass per scheme gives the scheme, its claimed order, the orbit and the step counts at
 * which its error lies above round-off.
 */
abstract class ConvergenceOrderContract {

    /** The claimed order. */
    abstract int order();

    /** Steps per orbit of the runs fitted. */
    abstract int[] stepsPerOrbit();

    /** How far the fitted slope may lie from the order. */
    double tolerance() {
        return 0.15;
    }

    /** Eccentricity of the test orbit. */
    double eccentricity() {
        return 0.5;
    }

    /** Position error after the given number of orbits at fixed step 2 pi / stepsPerOrbit. */
    abstract double errorAfter(int stepsPerOrbit, int orbits);

    @Test
    void errorFallsAtTheClaimedOrder() {
        int[] ns = stepsPerOrbit();
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        StringBuilder seen = new StringBuilder();
        for (int n : ns) {
            double err = errorAfter(n, 2);
            assertTrue(err > 1e-14, "error at " + n + " steps per orbit is round-off: " + err);
            double lx = Math.log(n);
            double ly = Math.log(err);
            sx += lx;
            sy += ly;
            sxx += lx * lx;
            sxy += lx * ly;
            seen.append(n).append(':').append(err).append(' ');
        }
        int k = ns.length;
        double slope = -(k * sxy - sx * sy) / (k * sxx - sx * sx);
        assertTrue(Math.abs(slope - order()) < tolerance(),
                "fitted order " + slope + ", claimed " + order() + " (" + seen + ")");
    }

    static double distance(double[] a, double x, double y) {
        return Math.hypot(a[0] - x, a[1] - y);
    }
}
