package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.forces.Bodies;
import org.holdfast.forces.KernelTable;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.halos.Halos;
import org.holdfast.halos.PlummerHalo;
import org.holdfast.integrators.Scheme;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Two equal halos that fall together and merge (invented members). */
@Tag("slow")
class MergerTest {

    private static final HaloSpec PLUMMER = new HaloSpec("plummer", Double.NaN, 10, Double.NaN, Double.NaN);

    private static GroupSpec pair(double separation, double speedKms, int stars) {
        StarsSpec s = stars == 0 ? null : new StarsSpec(stars, "sphere", 5, new double[] {0, 0, 1}, 10);
        return Groups.of(
                new GalaxySpec("Corrie", 1e11, new double[] {-separation / 2, 0, 0}, new double[] {0, speedKms, 0},
                        PLUMMER, s),
                new GalaxySpec("Dunlin", 1e11, new double[] {separation / 2, 0, 0}, new double[] {0, -speedKms, 0},
                        PLUMMER, s));
    }

    private static double[] momentum(Bodies b) {
        double[] p = new double[4];
        for (int i = 0; i < b.count(); i++) {
            p[0] += b.mass[i] * b.vx[i];
            p[1] += b.mass[i] * b.vy[i];
            p[2] += b.mass[i] * b.vz[i];
            p[3] += b.mass[i] * Math.sqrt(b.vx[i] * b.vx[i] + b.vy[i] * b.vy[i] + b.vz[i] * b.vz[i]);
        }
        return p;
    }

    @Test
    void aMergerKeepsMomentumAndBooksThePairsOrbitalEnergy() {
        try (Simulation sim = Simulation.create(pair(12, 40, 0), Groups.adaptive(Scheme.LEAPFROG, 1, 0.01, true),
                FlatLambdaHistory.standard())) {
            GroupSystem s = sim.system();
            Bodies b = s.bodies;
            // the relative orbit's energy: reduced mass, pair potential, and the dark-energy potential of mu d^2
            // (two-body reduction, e.g. Goldstein, Classical Mechanics, sec. 3.1 — common practice)
            double m1 = b.mass[0];
            double m2 = b.mass[1];
            double mu = m1 * m2 / (m1 + m2);
            double dx = b.x[1] - b.x[0];
            double dvy = b.vy[1] - b.vy[0];
            double d = Math.abs(dx);
            double c = s.tide.coefficient(s.time());
            double w = KernelTable.kernelFor(b.halo[0], b.halo[1]).energy(d);
            double orbital = 0.5 * mu * dvy * dvy + m1 * m2 * w - 0.5 * c * mu * d * d;
            double[] p0 = momentum(b);
            double budget0 = s.energyBudget();
            new Mergers(Double.NaN, FlatLambdaHistory.standard(), true).merge(s, 0, 1);
            double[] p1 = momentum(b);
            assertEquals(1, b.count());
            assertEquals(2e11, b.mass[0], 0.0);
            assertEquals(0.0, b.x[0], 1e-12 * d);
            for (int k = 0; k < 3; k++) {
                assertEquals(p0[k], p1[k], 1e-12 * p0[3], "momentum component " + k);
            }
            assertEquals(orbital, s.mergerEnergy(), 1e-9 * Math.abs(orbital));
            assertEquals(budget0, s.energyBudget(), 1e-12 * Math.abs(orbital));
            // the remnant keeps the mean density inside its scale: b scales as (M/M1)^(1/3)
            assertEquals(10 * Math.cbrt(2), ((PlummerHalo) b.halo[0]).lengthKpc(), 1e-12);
        }
    }

    @Test
    void aBoundPairMergesDuringARunAndItsStarsFollowTheSurvivor() {
        double[] p0 = new double[4];
        double[] worst = {0};
        RunObserver watch = new RunObserver() {
            @Override
            public void init(RunView v) {
                for (int i = 0; i < v.bodyCount(); i++) {
                    p0[3] += v.bodyMass()[i] * Math.abs(v.bodyVy()[i]);
                }
            }

            @Override
            public void afterStep(RunView v) {
                double py = 0;
                for (int i = 0; i < v.bodyCount(); i++) {
                    py += v.bodyMass()[i] * v.bodyVy()[i];
                }
                worst[0] = Math.max(worst[0], Math.abs(py));
            }
        };
        RunSettings settings = Groups.adaptive(Scheme.LEAPFROG, 5, 0.01, true);
        // nearly radial: the first passage comes within the default merge distance (5.3 kpc)
        try (Simulation sim = Simulation.create(pair(200, 1, 50), settings, FlatLambdaHistory.standard(), 1)) {
            sim.run(List.of(watch));
            assertEquals(1, sim.bodyCount());
            List<RunEvent> e = sim.events();
            assertEquals(1, e.size());
            assertEquals("merged", e.get(0).kind());
            assertEquals(List.of("Corrie", "Dunlin"), e.get(0).members());
            assertTrue(e.get(0).tGyr() > 0 && e.get(0).tGyr() < 5, "merged at " + e.get(0).tGyr());
            for (int j = 0; j < sim.tracerCount(); j++) {
                assertEquals(0, sim.tracerHost()[j], "tracer " + j);
            }
            assertTrue(sim.mergerEnergy() < 0, "a bound pair's orbital energy is negative: " + sim.mergerEnergy());
            assertTrue(sim.energyResidual() < 1e-3, "budget residual " + sim.energyResidual());
            double merge = Mergers.defaultDistanceKpc(Halos.remnant(sim.system().bodies.halo[0], 1e11),
                    sim.system().bodies.halo[0]);
            assertTrue(merge > 0);
        }
        assertTrue(worst[0] < 1e-12 * p0[3], "momentum " + worst[0] + " of " + p0[3]);
    }

    @Test
    void backwardRunsDoNotMerge() {
        RunSettings back = new RunSettings(0, -3, Scheme.LEAPFROG, 0.01, Double.NaN, Double.NaN, true, false, 1);
        try (Simulation sim = Simulation.create(pair(12, 0, 0), back, FlatLambdaHistory.standard())) {
            GroupSystem s = sim.system();
            s.setTime(0);
            assertEquals(2, sim.bodyCount());
            assertTrue(!back.mergers());
        }
    }
}
