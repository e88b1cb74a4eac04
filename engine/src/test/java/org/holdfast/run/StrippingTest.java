package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.halos.Halos;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** Tidal stripping during a run: mass only lost, never regained; mass, momentum and the budget kept. */
class StrippingTest {

    private static final HaloSpec NFW = new HaloSpec("nfw", Double.NaN, Double.NaN, 10, Double.NaN);

    private static final class Watch implements RunObserver {
        double lastSatMass = Double.POSITIVE_INFINITY;
        boolean regained;
        double maxMassError;
        double maxMomentum;
        double total;

        @Override
        public void init(RunView v) {
            for (int i = 0; i < v.bodyCount(); i++) {
                total += v.bodyMass()[i];
            }
        }

        @Override
        public void afterStep(RunView v) {
            double m = 0;
            double p = 0;
            for (int i = 0; i < v.bodyCount(); i++) {
                m += v.bodyMass()[i];
                p = Math.max(p, Math.abs(sum(v.bodyMass(), v.bodyVx(), v.bodyCount())));
            }
            maxMassError = Math.max(maxMassError, Math.abs(m - total) / total);
            maxMomentum = Math.max(maxMomentum, p);
            if (v.bodyCount() == 2) {
                regained |= v.bodyMass()[1] > lastSatMass;
                lastSatMass = v.bodyMass()[1];
            }
        }

        private static double sum(double[] m, double[] u, int n) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += m[i] * u[i];
            }
            return s;
        }
    }

    @Test
    void aSatelliteLosesMassToItsHostAndNeverRegainsIt() {
        FlatLambdaHistory h = FlatLambdaHistory.standard();
        double rvir = Halos.r200(1e12, h.criticalDensityToday());
        double vKms = Units.kpcPerGyrToKms(Math.sqrt(Units.G * 1e12 / rvir));
        GroupSpec g = Groups.of(new GalaxySpec("Hollin", 1e12, new double[3], new double[3], NFW, null),
                new GalaxySpec("Sprig", 1e11, new double[] {rvir, 0, 0}, new double[] {-0.8 * vKms, 0.6 * vKms, 0},
                        NFW, null));
        RunSettings s = Groups.adaptive(Scheme.YOSHIDA4, 3, 0.01, false).withFriction(true, CoulombLog.DEFAULT);
        Watch w = new Watch();
        try (Simulation sim = Simulation.create(g, s, h)) {
            sim.run(List.of(w));
            assertEquals(2, sim.bodyCount(), "not merged yet after 3 Gyr (the fit of Boylan-Kolchin et al. 2008 says 5.5)");
            double stripped = sim.strippedMassMsun("Sprig");
            // what the satellite lost is what it was given minus what it keeps, and the host holds it
            assertEquals(1e11 - sim.bodyMass()[1], stripped, 1e-6 * 1e11);
            assertEquals(1e12 + stripped, sim.bodyMass()[0], 1e-6 * 1e11);
            assertTrue(stripped > 0.3e11, "stripped " + stripped);
            // the budget books the energy the transfers change: it stays a measure of integration error
            assertTrue(sim.energyResidual() < 1e-4, "budget residual " + sim.energyResidual());
        }
        assertTrue(!w.regained, "the satellite regained mass");
        assertTrue(w.maxMassError < 1e-14, "total mass changed by " + w.maxMassError);
        assertTrue(w.maxMomentum < 1e-9 * 1e11 * Units.kmsToKpcPerGyr(vKms), "momentum " + w.maxMomentum);
    }

    @Test
    void twoEqualHalosOnA150KmsOrbitAreNotKilledAtOnce() {
        // Two 1e12 Msun halos 100 kpc apart at 150 km/s. Braked twice with ln Lambda = 3 and full
        // masses, the orbit died within 0.1 Gyr; counted once with ln 2 (Binney & Tremaine 2008 sec. 8.1)
        // and the bound mass, the pair still orbits: a dynamical time R / v = 0.65 Gyr is the scale
        // to merge on (common practice: major mergers take a few orbits).
        GroupSpec g = Groups.of(new GalaxySpec("Tamsin", 1e12, new double[] {-50, 0, 0}, new double[] {0, -75, 0}, NFW, null),
                new GalaxySpec("Ulric", 1e12, new double[] {50, 0, 0}, new double[] {0, 75, 0}, NFW, null));
        RunSettings s = Groups.adaptive(Scheme.YOSHIDA4, 0.3, 0.01, false).withFriction(true, CoulombLog.DEFAULT);
        try (Simulation sim = Simulation.create(g, s, FlatLambdaHistory.standard())) {
            sim.run(List.of());
            assertEquals(2, sim.bodyCount(), "merged within 0.3 Gyr");
        }
    }
}
