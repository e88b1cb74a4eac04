package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The table against the direct integral, its convergence, its derivatives and its edges. */
class TableAccuracyTest {

    /**
     * The lookup reproduces the direct integral t(a) = &int; da/(a H) to 1e-9 relative
     * (the accuracy the design asks for; common practice for the check itself: invert the
     * quadrature at chosen a and compare).
     */
    @Test
    void lookupMatchesTheDirectIntegral() {
        double h0 = 67.5;
        Cosmology c = new Cosmology(h0, 0.31, Cosmology.radiationFromCmb(h0, Cosmology.T_CMB_K, Cosmology.N_EFF),
                0.02, new W0WaDarkEnergy(-0.95, -0.3));
        ExpansionTable t = c.solve();
        double age = DirectIntegral.timeSinceBigBang(c, 1.0);
        assertEquals(age, t.ageGyr(), 1e-11 * age);
        for (double a : new double[] {2e-3, 0.01, 0.07, 0.3, 0.49, 0.51, 0.8, 1.3, 4, 9}) {
            double tt = DirectIntegral.timeSinceBigBang(c, a) - age;
            assertEquals(a, t.scaleFactor(tt), 1e-9 * a, "a at a = " + a);
            double hub = c.h0PerGyr() * Math.sqrt(c.e2(Math.log(a)));
            assertEquals(hub, t.hubbleRate(tt), 1e-9 * hub, "H at a = " + a);
        }
    }

    private static double worstLnAError(double stepScale) {
        double om = 0.3;
        double ol = 0.7;
        Cosmology c = new Cosmology(70, om, 0, 0, new ConstantW(-1));
        ExpansionTable t = new TableBuilder(c, new TableBuilder.Options(100, stepScale, false)).build();
        double h0 = c.h0PerGyr();
        double age = t.ageGyr();
        double worst = 0;
        for (double tt = -7; tt <= 60; tt += 0.00731) {
            double x = 1.5 * Math.sqrt(ol) * h0 * (tt + age);
            double lnA = Math.log(Math.cbrt(om / ol)) + 2.0 / 3 * Math.log(Math.sinh(x));
            worst = Math.max(worst, Math.abs(t.lnScaleFactor(tt) - lnA));
        }
        return worst;
    }

    /**
     * Halving the spacing of the middle segment shrinks the interpolation error by 2^6: quintic
     * Hermite interpolation is sixth order (common practice; error term f^(6) h^6 / 6!).
     * Coarse spacings (8 and 4 times the standard) keep the error far above round-off.
     */
    @Test
    void halvingTheSpacingShrinksTheErrorAtSixthOrder() {
        double coarse = worstLnAError(8);
        double fine = worstLnAError(4);
        double order = Math.log(coarse / fine) / Math.log(2);
        assertTrue(fine > 1e-13, "still above round-off: " + fine);
        assertTrue(order > 5.5 && order < 6.5, "observed order " + order + " (" + coarse + " -> " + fine + ")");
    }

    /** The rates agree with the derivatives of the values (central differences, error h^2 f'''/6). */
    @Test
    void ratesAreTheDerivativesOfTheValues() {
        ExpansionTable t = new Cosmology(70, 0.3, 0, 0, new W0WaDarkEnergy(-1.1, 0.3)).solve();
        double h = 1e-4;
        for (double tt : new double[] {-12, -3, 0, 4, 15}) {
            double kRate = (t.darkEnergyAcceleration(tt + h) - t.darkEnergyAcceleration(tt - h)) / (2 * h);
            assertEquals(kRate, t.darkEnergyAccelerationRate(tt), 1e-7 * Math.abs(kRate) + 1e-14, "dk/dt at " + tt);
            double hRate = (t.lnScaleFactor(tt + h) - t.lnScaleFactor(tt - h)) / (2 * h);
            assertEquals(hRate, t.hubbleRate(tt), 1e-6 * hRate, "H = d ln a/dt at " + tt);
            double hub = t.hubbleRate(tt);
            double hDot = (t.hubbleRate(tt + h) - t.hubbleRate(tt - h)) / (2 * h);
            assertEquals(hDot + hub * hub, t.totalAcceleration(tt), 1e-6 * Math.abs(hDot + hub * hub), "a''/a at " + tt);
        }
    }

    /**
     * Negative dark energy (Omega_de = -0.2, flat) recollapses. The Friedmann equation depends on
     * a only, so the collapse retraces the expansion: a(t_max + x) = a(t_max - x), H changes sign
     * (common practice), and the crunch comes as long after the turnaround as the Big Bang before it.
     */
    @Test
    void negativeDarkEnergyRecollapsesSymmetrically() {
        Cosmology c = new Cosmology(70, 1.2, 0, 0, new ConstantW(-1));
        ExpansionTable t = c.solve();
        double tMax = t.maxExpansionGyr().getAsDouble();
        assertEquals(2 * tMax + t.ageGyr(), t.crunchGyr().getAsDouble(), 1e-12 * tMax);
        for (double x : new double[] {0.01, 1, 5, 10}) {
            assertEquals(t.scaleFactor(tMax - x), t.scaleFactor(tMax + x), 1e-13);
            assertEquals(-t.hubbleRate(tMax - x), t.hubbleRate(tMax + x), 1e-15);
        }
        // at the turnaround H = 0: E^2(a_max) = 0 (the defining condition)
        assertEquals(0.0, c.e2(Math.log(t.maxScaleFactor().getAsDouble())), 1e-13);
        assertEquals(0.0, t.hubbleRate(tMax), 1e-12 * c.h0PerGyr());
        // the crunch time against the direct integral to a_max (twice the time from the Big Bang)
        double toMax = DirectIntegralToTurnaround.time(c, t.maxScaleFactor().getAsDouble());
        assertEquals(toMax, tMax + t.ageGyr(), 1e-9 * toMax);
    }

    /** H^2 reaching 0 going back in time means a bounce, not a Big Bang: a clear refusal. */
    @Test
    void aBounceIsRefused() {
        Cosmology c = new Cosmology(70, 0.01, 0, -1.5, new ConstantW(-1));
        InvalidCosmologyException e = assertThrows(InvalidCosmologyException.class, c::solve);
        assertTrue(e.getMessage().contains("no Big Bang"), e.getMessage());
    }

    @Test
    void unphysicalParametersNameThemselves() {
        assertEquals("h0", assertThrows(InvalidCosmologyException.class,
                () -> new Cosmology(-70, 0.3, 0, 0, new ConstantW(-1))).parameter());
        assertEquals("omega_m", assertThrows(InvalidCosmologyException.class,
                () -> new Cosmology(70, -0.3, 0, 0, new ConstantW(-1))).parameter());
        assertEquals("omega_k", assertThrows(InvalidCosmologyException.class,
                () -> new Cosmology(70, 0.3, 0, Double.NaN, new ConstantW(-1))).parameter());
        assertEquals("omega_m", assertThrows(InvalidCosmologyException.class,
                () -> new Cosmology(70, 0, 0, 0, new ConstantW(-1))).parameter());
    }

    @Test
    void lookupsBeforeTheBigBangAreErrors() {
        ExpansionTable t = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve();
        ExpansionRangeException e = assertThrows(ExpansionRangeException.class, () -> t.scaleFactor(-20));
        assertTrue(e.getMessage().contains("before the Big Bang"), e.getMessage());
        assertEquals(-20, e.tGyr());
        assertTrue(t.earliestGyr() > -t.ageGyr() && t.earliestGyr() < -t.ageGyr() + 1.1e-5);
        assertTrue(t.scaleFactor(t.earliestGyr()) > 0);
        assertThrows(ExpansionRangeException.class, () -> t.hubbleRate(t.latestGyr() + 1));
    }
}
