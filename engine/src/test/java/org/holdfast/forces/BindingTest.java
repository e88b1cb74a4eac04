package org.holdfast.forces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.units.Units;
import org.holdfast.forces.Binding;
import org.junit.jupiter.api.Test;

class BindingTest {

    /** k = Omega_L H0^2 for H0 = 70 km/s/Mpc, Omega_L = 0.7 (a cosmological constant). */
    private static final double K_LAMBDA = 0.7 * Math.pow(Units.hubbleToPerGyr(70), 2);
    private static final double M = 4e12;

    @Test
    void barrierWithoutAngularMomentumIsTheZeroGravityRadius() {
        // Zero-gravity radius R = (G M / (Omega_L H0^2))^(1/3) = 1711.8 kpc for M = 4e12 Msun,
        // H0 = 70, Omega_L = 0.7 (Chernin and collaborators; value in physics-references.md).
        double r = Binding.barrierRadius(Units.G * M, K_LAMBDA, 0);
        assertEquals(1711.8, r, 0.1);
    }

    @Test
    void atRestInsideTheZeroGravityRadiusIsBoundOutsideIsNot() {
        double r0 = Binding.barrierRadius(Units.G * M, K_LAMBDA, 0);
        assertTrue(Binding.test(M, K_LAMBDA, new double[] {0.9 * r0, 0, 0}, new double[3]).bound());
        assertFalse(Binding.test(M, K_LAMBDA, new double[] {1.1 * r0, 0, 0}, new double[3]).bound());
    }

    @Test
    void barrierIsAStationaryPointOfTheEffectivePotential() {
        // U'(r_b) = 0 at the barrier (definition of the barrier, Nesseris & Perivolaropoulos 2004).
        double gm = Units.G * M;
        double l2 = Math.pow(300 * 200.0, 2);
        double rb = Binding.barrierRadius(gm, K_LAMBDA, l2);
        double h = 1e-4 * rb;
        double slope = (Binding.effectivePotential(gm, K_LAMBDA, l2, rb + h)
                - Binding.effectivePotential(gm, K_LAMBDA, l2, rb - h)) / (2 * h);
        double scale = gm / (rb * rb);
        assertEquals(0, slope / scale, 1e-6);
        // The L term moves the barrier inward (orbits come apart earlier).
        assertTrue(rb < Binding.barrierRadius(gm, K_LAMBDA, 0));
    }

    @Test
    void circularOrbitInLambdaIsBound() {
        // v^2 = G M / r - k r^2 is the circular speed with the repulsive k r term (common practice).
        double r = 800;
        double v = Math.sqrt(Units.G * M / r - K_LAMBDA * r * r);
        assertTrue(Binding.test(M, K_LAMBDA, new double[] {r, 0, 0}, new double[] {0, v, 0}).bound());
        // Twice the angular momentum at the same place: past the barrier's top, unbound.
        assertFalse(Binding.test(M, K_LAMBDA, new double[] {r, 0, 0}, new double[] {0, 2 * v, 0}).bound());
    }

    @Test
    void withoutDarkEnergyTheKeplerCriterionHolds() {
        // Kepler: bound iff v^2 < 2 G M / r (escape speed; any mechanics textbook).
        double r = 500;
        double vEsc = Math.sqrt(2 * Units.G * M / r);
        assertTrue(Binding.test(M, 0, new double[] {r, 0, 0}, new double[] {0, 0.999 * vEsc, 0}).bound());
        assertFalse(Binding.test(M, 0, new double[] {r, 0, 0}, new double[] {0, 1.001 * vEsc, 0}).bound());
    }

    @Test
    void tooMuchAngularMomentumLeavesNoBarrier() {
        double gm = Units.G * M;
        // f(r*) = G M r* - k r*^4 - L^2 <= 0 at r* = (G M / 4k)^(1/3): no bound orbit exists.
        double rStar = Math.cbrt(gm / (4 * K_LAMBDA));
        double l2 = 1.01 * (gm * rStar - K_LAMBDA * Math.pow(rStar, 4));
        assertTrue(Double.isNaN(Binding.barrierRadius(gm, K_LAMBDA, l2)));
    }

    @Test
    void barrierRadiiFoundOnManyThreadsAtOnceAreTheOnesFoundOnOne() throws Exception {
        // A sweep tests binding on all its worker threads at once; each answer must be its own.
        double gm = Units.G * M;
        int n = 4000;
        double[] l2 = new double[n];
        double[] expected = new double[n];
        for (int i = 0; i < n; i++) {
            l2[i] = Math.pow(300 * (20.0 + 0.04 * i), 2);
            expected[i] = Binding.barrierRadius(gm, K_LAMBDA, l2[i]);
        }
        int threads = 4;
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads);
        try {
            java.util.List<java.util.concurrent.Future<Integer>> wrong = new java.util.ArrayList<>();
            for (int t = 0; t < threads; t++) {
                int offset = t;
                wrong.add(pool.submit(() -> {
                    int bad = 0;
                    for (int rep = 0; rep < 20; rep++) {
                        for (int j = 0; j < n; j++) {
                            int i = (j + offset * 997) % n;
                            double r = Binding.barrierRadius(gm, K_LAMBDA, l2[i]);
                            if (Double.doubleToLongBits(r) != Double.doubleToLongBits(expected[i])) {
                                bad++;
                            }
                        }
                    }
                    return bad;
                }));
            }
            for (var f : wrong) {
                assertEquals(0, f.get(), "answers that differ from the one-thread answer");
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
