package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.forces.Binding;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

class RipLadderTest {

    private static final ExpansionTable PHANTOM = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1.5)).solve();

    private static RipLadder.Rung rung(List<RipLadder.Rung> l, String key) {
        return l.stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    void roughRuleIsCaldwellKamionkowskiWeinberg() {
        // Caldwell, Kamionkowski & Weinberg 2003, PRL 91, 071301: P sqrt(2|1+3w|)/(6 pi |1+w|),
        // a factor 0.2807 for w = -1.5 (physics-references.md)
        List<RipLadder.Rung> l = RipLadder.of(PHANTOM, "g", 2e12, 500);
        for (RipLadder.Rung r : l) {
            assertEquals(0.2807, r.ckwBeforeRipGyr() / r.periodGyr(), 1e-4, r.system());
        }
        // a one-year orbit about 3.4 months before (same source)
        double months = rung(l, "solar_system").ckwBeforeRipGyr() * 1e9 * 12;
        assertEquals(3.4, months, 0.05);
    }

    @Test
    void galaxyComesApartAsTheEffectivePotentialPredicts() {
        List<RipLadder.Rung> l = RipLadder.of(PHANTOM, "g", 2e12, 500);
        RipLadder.Rung g = rung(l, "galaxy");
        // Nesseris & Perivolaropoulos 2004 (PRD 70, 123529, from memory): a galaxy-sized orbit
        // comes apart about 180 Myr before the rip rather than the rough rule's 60 Myr
        assertEquals(0.18, g.holdfastBeforeRipGyr(), 0.02);
        assertEquals(0.060, g.ckwBeforeRipGyr(), 0.002);
        // holdfast's own Binding finds a barrier just before that time and none just after
        double rip = PHANTOM.ripGyr().getAsDouble();
        double t = rip - g.holdfastBeforeRipGyr();
        double gm = Units.G * g.massMsun();
        double l2 = gm * g.radiusKpc();
        assertFalse(Double.isNaN(Binding.barrierRadius(gm, PHANTOM.darkEnergyAcceleration(t - 1e-4), l2)));
        assertTrue(Double.isNaN(Binding.barrierRadius(gm, PHANTOM.darkEnergyAcceleration(t + 1e-4), l2)));
    }

    @Test
    void pastTheTableTheLateTimeFormHolds() {
        // beyond the table k ~ tau^-2, so an orbit's criterion k = (27/256) G M/R^3 comes
        // sqrt(256/27) times earlier than k = G M/R^3 (the rough rule's balance, common practice)
        List<RipLadder.Rung> l = RipLadder.of(PHANTOM, "g", 2e12, 500);
        RipLadder.Rung s = rung(l, "solar_system");
        assertEquals(Math.sqrt(256.0 / 27), s.holdfastBeforeRipGyr() / s.ckwBeforeRipGyr(), 2e-3);
        // a planet's surface (no angular momentum): both criteria agree
        RipLadder.Rung p = rung(l, "planet");
        assertEquals(1, p.holdfastBeforeRipGyr() / p.ckwBeforeRipGyr(), 2e-3);
        RipLadder.Rung atom = rung(l, "atom");
        assertTrue(atom.orderOfMagnitude());
        assertTrue(Double.isNaN(atom.holdfastBeforeRipGyr()));
        // the Bohr period 1.52e-16 s (CODATA 2018 values, 2 pi a0 / (alpha c))
        assertEquals(1.52e-16, atom.periodGyr() * Units.GYR_S, 0.01e-16);
    }

    @Test
    void smallerSystemsComeApartLater() {
        List<RipLadder.Rung> l = RipLadder.of(PHANTOM, "g", 2e12, 500);
        for (int i = 1; i < l.size(); i++) {
            assertTrue(l.get(i).beforeRipGyr() < l.get(i - 1).beforeRipGyr(), l.get(i).system());
        }
    }

    @Test
    void noRipNoLadder() {
        ExpansionTable lambda = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve();
        assertTrue(RipLadder.of(lambda, "g", 2e12, 500).isEmpty());
    }
}
