package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.forces.KernelTable;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.halos.HernquistHalo;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** Mergers judge binding with the pair's own interaction energy, not as two points. */
class MergerBindingTest {

    @Test
    void overlappingHalosFlyingApartFasterThanTheirOwnEscapeSpeedDoNotMerge() {
        // Two Hernquist halos (Hernquist 1990, ApJ 356, 359), 1e12 Msun each, scale 30 kpc, 10 kpc apart:
        // their interaction energy per unit mass product w(10) is far shallower than -G/10. A relative
        // speed 1.1 times sqrt(-2 M w(d)) is unbound for the halos yet bound for points (v^2/2 < G M / d).
        double m = 1e12;
        double d = 10;
        double w = KernelTable.kernelFor(new HernquistHalo(m, 30), new HernquistHalo(m, 30)).energy(d);
        double v = 1.1 * Math.sqrt(-2 * 2 * m * w);
        assertTrue(0.5 * v * v < Units.G * 2 * m / d, "bound as points");
        double vKms = Units.kpcPerGyrToKms(v);
        HaloSpec h = new HaloSpec("hernquist", Double.NaN, 30, Double.NaN, Double.NaN);
        RunSettings s = Groups.adaptive(Scheme.LEAPFROG, 0.01, 0.01, false).withMergeWithin(50);
        try (Simulation sim = Simulation.create(Groups.of(
                new GalaxySpec("Wick", m, new double[] {-d / 2, 0, 0}, new double[] {-vKms / 2, 0, 0}, h, null),
                new GalaxySpec("Yelder", m, new double[] {d / 2, 0, 0}, new double[] {vKms / 2, 0, 0}, h, null)),
                s, FlatLambdaHistory.standard())) {
            sim.run(List.of());
            assertEquals(2, sim.bodyCount(), "merged as if they were points");
        }
    }
}
