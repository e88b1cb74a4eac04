package org.holdfast.halos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The tidal radius against its closed forms. */
class TidalRadiusTest {

    @Test
    void aPointHostGivesTheJacobiRadius() {
        // r_J = (m / (3 M))^(1/3) D for a point host and a satellite whose mass lies inside r_J
        // (King 1962, AJ 67, 471; Binney & Tremaine 2008 eq. 8.108): a small Plummer sphere's
        // mass inside r_J is nearly all of it, so solve m(<r)/r^3 = 3 M / D^3 and check the root.
        HaloProfile host = new PointHalo(1e12, 0);
        HaloProfile sat = new PlummerHalo(1e10, 0.5);
        double d = 200;
        double rt = TidalRadius.of(sat, host, 1, d);
        assertEquals(3 * 1e12 / (d * d * d), sat.enclosedMass(rt) / (rt * rt * rt), 1e-9 * 3e12 / (d * d * d));
        double jacobi = Math.cbrt(sat.enclosedMass(rt) / 3e12) * d;
        assertEquals(jacobi, rt, 1e-9 * rt);
        assertEquals(Math.cbrt(1e10 / 3e12) * d, rt, 0.01 * rt);
    }

    @Test
    void aSingularIsothermalHostHasGammaOne() {
        // M(<D) proportional to D: d ln M / d ln D = 1, so m(<r_t) / r_t^3 = 2 M(D) / D^3 (King 1962 with
        // Omega^2 - Phi'' = (G M / D^3)(3 - gamma), derived in TidalRadius)
        HaloProfile host = new IsothermalHalo(1e12, 300);
        HaloProfile sat = new HernquistHalo(2e10, 3);
        double d = 60;
        double rt = TidalRadius.of(sat, host, 1, d);
        double target = 2 * host.enclosedMass(d) / (d * d * d);
        assertEquals(target, sat.enclosedMass(rt) / (rt * rt * rt), 1e-9 * target);
        // a host with twice the mass (mass it gained) pulls the radius in
        assertTrue(TidalRadius.of(sat, host, 2, d) < rt);
        // further out the tide is weaker
        assertTrue(TidalRadius.of(sat, host, 1, 2 * d) > rt);
    }

    @Test
    void noTideInsideAConstantDensityCoreAndNoneFromNothing() {
        // inside a Plummer core gamma -> 3 (3 - gamma = O(D^2 / a^2)): the tide all but vanishes,
        // and the tidal radius lies a thousand scale lengths out; at the centre there is none
        HaloProfile host = new PlummerHalo(1e12, 100);
        HaloProfile sat = new HernquistHalo(1e10, 2);
        assertTrue(TidalRadius.of(sat, host, 1, 0.01) > 1000 * 2);
        assertEquals(Double.POSITIVE_INFINITY, TidalRadius.of(sat, host, 1, 0));
        assertEquals(sat.mass(), TidalRadius.boundMass(sat, Double.POSITIVE_INFINITY));
        // a truncated satellite that fits inside its tidal radius keeps everything
        HaloProfile small = new NfwHalo(1e10, 1, 5);
        assertEquals(Double.POSITIVE_INFINITY, TidalRadius.of(small, new PointHalo(1e12, 0), 1, 2000));
    }
}
