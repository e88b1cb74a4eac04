package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepPiecesTest {

    @TempDir
    Path tmp;

    @Test
    void axisLabelsCarryTheUnitTheKeyNames() {
        assertEquals("galaxy.Vesk.mass_msun [Msun]", SweepPlots.label("galaxy.Vesk.mass_msun"));
        assertEquals("galaxy.Vesk.velocity_kms.1 [km/s]", SweepPlots.label("galaxy.Vesk.velocity_kms.1"));
        assertEquals("cosmology.h0 [km/s/Mpc]", SweepPlots.label("cosmology.h0"));
        assertEquals("cosmology.dark_energy.w0", SweepPlots.label("cosmology.dark_energy.w0"));
    }

    @Test
    void plainProgressLinesCountRunsAndTheEnd() {
        StringWriter text = new StringWriter();
        SweepProgress p = new SweepProgress(new PrintWriter(text), false, 0);
        p.start(5, 2);
        for (int i = 0; i < 3; i++) {
            p.runDone(null);
        }
        p.finish();
        String out = text.toString();
        assertTrue(out.startsWith("resuming: 2 of 5 runs already done"), out);
        assertTrue(out.contains("  3/5 runs") && out.contains("  5/5 runs"), out);
        assertTrue(out.contains("eta 0:00:00"), out);
    }

    /** Fractions follow from counting; the table is the same whatever order the records came in. */
    @Test
    void fractionsCountEachPointsRunsInAnyArrivalOrder() throws Exception {
        SweepPlan plan = new SweepPlan(SweepPlan.FORMAT, "x.toml", "00", Map.of(), List.of(Axis.parse("k=1,2")), 4, true,
                1, null, false, 1, 1);
        List<RunRecord> records = new ArrayList<>();
        String[] fates = {"ripped", "bound", "bound", "bound", "ripped", "ripped", "ripped", "merged"};
        for (int r = 0; r < 8; r++) {
            RunOutcome o = new RunOutcome(fates[r].equals("bound") ? "bound" : "dissolved", null,
                    List.of(new MemberOutcome("Quell", fates[r], fates[r].equals("bound") ? null : 3.0, null)), 0, 0, null);
            records.add(new RunRecord(r, r / 4, r % 4, r, o));
        }
        List<RunRecord> shuffled = new ArrayList<>(records);
        Collections.shuffle(shuffled, new java.util.Random(3));
        String a = Fractions.csv(plan, Fractions.rows(plan, ResultsTable.sorted(shuffled)));
        String b = Fractions.csv(plan, Fractions.rows(plan, records));
        assertEquals(b, a);
        List<Fractions.Row> rows = Fractions.rows(plan, records);
        Fractions.Row ripped0 = rows.stream().filter(r -> r.point() == 0 && r.name().equals("Quell")
                && r.outcome().equals("ripped")).findFirst().orElseThrow();
        assertEquals(1, ripped0.count());
        assertEquals(0.25, ripped0.fraction());
        double[] ci = Wilson.interval95(1, 4);
        assertEquals(ci[0], ripped0.low());
        assertEquals(ci[1], ripped0.high());
        Fractions.Row bound1 = rows.stream().filter(r -> r.point() == 1 && r.level().equals("group")
                && r.outcome().equals("bound")).findFirst().orElseThrow();
        assertEquals(0, bound1.count());
        assertEquals(0.0, bound1.low());
    }

    @Test
    void snapshotsGoToOneFolderPerRunOnlyWhenAsked() throws Exception {
        Path scenario = ToyRunFunction.writeScenario(tmp);
        List<String> seen = Collections.synchronizedList(new ArrayList<>());
        RunFunction recorder = (s, o, seed, draw, sample, until, snaps) -> {
            seen.add(String.valueOf(snaps));
            return new RunOutcome("bound", null, List.of(new MemberOutcome("Quell", "bound", null, null)), 0, 0, null);
        };
        SweepPlan plan = new SweepPlan(SweepPlan.FORMAT, scenario.toString(), "00", Map.of(),
                List.of(Axis.parse("k=1,2")), 1, false, 1, null, true, 1, 1);
        Path out = tmp.resolve("snap");
        Sweep.run(plan, scenario, out, new RunSpec(recorder, false, Double.NaN, out.resolve("snapshots").toString()),
                new LocalEngine(1), new Sweep.Listener() { });
        Collections.sort(seen);
        assertEquals(List.of(out.resolve("snapshots/run-00000000").toString(), out.resolve("snapshots/run-00000001").toString()),
                seen);
        seen.clear();
        Sweep.run(plan.withShard(1, 1), scenario, tmp.resolve("nosnap"), new RunSpec(recorder, false, Double.NaN, null),
                new LocalEngine(1), new Sweep.Listener() { });
        assertEquals(List.of("null", "null"), seen);
        assertTrue(Files.exists(tmp.resolve("nosnap/results.csv")));
    }
}
