package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.halos.HaloProfile;
import org.holdfast.integrators.Scheme;
import org.junit.jupiter.api.Test;

/**
 * The accuracy of stars on their own steps, stated for pictures: disk stars in a lone NFW halo
 * keep their specific orbital energy v^2/2 + Phi(r), an integral of the motion in a static
 * potential (Binney &amp; Tremaine 2008, sec. 3.1), to the bounds below over 10 Gyr.
 */
class TracerAccuracyTest {

    @Test
    void starsKeepTheirOrbitalEnergyOverTenGyr() {
        GroupSpec g = new GroupSpec(List.of(new GalaxySpec("Wend", 1e12, new double[] {0, 0, 0}, new double[] {0, 0, 0},
                new HaloSpec("nfw", Double.NaN, Double.NaN, 10, Double.NaN),
                new StarsSpec(400, "disk", 4.5, new double[] {0, 0, 1}, 10))), null);
        RunSettings s = new RunSettings(0, 10, Scheme.IAS15, 1e-9, Double.NaN, 1e6, false, false, 3, false,
                CoulombLog.DEFAULT, 0);
        try (Simulation sim = Simulation.create(g, s, FlatLambdaHistory.standard(), 1)) {
            HaloProfile h = sim.system().bodies.halo[0];
            int n = sim.tracerCount();
            double[] e0 = new double[n];
            for (int j = 0; j < n; j++) {
                e0[j] = energy(sim, h, j);
            }
            sim.run(List.of());
            double[] rel = new double[n];
            for (int j = 0; j < n; j++) {
                rel[j] = Math.abs(energy(sim, h, j) / e0[j] - 1);
            }
            Arrays.sort(rel);
            double median = rel[n / 2];
            double worst = rel[n - 1];
            assertTrue(median < 1e-4, "median relative energy error " + median);
            assertTrue(worst < 2e-3, "largest relative energy error " + worst);
        }
    }

    private static double energy(Simulation sim, HaloProfile h, int j) {
        double x = sim.tracerX()[j] - sim.bodyX()[0];
        double y = sim.tracerY()[j] - sim.bodyY()[0];
        double z = sim.tracerZ()[j] - sim.bodyZ()[0];
        double vx = sim.tracerVx()[j] - sim.bodyVx()[0];
        double vy = sim.tracerVy()[j] - sim.bodyVy()[0];
        double vz = sim.tracerVz()[j] - sim.bodyVz()[0];
        return 0.5 * (vx * vx + vy * vy + vz * vz) + h.potential(Math.sqrt(x * x + y * y + z * z));
    }
}
