package org.holdfast.expansion;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Time from the Big Bang to the turnaround, independently of the table: &int;_0^a_max a da /
 * (H0 sqrt(P(a))) with P = a^4 E^2, substituting a = a_max sin^2(theta) so that the square-root
 * zero at a_max becomes harmless: da = 2 a_max sin cos d theta and P ~ (a_max - a) = a_max cos^2.
 */
final class DirectIntegralToTurnaround {

    private DirectIntegralToTurnaround() {
    }

    static double time(Cosmology c, double aMax) {
        double h0 = c.h0PerGyr();
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-300, 2, 64);
        double sum = 0;
        int pieces = 64;
        for (int i = 0; i < pieces; i++) {
            double lo = 0.5 * Math.PI * i / pieces;
            double hi = 0.5 * Math.PI * (i + 1) / pieces;
            sum += gl.integrate(10_000_000, th -> {
                double s = Math.sin(th);
                double co = Math.cos(th);
                if (s == 0 || co == 0) {
                    return s == 0 ? 0 : integrandAtTop(c, aMax, h0);
                }
                double a = aMax * s * s;
                double p = a * a * a * a * c.e2(Math.log(a));
                return a * 2 * aMax * s * co / (h0 * Math.sqrt(p));
            }, lo, hi);
        }
        return sum;
    }

    /** Limit at theta = pi/2 from P ~ -P'(a_max) (a_max - a), for a cosmological-constant model. */
    private static double integrandAtTop(Cosmology c, double aMax, double h0) {
        double dP = c.omegaM() + 2 * c.omegaK() * aMax + 4 * c.omegaDe() * aMax * aMax * aMax;
        return aMax * 2 * aMax / (h0 * Math.sqrt(-dP * aMax));
    }
}
