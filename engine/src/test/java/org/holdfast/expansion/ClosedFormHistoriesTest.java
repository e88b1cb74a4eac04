package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Expansion histories with exact solutions, each checked against its closed form. */
class ClosedFormHistoriesTest {

    private static final double H0 = 70.0;

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }

    /**
     * Flat matter + Lambda: a(t) = (Om/OL)^(1/3) sinh^(2/3)(1.5 sqrt(OL) H0 t),
     * t0 = 2/(3 H0 sqrt(OL)) arsinh(sqrt(OL/Om)) (Carroll, Press &amp; Turner 1992, ARA&amp;A 30, 499,
     * eq. 17 — equation number from memory). H0 = 70, Om = 0.3 gives 13.467 Gyr.
     */
    @Test
    void flatMatterLambdaMatchesTheClosedForm() {
        double om = 0.3;
        double ol = 0.7;
        ExpansionTable t = new Cosmology(H0, om, 0, 0, new ConstantW(-1)).solve();
        double h0 = t.cosmology().h0PerGyr();
        double age = 2 / (3 * h0 * Math.sqrt(ol)) * asinh(Math.sqrt(ol / om));
        assertEquals(13.467, age, 5e-4, "the quoted check value");
        assertEquals(age, t.ageGyr(), 1e-12 * age);
        for (double tt : new double[] {-13.4, -13, -10, -6, -1, 0, 0.5, 3, 10, 40, 200, 900}) {
            double x = 1.5 * Math.sqrt(ol) * h0 * (tt + age);
            double a = Math.cbrt(om / ol) * Math.pow(Math.sinh(x), 2.0 / 3);
            double hub = h0 * Math.sqrt(ol) * Math.cosh(x) / Math.sinh(x);
            assertEquals(a, t.scaleFactor(tt), 1e-9 * a, "a at t = " + tt);
            assertEquals(hub, t.hubbleRate(tt), 1e-9 * hub, "H at t = " + tt);
            // a''/a = H0^2 (OL - Om a^-3 / 2) for this universe (same closed form, differentiated)
            double acc = h0 * h0 * (ol - 0.5 * om / (a * a * a));
            assertEquals(acc, t.totalAcceleration(tt), 1e-9 * (Math.abs(acc) + h0 * h0), "a''/a at t = " + tt);
            assertEquals(h0 * h0 * ol, t.darkEnergyAcceleration(tt), 1e-12 * h0 * h0);
            assertEquals(-0.5 * h0 * h0 * om / (a * a * a), t.matterAcceleration(tt), 1e-9 * h0 * h0 * om / (a * a * a));
        }
        assertEquals(1.0, t.scaleFactor(0), 1e-12);
        // q0 = Om/2 - OL for flat matter + Lambda (common practice)
        assertEquals(0.15 - 0.7, t.cosmology().q0(), 1e-15);
        // acceleration begins where Om a^-3 = 2 OL, a = (Om / (2 OL))^(1/3) (common practice)
        double aAcc = Math.cbrt(om / (2 * ol));
        double tAcc = 2 / (3 * h0 * Math.sqrt(ol)) * asinh(Math.sqrt(ol / om * aAcc * aAcc * aAcc)) - age;
        assertEquals(tAcc, t.accelerationBeganGyr().getAsDouble(), 1e-9);
        assertTrue(t.ripGyr().isEmpty());
        assertTrue(t.crunchGyr().isEmpty());
    }

    /** Einstein–de Sitter: a = (t/t0)^(2/3), t0 = 2/(3 H0) = 9.312 Gyr for H0 = 70 (common practice). */
    @Test
    void einsteinDeSitter() {
        ExpansionTable t = new Cosmology(H0, 1.0, 0, 0, new ConstantW(-1)).solve();
        double t0 = 2 / (3 * t.cosmology().h0PerGyr());
        assertEquals(9.312, t0, 5e-4);
        assertEquals(t0, t.ageGyr(), 1e-12 * t0);
        for (double tt : new double[] {-9.3, -9, -5, 0, 5, 100, 900}) {
            double a = Math.pow((tt + t0) / t0, 2.0 / 3);
            assertEquals(a, t.scaleFactor(tt), 1e-9 * a, "a at t = " + tt);
            assertEquals(2 / (3 * (tt + t0)), t.hubbleRate(tt), 1e-9 * 2 / (3 * (tt + t0)));
        }
        assertEquals(0.5, t.cosmology().q0(), 1e-15);
        assertTrue(t.accelerationBeganGyr().isEmpty(), "matter alone never accelerates");
        assertEquals(0.0, t.darkEnergyAcceleration(3.0));
    }

    /**
     * Closed dust universe, the cycloid: a = A (1 - cos eta), t - t_BB = B (eta - sin eta) with
     * A = Om / (2 (Om - 1)), B = Om / (2 H0 (Om - 1)^(3/2)); turnaround at eta = pi, crunch at
     * 2 pi (Friedmann 1922; e.g. Peebles 1993, Principles of Physical Cosmology, eq. 13.11 —
     * equation number from memory).
     */
    @Test
    void closedMatterUniverseIsTheCycloid() {
        double om = 2.0;
        ExpansionTable t = new Cosmology(H0, om, 0, 1 - om, new ConstantW(-1)).solve();
        double h0 = t.cosmology().h0PerGyr();
        double amp = om / (2 * (om - 1));
        double b = om / (2 * h0 * Math.pow(om - 1, 1.5));
        double etaToday = Math.acos(1 - 1 / amp);
        double age = b * (etaToday - Math.sin(etaToday));
        assertEquals(age, t.ageGyr(), 1e-11 * age);
        assertEquals(2 * amp, t.maxScaleFactor().getAsDouble(), 1e-13);
        assertEquals(Math.PI * b - age, t.maxExpansionGyr().getAsDouble(), 1e-11 * Math.PI * b);
        assertEquals(2 * Math.PI * b - age, t.crunchGyr().getAsDouble(), 1e-11 * Math.PI * b);
        for (double eta : new double[] {0.3, 1.0, 2.0, 3.0, Math.PI, 3.3, 4.5, 5.8}) {
            double tt = b * (eta - Math.sin(eta)) - age;
            double a = amp * (1 - Math.cos(eta));
            double hub = Math.sin(eta) / (b * (1 - Math.cos(eta)) * (1 - Math.cos(eta))) * amp / amp;
            assertEquals(a, t.scaleFactor(tt), 1e-9 * a, "a at eta = " + eta);
            assertEquals(hub, t.hubbleRate(tt), 1e-9 * h0, "H at eta = " + eta);
        }
        assertTrue(t.hubbleRate(t.maxExpansionGyr().getAsDouble() + 1) < 0, "contracting after the turnaround");
        ExpansionRangeException e = assertThrows(ExpansionRangeException.class,
                () -> t.scaleFactor(t.crunchGyr().getAsDouble() + 0.1));
        assertTrue(e.getMessage().contains("crunch"), e.getMessage());
    }
}
