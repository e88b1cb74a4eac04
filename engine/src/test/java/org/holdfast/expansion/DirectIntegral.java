package org.holdfast.expansion;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * The "direct integral" the table is checked against: t(a) - t_BB = &int;_0^a da'/(a' H(a')),
 * computed independently of the table by Gauss–Legendre quadrature (Commons Math) in s = sqrt(a),
 * where the integrand 2/(s H) is smooth at the Big Bang.
 */
final class DirectIntegral {

    private DirectIntegral() {
    }

    /** Time since the Big Bang at scale factor a, Gyr. */
    static double timeSinceBigBang(Cosmology c, double a) {
        double h0 = c.h0PerGyr();
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-300, 2, 64);
        double top = Math.sqrt(a);
        double sum = 0;
        int pieces = 64;
        for (int i = 0; i < pieces; i++) {
            double lo = top * i / pieces;
            double hi = top * (i + 1) / pieces;
            sum += gl.integrate(10_000_000, s -> s == 0 ? 0 : 2.0 / (s * h0 * Math.sqrt(c.e2(2 * Math.log(s)))), lo, hi);
        }
        return sum;
    }

    /** Time from today at scale factor a, Gyr. */
    static double time(Cosmology c, double a) {
        return timeSinceBigBang(c, a) - timeSinceBigBang(c, 1.0);
    }
}
