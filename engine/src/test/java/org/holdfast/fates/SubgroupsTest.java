package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

class SubgroupsTest {

    private static final double K = 0.7 * Math.pow(Units.hubbleToPerGyr(70), 2);

    @Test
    void twoDistantPairsAreTwoSubgroups() {
        // Two tight pairs 20 Mpc apart: each pair is bound, the pairs are far beyond each
        // other's zero-gravity radius (a few Mpc for 1e12 Msun; common practice).
        double[] m = {1e12, 1e12, 1e12, 1e12};
        double[][] x = {{0, 100, 20000, 20100}, {0, 0, 0, 0}, {0, 0, 0, 0}};
        double[][] v = {{0, 0, 0, 0}, {0, 0, 0, 0}, {0, 0, 0, 0}};
        Subgroups s = Subgroups.find(4, m, x, v, K);
        assertTrue(s.together(0, 1));
        assertTrue(s.together(2, 3));
        assertFalse(s.together(0, 2));
        assertEquals(2, s.joins().size());
    }

    @Test
    void aSatelliteJoinsThePairItOrbitsAfterThePair() {
        // A tight pair and a satellite 600 kpc away at rest: the pair joins first (deepest),
        // then the satellite joins the pair.
        double[] m = {1e12, 1e12, 1e10};
        double[][] x = {{0, 50, 600}, {0, 0, 0}, {0, 0, 0}};
        double[][] v = {{0, 0, 0}, {0, 0, 0}, {0, 0, 0}};
        Subgroups s = Subgroups.find(3, m, x, v, K);
        assertTrue(s.together(0, 2));
        assertEquals(2, s.joins().size());
        assertEquals(1, s.joins().get(0).left().length + s.joins().get(0).right().length - 1);
        assertTrue(s.anyBoundPair());
    }

    @Test
    void aFastFlybyIsNotBound() {
        double[] m = {1e12, 1e12};
        double[][] x = {{0, 300}, {0, 0}, {0, 0}};
        double[][] v = {{0, 0}, {0, 2000}, {0, 0}};
        Subgroups s = Subgroups.find(2, m, x, v, K);
        assertFalse(s.anyBoundPair());
    }
}
