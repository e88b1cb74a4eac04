package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The timing argument solved with the engine, against the radial Kepler solution. */
@Tag("slow")
class TimingArgumentTest {

    private static TimingArgument pair;
    private static TimingArgument.Solution withLambda;
    private static TimingArgument.Solution without;

    @BeforeAll
    static void solve() {
        // H0 = 70, Omega_Lambda = 0.7 as in the check values; Omega_m = 0.2 and Omega_k = 0.1 only make the universe
        // old enough (over 13.73 Gyr) to integrate back that far. The Lambda force k = Omega_Lambda H0^2 does not
        // depend on Omega_m.
        ExpansionTable t = new Cosmology(70, 0.2, 0, 0.1, new ConstantW(-1)).solve(20);
        assertTrue(t.ageGyr() > 13.73, "age " + t.ageGyr());
        pair = new TimingArgument(t, 784, -130, 13.73);
        withLambda = pair.solve(true);
        without = pair.solve(false);
    }

    @Test
    void withoutDarkEnergyTheMassIsTheRadialKeplerMass() {
        // Kahn & Woltjer 1959, ApJ 130, 705 (from memory): r = A (1 - cos eta), t = B (eta - sin eta), A^3 = G M B^2;
        // r = 784 kpc, v = -130 km/s, t = 13.73 Gyr (inputs of Li & White 2008, MNRAS 384, 1459 — from memory) give
        // eta = 4.2777 rad and M = 5.32e12 Msun (derived from those formulas).
        assertEquals(5.32e12, without.massMsun(), 0.01 * 5.32e12);
        assertEquals(4.2777, pair.keplerPhase(without.massMsun()), 2e-3);
        // the phase also fixes v t / r = sin eta (eta - sin eta) / (1 - cos eta)^2 (same source): a check of
        // the engine's mass through the velocity it was not solved for
        double eta = pair.keplerPhase(without.massMsun());
        double vtr = Math.sin(eta) * (eta - Math.sin(eta)) / Math.pow(1 - Math.cos(eta), 2);
        assertEquals(Units.kmsToKpcPerGyr(-130) * 13.73 / 784, vtr, 2e-3 * Math.abs(vtr));
        // farthest apart at eta = pi: r_max = 2A, with A = r / (1 - cos eta)
        assertEquals(2 * 784 / (1 - Math.cos(eta)), without.maxSeparationKpc(), 2e-3 * without.maxSeparationKpc());
    }

    @Test
    void lambdaRaisesTheMassByAboutThirteenPercent() {
        // r'' = -G M / r^2 + Omega_Lambda H0^2 r for Omega_Lambda = 0.7, h = 0.7: 6.03e12 Msun (+13.4%), derived by
        // integrating that equation; Partridge, Lahav & Hoffman 2013, MNRAS 436, L45 report about 13%.
        assertEquals(6.03e12, withLambda.massMsun(), 0.01 * 6.03e12);
        double rise = withLambda.massMsun() / without.massMsun() - 1;
        assertEquals(0.134, rise, 0.01);
    }
}
