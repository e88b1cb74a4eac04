package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.holdfast.schema.ScenarioException;
import org.junit.jupiter.api.Test;

class AxisAndSeedTest {

    @Test
    void rangeIncludesBothEndsExactly() {
        Axis a = Axis.parse("cosmology.dark_energy.w0=-1.5:-1.0:6");
        assertEquals("cosmology.dark_energy.w0", a.key());
        assertEquals(6, a.size());
        assertEquals(-1.5, a.values().get(0));
        assertEquals(-1.0, a.values().get(5));
        assertEquals(-1.3, a.values().get(2), 1e-15);
        // Steps are taken in decimal, so grid values print as typed.
        assertEquals(-1.35, Axis.parse("k=-1.4:-0.9:21").values().get(2));
        assertEquals(List.of(0.1, 0.2, 0.3), Axis.parse("k=0.1:0.3:3").values());
    }

    @Test
    void listKeepsItsOrder() {
        assertEquals(List.of(3.0, 1.0, 2.5), Axis.parse("k=3, 1,2.5").values());
    }

    @Test
    void malformedAxesNameTheOptionAndKey() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> Axis.parse("run.until_gyr=1:2"));
        assertEquals("--vary", e.where());
        assertEquals("run.until_gyr", e.key());
        assertThrows(ScenarioException.class, () -> Axis.parse("k=1:2:0"));
        assertThrows(ScenarioException.class, () -> Axis.parse("k=1:2:x"));
        assertThrows(ScenarioException.class, () -> Axis.parse("k=1,,2"));
        assertThrows(ScenarioException.class, () -> Axis.parse("=1,2"));
        assertThrows(ScenarioException.class, () -> Axis.parse("k=1:2:1"));
    }

    @Test
    void wholeNumbersAreWrittenWithoutADecimalPoint() {
        assertEquals("2000", Axis.format(2000.0));
        assertEquals("-1.25", Axis.format(-1.25));
        assertEquals("1.0E20", Axis.format(1e20));
    }

    @Test
    void gridIsRowMajorWithTheLastAxisFastest() {
        SweepPlan p = plan(List.of(Axis.parse("a=1,2,3"), Axis.parse("b=10,20")), 1, 1, 1);
        assertEquals(6, p.points());
        assertEquals(List.of(1.0, 20.0), List.of(p.valuesAt(1)[0], p.valuesAt(1)[1]));
        assertEquals(List.of(3.0, 10.0), List.of(p.valuesAt(4)[0], p.valuesAt(4)[1]));
        assertEquals(Map.of("a", "3", "b", "10"), p.overridesAt(4));
    }

    @Test
    void seedsDependOnlyOnSeedPointAndSample() {
        SeedPlan walk = new SeedPlan(99);
        Set<Long> all = new HashSet<>();
        for (int p = 0; p < 20; p++) {
            long[] s = walk.forPoint(p, 5);
            for (int k = 0; k < 5; k++) {
                assertEquals(SeedPlan.seedOf(99, p, k), s[k]);
                all.add(s[k]);
            }
        }
        assertEquals(100, all.size(), "no two runs share a seed");
        // Skipping points gives the same seeds as visiting them.
        assertEquals(SeedPlan.seedOf(99, 17, 3), new SeedPlan(99).forPoint(17, 4)[3]);
        assertNotEquals(SeedPlan.seedOf(99, 0, 0), SeedPlan.seedOf(100, 0, 0));
    }

    @Test
    void shardsPartitionTheRuns() {
        SweepPlan whole = plan(List.of(Axis.parse("a=1:2:7")), 3, 1, 1);
        BitSet seen = new BitSet();
        long count = 0;
        for (int i = 1; i <= 4; i++) {
            SweepPlan s = whole.withShard(i, 4);
            List<RunTask> tasks = s.pendingTasks(new BitSet());
            assertEquals(s.runsInShard(), tasks.size());
            for (RunTask t : tasks) {
                assertTrue(!seen.get((int) t.run()), "run " + t.run() + " in two shards");
                seen.set((int) t.run());
                // paired draws: sample s is draw s of the master seed at every point
                assertEquals(1, t.seed());
                assertEquals(t.sample(), t.draw());
            }
            count += tasks.size();
        }
        assertEquals(21, count);
        assertEquals(21, seen.cardinality());
    }

    @Test
    void independentDrawsGiveEveryRunItsOwnSeedAndPairedDrawsShareThemAcrossPoints() {
        SweepPlan paired = plan(List.of(Axis.parse("a=1:2:3")), 4, 1, 1);
        SweepPlan independent = new SweepPlan(SweepPlan.FORMAT, "x.toml", "00", Map.of(), paired.axes(), 4, true, 1,
                null, false, 1, 1, SweepPlan.INDEPENDENT, List.of(), null);
        assertNotEquals(null, paired.differenceFrom(independent), "the two are different sweeps");
        Set<Long> seeds = new HashSet<>();
        for (RunTask t : independent.pendingTasks(new BitSet())) {
            assertEquals(SeedPlan.seedOf(1, t.point(), t.sample()), t.seed());
            assertEquals(0, t.draw());
            seeds.add(t.seed());
        }
        assertEquals(12, seeds.size());
        for (RunTask t : paired.pendingTasks(new BitSet())) {
            assertEquals(1, t.seed());
            assertEquals(t.sample(), t.draw());
        }
    }

    static SweepPlan plan(List<Axis> axes, int samples, int shard, int shards) {
        return new SweepPlan(SweepPlan.FORMAT, "x.toml", "00", Map.of(), axes, samples, samples > 1, 1, null, false,
                shard, shards);
    }
}
