package org.holdfast.weighing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunSettings;
import org.holdfast.integrators.Scheme;
import org.holdfast.run.RunView;
import org.holdfast.run.Simulation;
import org.junit.jupiter.api.Test;

/**
 * The weighing's orbits run in holdfast's own engine (two point masses, the same forces): a run
 * started from today's state with the timing mass reaches its smallest separation at the Big
 * Bang, zero for a radial orbit and the Big Bang pericentre otherwise (consistency of the
 * solver with the engine: common practice).
 */
class EngineReturnTest {

    static final ExpansionTable H = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(1);

    /** The smallest separation of an engine run back to the Big Bang and when it happened. */
    static double[] runBack(double mass, double r, double vrKms, double vtKms, double age, boolean de, boolean matter,
            double lightFraction) {
        double vr = vrKms;
        double m1 = mass * (1 - lightFraction);
        double m2 = mass * lightFraction;
        // positions and velocities about the centre of mass, relative vector (r, 0, 0), (vr, vt, 0)
        double f1 = m2 / mass;
        double f2 = m1 / mass;
        HaloSpec bare = HaloSpec.point(0);
        GroupSpec pair = new GroupSpec(List.of(
                new GalaxySpec("heavy", m1, new double[] {-f1 * r, 0, 0}, new double[] {-f1 * vr, -f1 * vtKms, 0}, bare, null),
                new GalaxySpec("light", m2, new double[] {f2 * r, 0, 0}, new double[] {f2 * vr, f2 * vtKms, 0}, bare, null)),
                null);
        RunSettings s = new RunSettings(0, -age * 0.99999, Scheme.YOSHIDA4, 0.0005, Double.NaN, age * 1e3 * 2, de, matter,
                1, false, CoulombLog.DEFAULT, 0);
        double[] best = {r, 0};
        try (Simulation sim = Simulation.create(pair, s, H, 1)) {
            sim.run(List.of(new RunObserver() {
                @Override
                public void afterStep(RunView v) {
                    double dx = v.bodyX()[1] - v.bodyX()[0];
                    double dy = v.bodyY()[1] - v.bodyY()[0];
                    double d = Math.hypot(dx, dy);
                    if (d < best[0]) {
                        best[0] = d;
                        best[1] = v.tGyr();
                    }
                }
            }));
        }
        return best;
    }

    @Test
    void aRadialTimingOrbitFallsBackToZeroSeparationAtTheBigBang() {
        for (Background b : new Background[] {Background.DARK_ENERGY, Background.FULL}) {
            PairMotion p = new PairMotion(700, -100, 0, H.ageGyr());
            double m = TimingSolver.solve(p, b, H).massMsun();
            double[] min = runBack(m, 700, -100, 0, H.ageGyr(), true, b == Background.FULL, 0.5);
            assertTrue(min[0] < 0.01 * 700, b + ": closest " + min[0]);
            assertEquals(-H.ageGyr(), min[1], 0.01 * H.ageGyr(), b.key());
        }
    }

    @Test
    void anEccentricTimingOrbitReachesItsPericentreAtTheBigBang() {
        PairMotion p = new PairMotion(700, -100, 40, 13.0);
        TimingSolver.Weighing w = TimingSolver.solve(p, Background.DARK_ENERGY, H);
        double[] min = runBack(w.massMsun(), 700, -100, 40, 13.0, true, false, 0.4);
        assertEquals(w.bigBangSeparationKpc(), min[0], 0.02 * w.bigBangSeparationKpc());
        assertEquals(-13.0, min[1], 0.05);
    }

    @Test
    void aGalaxyOnTheFlowRelationFallsBackToTheGroupAtTheBigBang() {
        // Penarrubia et al. 2014 (MNRAS 443, 2204) fit the local flow with such orbits; here a test
        // galaxy of 1e-6 of the group's mass placed on the relation with Lambda runs back in the engine
        FlowCurve c = new FlowCurve(t -> Background.DARK_ENERGY.coefficient(H, t), H.ageGyr(), 300, 4000, 50);
        for (double r : new double[] {900, 2200}) {
            double v = c.velocityKms(r, 2e12);
            double[] min = runBack(2e12, r, v, 0, H.ageGyr(), true, false, 1e-6);
            assertTrue(min[0] < 0.01 * r, r + " kpc: closest " + min[0]);
            assertEquals(-H.ageGyr(), min[1], 0.01 * H.ageGyr());
        }
    }
}
