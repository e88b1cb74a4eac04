package org.holdfast.halos;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** The isotropic velocity dispersion of halos against closed forms and a published fit. */
class JeansDispersionTest {

    @Test
    void plummerMatchesItsClosedForm() {
        // isotropic Plummer sphere: sigma^2 = G M / (6 sqrt(r^2 + b^2)) (Dejonghe 1987, MNRAS 224, 13 — from memory;
        // follows from rho sigma^2 = integral of rho G M / r^2 with rho ~ (r^2 + b^2)^-5/2, done by hand)
        PlummerHalo h = new PlummerHalo(1e11, 8);
        JeansDispersion d = JeansDispersion.of(h);
        for (double r : new double[] {0.01, 0.5, 3, 8, 20, 100, 500}) {
            double exact = Math.sqrt(Units.G * 1e11 / (6 * Math.sqrt(r * r + 64)));
            assertEquals(exact, d.sigma(r), 2e-4 * exact, "r = " + r);
        }
    }

    @Test
    void truncatedIsothermalSphereHasItsClosedForm() {
        // rho sigma^2 = integral_r^R (v_c^2 / (4 pi G s^2)) (v_c^2 / s) ds = rho (v_c^2 / 2)(1 - r^2/R^2), so
        // sigma = v_c / sqrt(2) deep inside (Binney & Tremaine 2008, eq. 4.103)
        IsothermalHalo h = new IsothermalHalo(1e12, 300);
        double vc = h.circularSpeed(10);
        JeansDispersion d = JeansDispersion.of(h);
        assertEquals(vc / Math.sqrt(2), d.sigma(1e-3), 1e-6 * vc);
        assertEquals(vc / Math.sqrt(2) * Math.sqrt(1 - 0.25), d.sigma(150), 1e-12 * vc);
        assertEquals(0.0, d.sigma(300));
    }

    @Test
    void nfwFollowsTheZentnerBullockFit() {
        // Zentner & Bullock 2003, ApJ 598, 49 (from memory): sigma(x) = V_max 1.4393 x^0.354 / (1 + 1.1756 x^0.725)
        // within 1.6% of the isotropic Jeans solution for 0.01 <= x <= 30. Truncated far out (1000 r_s) so that
        // the missing outer pressure is negligible at x <= 30.
        double rs = 20;
        NfwHalo h = new NfwHalo(1e12, rs, 1000 * rs);
        double vmax = h.circularSpeed(2.16258 * rs);
        JeansDispersion d = JeansDispersion.of(h);
        for (double x : new double[] {0.01, 0.03, 0.1, 0.3, 1, 3, 10, 30}) {
            double fit = vmax * 1.4393 * Math.pow(x, 0.354) / (1 + 1.1756 * Math.pow(x, 0.725));
            assertEquals(fit, d.sigma(x * rs), 0.016 * fit, "x = " + x);
        }
    }
}
