package org.holdfast.forces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.holdfast.halos.HernquistHalo;
import org.holdfast.units.Units;
import org.holdfast.group.CoulombLog;
import org.junit.jupiter.api.Test;

/** Dynamical friction between comparable masses: each pair braked once, the Coulomb logarithm aware of the mass ratio. */
class FrictionPairTest {

    /** The drag on the second of two Hernquist halos (lengths scaled as M^(1/3)), 30 kpc apart at 150 km/s. */
    private static double[] drag(double m2, CoulombLog log) {
        Bodies b = new Bodies(2);
        double m1 = 1e12;
        b.add("Ashlar", new HernquistHalo(m1, 30), 0, new double[3], new double[3]);
        b.add("Brisk", new HernquistHalo(m2, 30 * Math.cbrt(m2 / m1)), 1, new double[] {30, 0, 0},
                new double[] {0, Units.kmsToKpcPerGyr(150), 0});
        DynamicalFriction f = new DynamicalFriction(log, Map.of());
        f.refresh(b);
        f.accelerate(b);
        return new double[] {b.ay[0], b.ay[1]};
    }

    @Test
    void theDragIsContinuousAcrossEqualMasses() {
        // Counting each pair once: at q = 1 either member may be the satellite and the force is the
        // same for identical halos, so the drag has no jump there (braking both ways would double it).
        CoulombLog three = CoulombLog.constant(3);
        double[] below = drag(1e12 * (1 - 1e-9), three);
        double[] at = drag(1e12, three);
        double[] above = drag(1e12 * (1 + 1e-9), three);
        for (int i = 0; i < 2; i++) {
            assertEquals(below[i], at[i], 1e-6 * Math.abs(below[i]), "member " + i);
            assertEquals(above[i], at[i], 1e-6 * Math.abs(above[i]), "member " + i);
        }
        // Newton's third law for equal masses: equal and opposite (common practice)
        assertEquals(-at[0], at[1], 1e-12 * Math.abs(at[1]));
        assertTrue(at[1] < 0, "the drag opposes the relative motion");
    }

    @Test
    void theDefaultCoulombLogarithmFollowsTheMassRatio() {
        // ln(1 + M_host / M_sat) (Binney & Tremaine 2008 sec. 8.1; Jiang et al. 2008, ApJ 675, 1095)
        CoulombLog d = CoulombLog.DEFAULT;
        assertEquals(Math.log(2), d.at(50, 5, 1e12, 1e12), 1e-15);
        assertEquals(Math.log(11), d.at(50, 5, 1e12, 1e11), 1e-15);
        assertEquals(Math.log(101), d.at(1, 5, 1e12, 1e10), 1e-15);
        assertEquals("mass-ratio", d.toString());
        // equal masses: ln 2 instead of 3, and one braking instead of two: 3 * 2 / ln 2 = 8.7 times less drag
        double[] old = drag(1e12, CoulombLog.constant(3));
        double[] now = drag(1e12, d);
        assertEquals(Math.log(2) / 3, now[1] / old[1], 1e-12);
    }
}
