package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.forces.Tracers;
import org.holdfast.group.FlowSpec;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Star and flow tracers: placement, determinism across thread counts, memory estimate. */
@Tag("slow")
class TracerTest {

    private static GroupSpec withStars(int disk, int sphere, int flow) {
        return new GroupSpec(List.of(
                new GalaxySpec("Gannet", 1e12, new double[] {0, 0, 0}, new double[] {0, 0, 0},
                        new HaloSpec("hernquist", Double.NaN, 15, Double.NaN, Double.NaN),
                        new StarsSpec(disk, "disk", 4, new double[] {0, 0, 2}, 0)),
                new GalaxySpec("Scaup", 3e11, new double[] {400, 0, 0}, new double[] {0, 80, 0},
                        new HaloSpec("plummer", Double.NaN, 8, Double.NaN, Double.NaN),
                        new StarsSpec(sphere, "sphere", 3, new double[] {0, 0, 1}, 5))),
                new FlowSpec(flow, 1000, 2000, 10));
    }

    @Test
    void diskStarsStartOnTheHostsCircularOrbitsInItsPlane() {
        // circular speed sqrt(G M(<R)/R) of a Hernquist halo (Hernquist 1990, ApJ 356, 359, eq. 3), in the
        // plane normal to the spin axis, counter-clockwise about it
        try (Simulation sim = Simulation.create(withStars(2000, 0, 0), Groups.fixed(Scheme.LEAPFROG, 1, 1, false),
                FlatLambdaHistory.standard())) {
            double meanR = 0;
            for (int j = 0; j < 2000; j++) {
                double x = sim.tracerX()[j] - sim.bodyX()[0];
                double y = sim.tracerY()[j] - sim.bodyY()[0];
                double vx = sim.tracerVx()[j] - sim.bodyVx()[0];
                double vy = sim.tracerVy()[j] - sim.bodyVy()[0];
                double r = Math.hypot(x, y);
                double vc = Math.sqrt(Units.G * 1e12 * r / ((r + 15) * (r + 15)));
                assertEquals(0, sim.tracerZ()[j] - sim.bodyZ()[0], 1e-12);
                assertEquals(vc, Math.hypot(vx, vy), 1e-9 * vc);
                assertTrue(x * vy - y * vx > 0, "rotates counter-clockwise about +z");
                assertEquals(0, x * vx + y * vy, 1e-9 * r * vc);
                assertEquals(0, sim.tracerHost()[j]);
                meanR += r / 2000;
            }
            // exponential disk: mean radius 2 R_d (Freeman 1970 profile; Gamma(2) law), 2000 samples
            assertEquals(8, meanR, 0.3);
        }
    }

    @Test
    void flowStartsOnTheHubbleFlowInsideItsShell() {
        FlatLambdaHistory h = FlatLambdaHistory.standard();
        GroupSpec g = new GroupSpec(List.of(Groups.point("Mote", 1, new double[] {0, 0, 0}, new double[] {0, 0, 0})),
                new FlowSpec(3000, 500, 900, 0));
        try (Simulation sim = Simulation.create(g, Groups.fixed(Scheme.LEAPFROG, 1, 1, true), h)) {
            double h0 = h.hubbleRate(0);
            for (int j = 0; j < 3000; j++) {
                double r = Math.sqrt(sim.tracerX()[j] * sim.tracerX()[j] + sim.tracerY()[j] * sim.tracerY()[j]
                        + sim.tracerZ()[j] * sim.tracerZ()[j]);
                assertTrue(r >= 500 && r <= 900);
                assertEquals(h0 * sim.tracerX()[j], sim.tracerVx()[j], 1e-12 * h0 * r);
                assertEquals(-1, sim.tracerHost()[j]);
            }
        }
    }

    @Test
    void resultsDoNotDependOnTheThreadCount() {
        double[][] one = finalTracers(1);
        double[][] two = finalTracers(2);
        double[][] three = finalTracers(3);
        for (int k = 0; k < one.length; k++) {
            assertArrayEquals(one[k], two[k]);
            assertArrayEquals(one[k], three[k]);
        }
    }

    private static double[][] finalTracers(int threads) {
        RunSettings s = new RunSettings(0, 0.2, Scheme.YOSHIDA4, 0.05, Double.NaN, 100, true, true, 99);
        try (Simulation sim = Simulation.create(withStars(3000, 3000, 3000), s, FlatLambdaHistory.standard(), threads)) {
            sim.run(List.of());
            return new double[][] {sim.tracerX().clone(), sim.tracerVz().clone()};
        }
    }

    @Test
    void sameSeedSameTracersAndOtherMembersUnchangedByAddingStars() {
        try (Simulation a = Simulation.create(withStars(100, 50, 10), Groups.fixed(Scheme.LEAPFROG, 1, 1, false),
                FlatLambdaHistory.standard());
                Simulation b = Simulation.create(withStars(300, 50, 10), Groups.fixed(Scheme.LEAPFROG, 1, 1, false),
                        FlatLambdaHistory.standard())) {
            // the sphere of the second member is the same whatever the first member's star count
            for (int j = 0; j < 50; j++) {
                assertEquals(a.tracerX()[100 + j], b.tracerX()[300 + j], 0);
            }
        }
    }

    @Test
    void requiredBytesCoversTheTracerArrays() {
        GroupSpec g = withStars(600_000, 300_000, 100_000);
        long bytes = Simulation.requiredBytes(g);
        assertTrue(bytes >= 1_000_000 * Tracers.BYTES_PER_TRACER);
        assertTrue(bytes < 1_000_000 * Tracers.BYTES_PER_TRACER + 10_000_000L);
    }
}
