package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.fates.FateTracker.Verdict;
import org.holdfast.fates.Fate;
import org.holdfast.run.ArrayRunView;
import org.holdfast.run.RunEvent;
import org.holdfast.run.StopReason;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** The bookkeeping of fates, on hand-set states (the physics of binding is in BindingTest). */
class FateTrackerTest {

    private static final double K0 = 0.7 * Math.pow(Units.hubbleToPerGyr(70), 2);

    /** Only k(t) matters to the tracker. */
    private static ExpansionHistory history(DoubleUnaryOperator k) {
        return new ExpansionHistory() {
            @Override public double scaleFactor(double t) { return 1; }
            @Override public double hubbleRate(double t) { return 0; }
            @Override public double totalAcceleration(double t) { return 0; }
            @Override public double darkEnergyAcceleration(double t) { return k.applyAsDouble(t); }
            @Override public double darkEnergyAccelerationRate(double t) { return 0; }
            @Override public double matterAcceleration(double t) { return 0; }
            @Override public double darkEnergyDensity(double t) { return 0; }
            @Override public double criticalDensityToday() { return 1; }
            @Override public double earliestGyr() { return -10; }
            @Override public double latestGyr() { return 100; }
        };
    }

    private static ArrayRunView pair(double r, double vTangential) {
        ArrayRunView v = new ArrayRunView("Orla", "Pim");
        v.m[0] = 1e12;
        v.m[1] = 1e11;
        v.x[1] = r;
        v.vy[1] = vTangential;
        return v;
    }

    @Test
    void aMemberThatFliesOffInAConstantFieldEscaped() {
        FateTracker f = new FateTracker(history(t -> K0), true, 0.1);
        ArrayRunView v = pair(200, 0);
        f.init(v);
        v.t = 1;
        v.x[1] = 5000;
        v.vx[1] = 500;
        f.afterStep(v);
        f.finish(v, new StopReason(StopReason.Kind.REACHED_END, ""));
        MemberFate pim = f.fates(v).get(1);
        assertEquals(Fate.ESCAPED, pim.fate());
        assertEquals(1.0, pim.atGyr());
        // the group is gone: the heavier member is not "bound" to it, it shares its partner's fate
        assertEquals(Fate.ESCAPED, f.fates(v).get(0).fate());
        assertEquals(1.0, f.fates(v).get(0).atGyr());
        assertEquals(Verdict.DISSOLVED, f.verdict());
        assertEquals(1.0, f.boundUntilGyr());
    }

    @Test
    void aMemberUnboundOnlyByAGrowingFieldWasRipped() {
        // The same orbital state, bound for k0 and unbound once k has grown 1000-fold:
        // its barrier (G M / k)^(1/3) shrinks tenfold, inside the orbit.
        FateTracker f = new FateTracker(history(t -> t < 5 ? K0 : 1000 * K0), true, 0.1);
        ArrayRunView v = pair(500, 0);
        f.init(v);
        v.t = 4;
        f.afterStep(v);
        v.t = 6;
        f.afterStep(v);
        f.finish(v, new StopReason(StopReason.Kind.BEFORE_RIP, ""));
        MemberFate pim = f.fates(v).get(1);
        assertEquals(Fate.RIPPED, pim.fate());
        assertEquals(6.0, pim.atGyr());
        List<RunEvent> events = f.events(v);
        assertEquals("ripped", events.get(0).kind());
    }

    @Test
    void aMemberThatComesBackIsBound() {
        FateTracker f = new FateTracker(history(t -> K0), true, 0.1);
        ArrayRunView v = pair(200, 0);
        f.init(v);
        v.t = 1;
        v.vx[1] = 3000;
        f.afterStep(v);
        v.t = 2;
        v.vx[1] = 0;
        f.afterStep(v);
        f.finish(v, new StopReason(StopReason.Kind.REACHED_END, ""));
        assertEquals(Fate.BOUND, f.fates(v).get(1).fate());
        assertEquals(Verdict.BOUND, f.verdict());
        assertTrue(Double.isNaN(f.boundUntilGyr()));
    }

    @Test
    void mergersComeFromTheSimulationsEvents() {
        FateTracker f = new FateTracker(history(t -> K0), true, 0.1);
        ArrayRunView v = pair(200, 0);
        f.init(v);
        v.t = 3;
        v.events.add(new RunEvent(2.5, RunEvent.Kind.MERGED, List.of("Orla", "Pim")));
        v.names = new String[] {"Orla"};
        v.m = new double[] {1.1e12};
        f.finish(v, new StopReason(StopReason.Kind.REACHED_END, ""));
        MemberFate pim = f.fates(v).get(1);
        assertEquals(Fate.MERGED, pim.fate());
        assertEquals("Orla", pim.with());
        assertEquals(2.5, pim.atGyr());
        assertEquals(Verdict.BOUND, f.verdict());
    }
}
