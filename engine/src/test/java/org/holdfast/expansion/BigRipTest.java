package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Phantom dark energy and the big rip: Caldwell, Kamionkowski &amp; Weinberg 2003, PRL 91, 071301,
 * eq. 2: t_rip - t0 ~ (2/3) |1+w|^-1 H0^-1 (1 - Om)^-1/2, and the exact integral of da/(a H)
 * from a = 1 to infinity (values in /work/shared/physics-references.md: 21.68, 54.86, 110.4 Gyr).
 */
class BigRipTest {

    private static final double OM = 0.3;

    /**
     * The exact time to the rip for flat matter + constant w, by an independent quadrature: with
     * a = 1/s and s = v^m, m = 2/(3|1+w|), the integral becomes
     * &int;_0^1 m v^(m-1) s^(p-1) / (H0 sqrt(Om s^(3+2p) + OL)) dv with p = 3|1+w|/2, whose integrand
     * m / (H0 sqrt(...)) is smooth.
     */
    private static double exactRip(double w, double h0) {
        double p = -1.5 * (1 + w);
        double m = 1 / p;
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(8, 1e-15, 1e-300, 2, 64);
        return gl.integrate(10_000_000, v -> {
            double s = Math.pow(v, m);
            return m / (h0 * Math.sqrt(OM * Math.pow(s, 3 + 2 * p) + (1 - OM)));
        }, 0, 1);
    }

    @ParameterizedTest
    @CsvSource({"-1.5, 21.68, 22.26", "-1.2, 54.86, 55.65", "-1.1, 110.4, 111.3"})
    void ripTimeMatchesTheExactIntegralAndTheEstimate(double w, double quotedExact, double quotedEstimate) {
        ExpansionTable t = new Cosmology(70, OM, 0, 0, new ConstantW(w)).solve();
        double h0 = t.cosmology().h0PerGyr();
        double rip = t.ripGyr().getAsDouble();
        double exact = exactRip(w, h0);
        assertEquals(exact, rip, 1e-8 * exact, "rip against the direct integral");
        assertEquals(quotedExact, rip, 0.006, "the quoted value (rounded)");
        double estimate = 2.0 / 3 / Math.abs(1 + w) / h0 / Math.sqrt(1 - OM);
        assertEquals(quotedEstimate, estimate, 0.006);
        // the estimate neglects the matter that still slows the expansion: it comes out later
        assertTrue(rip < estimate && rip > 0.97 * estimate, rip + " vs " + estimate);
    }

    @ParameterizedTest
    @CsvSource({"-1.5", "-1.2"})
    void lookupsStopJustBeforeTheRipAndNeverReturnNaN(double w) {
        ExpansionTable t = new Cosmology(70, OM, 0, 0, new ConstantW(w)).solve();
        double rip = t.ripGyr().getAsDouble();
        // documented rule: lookups end 1e-7 of (t_rip - t_BB) before the rip (a run, and its
        // snapshots, reach within a millionth of the rip time)
        assertEquals(rip - 1e-7 * (rip + t.ageGyr()), t.latestGyr(), 1e-10 * rip);
        double end = t.latestGyr();
        double h = t.hubbleRate(end);
        // close to the rip H = 2 / (3 |1+w| (t_rip - t)) (Caldwell et al. 2003, from a ~ (t_rip - t)^(2/(3(1+w))))
        double expected = 2 / (3 * Math.abs(1 + w) * (rip - end));
        assertEquals(expected, h, 1e-6 * expected);
        assertTrue(Double.isFinite(t.scaleFactor(end)) && Double.isFinite(t.darkEnergyAcceleration(end)));
        ExpansionRangeException past = assertThrows(ExpansionRangeException.class, () -> t.hubbleRate(rip + 1));
        assertTrue(past.getMessage().contains("big rip"), past.getMessage());
        assertThrows(ExpansionRangeException.class, () -> t.darkEnergyAcceleration(0.5 * (end + rip)));
        assertThrows(ExpansionRangeException.class, () -> t.scaleFactor(Double.NaN));
    }

    /** Age today for w = -1.5, Om = 0.3, H0 = 70, flat (physics-references.md: 14.273 Gyr, derived). */
    @org.junit.jupiter.api.Test
    void phantomAge() {
        Cosmology c = new Cosmology(70, OM, 0, 0, new ConstantW(-1.5));
        ExpansionTable t = c.solve();
        assertEquals(14.273, t.ageGyr(), 5e-4);
        assertEquals(DirectIntegral.timeSinceBigBang(c, 1.0), t.ageGyr(), 1e-11 * t.ageGyr());
    }
}
