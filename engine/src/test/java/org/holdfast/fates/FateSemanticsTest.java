package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.fates.FateTracker.Verdict;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.run.ArrayRunView;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunSettings;
import org.holdfast.integrators.Scheme;
import org.holdfast.run.Simulation;
import org.holdfast.run.StopReason;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** What the fates mean: unbound from the start, returning, leaving times, the matter term, radial infall. */
class FateSemanticsTest {

    private static final double K0 = 0.7 * Math.pow(Units.hubbleToPerGyr(70), 2);
    private static final double KMS = Units.kmsToKpcPerGyr(1);
    private static final StopReason END = new StopReason(StopReason.Kind.REACHED_END, "");

    private static ExpansionHistory history(DoubleUnaryOperator k, double matter) {
        return new ExpansionHistory() {
            @Override public double scaleFactor(double t) { return 1; }
            @Override public double hubbleRate(double t) { return 0; }
            @Override public double totalAcceleration(double t) { return 0; }
            @Override public double darkEnergyAcceleration(double t) { return k.applyAsDouble(t); }
            @Override public double darkEnergyAccelerationRate(double t) { return 0; }
            @Override public double matterAcceleration(double t) { return matter; }
            @Override public double darkEnergyDensity(double t) { return 0; }
            @Override public double criticalDensityToday() { return 1; }
            @Override public double earliestGyr() { return -10; }
            @Override public double latestGyr() { return 100; }
        };
    }

    private static ArrayRunView pair(double r) {
        ArrayRunView v = new ArrayRunView("Orla", "Pim");
        v.m[0] = 1e12;
        v.m[1] = 1e11;
        v.x[1] = r;
        return v;
    }

    private static double r0(double k) {
        return Math.cbrt(Units.G * 1.1e12 / k);
    }

    @Test
    void aMemberFallingBackWhenTheRunEndsHasNotEscaped() {
        FateTracker f = new FateTracker(history(t -> K0, 0), true, 0.1);
        ArrayRunView v = pair(200);
        f.init(v);
        v.t = 1;
        v.x[1] = 600;
        v.vx[1] = 900 * KMS;
        f.afterStep(v);
        v.t = 2;
        v.x[1] = 500;
        v.vx[1] = -900 * KMS; // unbound, but falling back in (it will come back through the group)
        f.finish(v, END);
        assertEquals(Fate.RETURNING, f.fates(v).get(1).fate());
        assertFalse(f.events(v).stream().anyMatch(e -> e.type() == RunEvent.Kind.ESCAPED));
    }

    @Test
    void theLeavingTimeIsWhenTheSeparationPassesTheZeroGravityRadius() {
        // zero-gravity radius (G M / k)^(1/3) (Chernin et al.) of the pair, M = 1.1e12 Msun
        double r0 = r0(K0);
        FateTracker f = new FateTracker(history(t -> K0, 0), true, 0.1);
        ArrayRunView v = pair(200);
        f.init(v);
        v.t = 1;
        v.x[1] = 0.5 * r0;
        v.vx[1] = 2000 * KMS;
        f.afterStep(v);
        v.t = 2;
        v.x[1] = 1.5 * r0;
        f.finish(v, END);
        MemberFate pim = f.fates(v).get(1);
        assertEquals(Fate.ESCAPED, pim.fate());
        assertEquals(1.0, pim.atGyr());
        // linear between the analyses: separation - radius goes from -0.5 r0 to +0.5 r0
        assertEquals(1.5, pim.leftGyr(), 1e-12);
    }

    @Test
    void theMeanMatterDensityEntersTheBindingTest() {
        // with background matter the field is k + c_m (Peebles 1993 eq. 5.15); c_m = -K0/2 halves it,
        // moving the zero-gravity radius out by 2^(1/3) = 1.26: a member at rest at 1.1 r0(K0) is bound
        for (boolean matter : new boolean[] {false, true}) {
            FateTracker f = new FateTracker(history(t -> K0, -0.5 * K0), true, matter, 0.1);
            ArrayRunView v = pair(1.1 * r0(K0));
            f.init(v);
            v.t = 1;
            f.finish(v, END);
            assertEquals(matter ? Fate.BOUND : Fate.UNBOUND, f.fates(v).get(1).fate(), "matter " + matter);
        }
    }

    @Test
    void aGroupWithNoBoundPairIsUnboundFromTheStart() {
        FateTracker f = new FateTracker(history(t -> K0, 0), true, 0.1);
        ArrayRunView v = pair(2 * r0(K0));
        v.vx[1] = 100 * KMS;
        f.init(v);
        v.t = 1;
        v.x[1] += 100;
        f.finish(v, END);
        List<MemberFate> fates = f.fates(v);
        assertEquals(Fate.UNBOUND, fates.get(0).fate());
        assertEquals(Fate.UNBOUND, fates.get(1).fate());
        assertEquals(0.0, fates.get(1).atGyr());
        assertEquals(Verdict.UNBOUND, f.verdict());
    }

    @Test
    void aDecayingDarkEnergyHoldsNothing() {
        // k < 0 (w > -1/3): 500 kpc apart receding at 400 km/s, escape speed 59 km/s (Kepler, common
        // practice): unbound from the start, not bound "thanks to" k < 0
        double m = Math.pow(59 * KMS, 2) * 500 / (2 * Units.G);
        FateTracker f = new FateTracker(history(t -> -K0, 0), true, 0.1);
        ArrayRunView v = new ArrayRunView("Orla", "Pim");
        v.m[0] = 0.9 * m;
        v.m[1] = 0.1 * m;
        v.x[1] = 500;
        v.vx[1] = 400 * KMS;
        f.init(v);
        f.finish(v, END);
        assertEquals(Fate.UNBOUND, f.fates(v).get(1).fate());
    }

    @Test
    void pureInfallAlongASkewLineRunsAndMerges() {
        // radial orbits are the timing argument's geometry: L^2 is round-off here; the run must not fail
        ExpansionTable t = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(40);
        double[] u = {0.6, -0.48, 0.64};
        double n = Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
        double[] pos = new double[3];
        double[] vel = new double[3];
        for (int c = 0; c < 3; c++) {
            pos[c] = 400 * u[c] / n;
            vel[c] = -60 * u[c] / n; // bound: E = -1.30e4 below the barrier top -7.45e3 (kpc/Gyr)^2
        }
        HaloSpec soft = HaloSpec.point(5);
        GroupSpec g = new GroupSpec(List.of(
                new GalaxySpec("Ard", 1e12, new double[3], new double[3], soft, null),
                new GalaxySpec("Bree", 3e11, pos, vel, soft, null)), null);
        RunSettings s = new RunSettings(0, 6, Scheme.LEAPFROG, 0.01, Double.NaN, 500, true, false, 1)
                .withMergeWithin(20);
        FateTracker tracker = new FateTracker(t, true, 0.05);
        List<MemberFate> fates;
        try (Simulation sim = Simulation.create(g, s, t, 1)) {
            sim.run(List.of(tracker));
            fates = tracker.fates(sim);
        }
        assertEquals(Fate.MERGED, fates.get(1).fate(), fates.toString());
        assertEquals(Fate.BOUND, fates.get(0).fate());
        assertTrue(fates.get(1).atGyr() > 0 && fates.get(1).atGyr() < 6);
    }
}
