package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.units.Units;
import org.holdfast.forces.Binding;
import org.junit.jupiter.api.Test;

/** Binding where it used to go wrong: a negative k, radial orbits, the judgement of "gone for good". */
class BindingCasesTest {

    private static final double K_LAMBDA = 0.7 * Math.pow(Units.hubbleToPerGyr(70), 2);
    private static final double KMS = Units.kmsToKpcPerGyr(1);

    @Test
    void aNegativeKGivesNoCredit() {
        // 500 kpc apart, receding at 400 km/s; escape speed sqrt(2 G M / r) = 59 km/s for
        // M = 2.02e11 Msun (Kepler: common practice). A decaying dark energy (w > -1/3, k < 0)
        // must not call this bound, whatever the size of k.
        double m = Math.pow(59 * KMS, 2) * 500 / (2 * Units.G);
        double[] dx = {500, 0, 0};
        double[] dv = {400 * KMS, 0, 0};
        for (double k : new double[] {-1e-6, -K_LAMBDA, -100 * K_LAMBDA}) {
            Binding.Result r = Binding.test(m, k, dx, dv);
            assertFalse(r.bound(), "k = " + k);
            // with no credit given, the energy is Kepler's
            assertEquals(0.5 * dv[0] * dv[0] - Units.G * m / 500, r.energy(), 1e-12 * dv[0] * dv[0]);
        }
        // and a slow pair (30 km/s) is bound, as without any field (Kepler: E < 0)
        assertTrue(Binding.test(m, -K_LAMBDA, dx, new double[] {30 * KMS, 0, 0}).bound());
    }

    @Test
    void radialOrbitsAlongASkewLineAreExact() {
        // pure infall along (3, -2, 1.7): L^2 is round-off, not zero. The barrier is then the
        // zero-gravity radius (G M / k)^(1/3) (Chernin et al.) to round-off.
        double m = 4e12;
        double r0 = Math.cbrt(Units.G * m / K_LAMBDA);
        double[] u = {3, -2, 1.7};
        double n = Math.sqrt(3 * 3 + 2 * 2 + 1.7 * 1.7);
        for (double frac : new double[] {0.3, 0.99, 1.01}) {
            for (double speed : new double[] {-80, 0, 1e-9, 120}) {
                double[] dx = new double[3];
                double[] dv = new double[3];
                for (int c = 0; c < 3; c++) {
                    dx[c] = u[c] / n * frac * r0;
                    dv[c] = u[c] / n * speed * KMS;
                }
                Binding.Result r = Binding.test(m, K_LAMBDA, dx, dv);
                assertEquals(r0, r.barrierKpc(), 1e-9 * r0, frac + " " + speed);
                double top = -1.5 * Units.G * m / r0; // U(r0) = -GM/r0 - k r0^2/2 = -3/2 GM/r0
                assertEquals(top, r.barrierEnergy(), 1e-9 * Math.abs(top));
            }
        }
    }

    @Test
    void theBarrierIsContinuousAsLGoesToZero() {
        // x - x^4 = lambda near x = 1: x = 1 - lambda/3 + O(lambda^2) (Taylor, common practice)
        double gm = Units.G * 1e12;
        double r0 = Math.cbrt(gm / K_LAMBDA);
        for (double lambda : new double[] {1e-300, 1e-30, 1e-16, 1e-8, 1e-4}) {
            double rb = Binding.barrierRadius(gm, K_LAMBDA, lambda * gm * r0);
            assertEquals(r0 * (1 - lambda / 3), rb, r0 * (2 * lambda * lambda + 1e-15), "lambda " + lambda);
            assertTrue(rb <= r0);
        }
        // the largest angular momentum with a barrier: lambda = (3/4) 4^(-1/3), barrier at 4^(-1/3) r0
        double lMax = 0.75 * Math.cbrt(0.25);
        assertEquals(Math.cbrt(0.25) * r0, Binding.barrierRadius(gm, K_LAMBDA, lMax * (1 - 1e-12) * gm * r0), 1e-4 * r0);
        assertTrue(Double.isNaN(Binding.barrierRadius(gm, K_LAMBDA, lMax * (1 + 1e-12) * gm * r0)));
    }

    @Test
    void goneForGoodOnlyWhenItCannotComeBack() {
        double m = 4e12;
        double r0 = Math.cbrt(Units.G * m / K_LAMBDA);
        // beyond the zero-gravity radius at rest or receding: gone (Chernin et al.; U falls outward there)
        assertTrue(Binding.leftForGood(m, K_LAMBDA, new double[] {1.2 * r0, 0, 0}, new double[3]));
        assertTrue(Binding.leftForGood(m, K_LAMBDA, new double[] {1.2 * r0, 0, 0}, new double[] {50 * KMS, 0, 0}));
        // beyond it but falling in fast enough to cross the barrier: it comes back in
        assertFalse(Binding.leftForGood(m, K_LAMBDA, new double[] {1.2 * r0, 0, 0}, new double[] {-400 * KMS, 0, 0}));
        // inside, unbound and receding: gone; inside, unbound but falling in: not gone yet
        double fast = 900 * KMS;
        assertFalse(Binding.test(m, K_LAMBDA, new double[] {300, 0, 0}, new double[] {fast, 0, 0}).bound());
        assertTrue(Binding.leftForGood(m, K_LAMBDA, new double[] {300, 0, 0}, new double[] {fast, 0, 0}));
        assertFalse(Binding.leftForGood(m, K_LAMBDA, new double[] {300, 0, 0}, new double[] {-fast, 0, 0}));
        // bound is never gone
        assertFalse(Binding.leftForGood(m, K_LAMBDA, new double[] {300, 0, 0}, new double[3]));
        // no field: Kepler's hyperbola past pericentre (E > 0, receding) is gone; before it, not
        assertTrue(Binding.leftForGood(m, 0, new double[] {300, 0, 0}, new double[] {fast, 0, 0}));
        assertFalse(Binding.leftForGood(m, 0, new double[] {300, 0, 0}, new double[] {-fast, 0, 0}));
    }

    @Test
    void theInteractionEnergyDecidesForOverlappingHalos() {
        // the same state, bound as points, unbound with a shallower overlap potential
        double m = 2e12;
        double[] dx = {10, 0, 0};
        double point = -Units.G * m / 10;
        double[] dv = {Math.sqrt(-point) * 1.2, 0, 0}; // (1/2) v^2 = 0.72 |phi_point|
        assertTrue(Binding.test(m, K_LAMBDA, dx, dv).bound());
        assertFalse(Binding.test(m, K_LAMBDA, dx, dv, 0.5 * point).bound());
    }
}
