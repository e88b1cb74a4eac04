package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.integrators.Scheme;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The energy budget of a demo-like group closes. */
@Tag("slow")
class EnergyBudgetTest {

    /** Three large NFW members and a dozen dwarfs, invented. */
    static GroupSpec demoLike() {
        List<GalaxySpec> gs = new ArrayList<>();
        gs.add(nfw("Corrie", 1.5e12, 9, new double[] {0, 0, 0}, new double[] {0, 0, 0}));
        gs.add(nfw("Lathe", 1.0e12, 10, new double[] {620, 180, 0}, new double[] {-70, 15, 10}));
        gs.add(nfw("Fennick", 4e11, 12, new double[] {-300, 520, 90}, new double[] {25, -60, 0}));
        UniformRandomProvider rng = RandomSource.XO_SHI_RO_256_PP.create(42L);
        for (int i = 0; i < 12; i++) {
            double r = 200 + 700 * rng.nextDouble();
            double th = Math.acos(2 * rng.nextDouble() - 1);
            double ph = 2 * Math.PI * rng.nextDouble();
            double[] pos = {r * Math.sin(th) * Math.cos(ph), r * Math.sin(th) * Math.sin(ph), r * Math.cos(th)};
            double[] vel = {80 * (rng.nextDouble() - 0.5), 80 * (rng.nextDouble() - 0.5), 80 * (rng.nextDouble() - 0.5)};
            // three kinds of dwarf, four of each (identical halos share one pair table)
            double m = i % 3 == 0 ? 2e10 : i % 3 == 1 ? 4e10 : 8e9;
            HaloSpec halo = i % 3 == 0 ? new HaloSpec("hernquist", Double.NaN, 3, Double.NaN, Double.NaN)
                    : i % 3 == 1 ? new HaloSpec("nfw", Double.NaN, Double.NaN, 14, Double.NaN)
                    : HaloSpec.point(1.0);
            gs.add(new GalaxySpec("Dwarf-" + (char) ('A' + i), m, pos, vel, halo, null));
        }
        return new GroupSpec(gs, null);
    }

    private static GalaxySpec nfw(String name, double m, double c, double[] pos, double[] vel) {
        return new GalaxySpec(name, m, pos, vel, new HaloSpec("nfw", Double.NaN, Double.NaN, c, Double.NaN), null);
    }

    static RunResult budget(ExpansionHistory h, double accuracy, boolean matter) {
        RunSettings s = new RunSettings(0, 30, Scheme.YOSHIDA4, accuracy, Double.NaN, 500, true, matter, 1);
        try (Simulation sim = Simulation.create(demoLike(), s, h)) {
            return sim.run(List.of());
        }
    }

    @Test
    void budgetClosesOverThirtyGyrWithTimeVaryingBackground() {
        // energy budget: K + W - (1/2) c(t) sum m r^2 - integral of the explicit time derivative is
        // conserved for a time-dependent Hamiltonian (dH/dt = partial H / partial t; Goldstein, Classical
        // Mechanics, 3rd ed., sec. 8.2 — section from memory); the mean-matter term makes c(t) vary in time here
        RunResult r = budget(FlatLambdaHistory.standard(), 0.01, true);
        assertEquals(StopReason.Kind.REACHED_END, r.reason().kind());
        assertTrue(r.maxEnergyResidual() < 1e-6, "largest residual " + r.maxEnergyResidual() + " in " + r.steps() + " steps");
    }
}
