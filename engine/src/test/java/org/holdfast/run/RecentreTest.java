package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.forces.BackgroundTide;
import org.holdfast.forces.Bodies;
import org.holdfast.integrators.Scheme;
import org.junit.jupiter.api.Test;

/**
 * Taking out the centre of mass's drift ({@link GroupSystem#recentre}): it moves every body by
 * the same offset and velocity, leaves the relative motion alone, and books the change of the
 * kinetic energy and the dark-energy potential -(1/2) k sum m r^2 so that the budget is the same
 * before and after (the potential's form: the budget of {@link GroupSystem}; a shift of the
 * origin changes sum m r^2 by M d^2 - 2 d . sum m r, common practice).
 */
class RecentreTest {

    private static Simulation pair() {
        return Simulation.create(Groups.of(
                Groups.point("Tamsel", 1.2e12, new double[] {0, 0, 0}, new double[] {0, 0, 0}),
                Groups.point("Orrin", 4e11, new double[] {400, 0, 0}, new double[] {0, 129.05, 0})),
                Groups.adaptive(Scheme.LEAPFROG, 10, 0.01, true), FlatLambdaHistory.standard(), 1);
    }

    @Test
    void aDriftedCentreOfMassIsPutBackWithTheBudgetUnchanged() {
        try (Simulation sim = pair()) {
            GroupSystem s = sim.system();
            Bodies b = s.bodies;
            double sep0 = b.x[1] - b.x[0];
            // a large drift (1000 kpc, 50 kpc/Gyr), so the terms booked are large against rounding
            for (int i = 0; i < 2; i++) {
                b.x[i] += 1000;
                b.y[i] -= 300;
                b.vz[i] += 50;
            }
            double before = s.energyBudget();
            double scale = s.kineticEnergy() + Math.abs(0.5 * s.tide.coefficient(s.time()) * BackgroundTide.secondMoment(b));
            assertTrue(s.recentre(Simulation.RECENTRE_FRACTION));
            double m = b.mass[0] + b.mass[1];
            assertEquals(0, (b.mass[0] * b.x[0] + b.mass[1] * b.x[1]) / m, 1e-12);
            assertEquals(0, (b.mass[0] * b.y[0] + b.mass[1] * b.y[1]) / m, 1e-12);
            assertEquals(0, (b.mass[0] * b.vz[0] + b.mass[1] * b.vz[1]) / m, 1e-12);
            assertEquals(sep0, b.x[1] - b.x[0], 1e-12 * 1000);
            assertTrue(Math.abs(s.recentredEnergy()) > 1e-3 * scale, "booked " + s.recentredEnergy());
            assertEquals(before, s.energyBudget(), 1e-13 * scale);
            // once centred, it is left alone
            assertFalse(s.recentre(Simulation.RECENTRE_FRACTION));
        }
    }
}
