package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** How runs end: at the end, before a rip, on a non-finite state; and where snapshots fall. */
class StopTest {

    private static GroupSpec boundPair() {
        double m = 1e12;
        double r = 100;
        double v = Math.sqrt(Units.G * m / r) * Units.KPC_PER_GYR_TO_KMS;
        return Groups.of(Groups.point("Ness", m / 2, new double[] {-r / 2, 0, 0}, new double[] {0, -v / 2, 0}),
                Groups.point("Voe", m / 2, new double[] {r / 2, 0, 0}, new double[] {0, v / 2, 0}));
    }

    @Test
    void phantomRunStopsCleanlyBeforeTheRip() {
        // w = -1.5 alone: t_rip = 2 / (3 |1 + w| H0) (Caldwell, Kamionkowski & Weinberg 2003, PRL 91, 071301,
        // eq. 2 with Omega_m = 0); a bound pair is torn apart before it
        PhantomHistory h = new PhantomHistory(70, -1.5, 1e-3);
        assertEquals(2 / (3 * 0.5 * Units.hubbleToPerGyr(70)), h.tRip, 1e-12);
        List<Double> steps = new ArrayList<>();
        RunObserver obs = new RunObserver() {
            double last = 0;

            @Override
            public void afterStep(RunView v) {
                steps.add(v.tGyr() - last);
                last = v.tGyr();
            }
        };
        for (Scheme scheme : Scheme.values()) {
            steps.clear();
            try (Simulation sim = Simulation.create(boundPair(), Groups.adaptive(scheme, 40, scheme == Scheme.IAS15 ? 1e-9 : 0.02, true), h)) {
                RunResult r = sim.run(List.of(obs));
                assertEquals(StopReason.Kind.BEFORE_RIP, r.reason().kind(), r.reason().message());
                assertTrue(r.endGyr() < h.latestGyr() && r.endGyr() > h.latestGyr() - 1e-5, "ended at " + r.endGyr());
                double sep = Math.hypot(sim.bodyX()[1] - sim.bodyX()[0], sim.bodyY()[1] - sim.bodyY()[0]);
                assertTrue(sep > 1e4, "the pair is torn apart: " + sep + " kpc");
                assertTrue(r.steps() < 100_000, r.steps() + " steps");
                assertTrue(Double.isFinite(sim.bodyVx()[1]) && Double.isFinite(sim.energyBudget()));
            }
            // the step follows the shrinking dark-energy time scale toward the rip
            double late = steps.get(steps.size() - 2);
            assertTrue(late < 1e-3, scheme + ": step near the rip " + late + " Gyr");
        }
    }

    @Test
    void nonFiniteStateStopsTheRunNamingTheBody() {
        GroupSpec g = Groups.of(Groups.point("Ness", 1e12, new double[] {0, 0, 0}, new double[] {0, 0, 0}),
                Groups.point("Voe", 1e10, new double[] {100, 0, 0}, new double[] {Double.MAX_VALUE, 0, 0}));
        try (Simulation sim = Simulation.create(g, Groups.fixed(Scheme.LEAPFROG, 1, 1, false), FlatLambdaHistory.standard())) {
            RunResult r = sim.run(List.of());
            assertEquals(StopReason.Kind.NON_FINITE, r.reason().kind());
            assertTrue(r.reason().message().contains("'Voe'") || r.reason().message().contains("'Ness'"), r.reason().message());
            assertTrue(r.reason().message().contains("Gyr"), r.reason().message());
        }
    }

    @Test
    void snapshotsFallExactlyOnTheirTimesAndTheEnd() {
        List<Double> times = new ArrayList<>();
        RunObserver obs = new RunObserver() {
            @Override
            public void atSnapshot(RunView v) {
                times.add(v.tGyr());
            }
        };
        RunSettings s = new RunSettings(0.5, 3.25, Scheme.YOSHIDA4, 0.05, Double.NaN, 700, true, false, 1);
        try (Simulation sim = Simulation.create(boundPair(), s, FlatLambdaHistory.standard())) {
            sim.run(List.of(obs));
        }
        double every = 700 * Units.MYR;
        assertEquals(List.of(0.5, 0.5 + every, 0.5 + 2 * every, 0.5 + 3 * every, 3.25), times);
        times.clear();
        RunSettings back = new RunSettings(0, -1.1, Scheme.LEAPFROG, Double.NaN, 3, 500, true, false, 1);
        try (Simulation sim = Simulation.create(boundPair(), back, FlatLambdaHistory.standard())) {
            assertEquals(StopReason.Kind.REACHED_END, sim.run(List.of(obs)).reason().kind());
        }
        assertEquals(List.of(0.0, -500 * Units.MYR, -2 * (500 * Units.MYR), -1.1), times);
    }

    @Test
    void backwardRunStopsJustAfterTheBigBang() {
        FlatLambdaHistory h = FlatLambdaHistory.standard();
            // starting today and asking for 20 Gyr into the past, further back than the Big Bang at -13.47 Gyr
            RunSettings s = new RunSettings(0, -20, Scheme.LEAPFROG, 0.05, Double.NaN, Double.NaN, true, false, 1);
            try (Simulation back = Simulation.create(boundPair(), s, h)) {
                RunResult r = back.run(List.of());
                assertEquals(StopReason.Kind.BEFORE_BIG_BANG, r.reason().kind(), r.reason().message());
                assertTrue(r.endGyr() > h.earliestGyr() && r.endGyr() < h.earliestGyr() + 1e-3, "ended at " + r.endGyr());
            }
    }

    @Test
    void groupIsMovedToItsCentreOfMassFrame() {
        GroupSpec g = Groups.of(Groups.point("Ness", 3e11, new double[] {1000, 2000, 3000}, new double[] {100, 0, 0}),
                Groups.point("Voe", 1e11, new double[] {1400, 2000, 3000}, new double[] {-100, 40, 0}));
        try (Simulation sim = Simulation.create(g, Groups.fixed(Scheme.LEAPFROG, 1, 1, true), FlatLambdaHistory.standard())) {
            assertEquals(1100, sim.frameOffsetKpc()[0], 1e-9);
            assertEquals(2000, sim.frameOffsetKpc()[1], 1e-9);
            assertEquals(Units.kmsToKpcPerGyr(50), sim.frameVelocity()[0], 1e-9);
            assertEquals(Units.kmsToKpcPerGyr(10), sim.frameVelocity()[1], 1e-9);
            assertEquals(-100, sim.bodyX()[0], 1e-9);
            assertEquals(300, sim.bodyX()[1], 1e-9);
            sim.run(List.of());
            // the centre of mass stays at the origin: pair forces cancel and c(t) r has no net pull there
            double cx = (3e11 * sim.bodyX()[0] + 1e11 * sim.bodyX()[1]) / 4e11;
            assertEquals(0, cx, 1e-9);
        }
    }
}
