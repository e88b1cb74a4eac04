package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.holdfast.console.Version;
import org.holdfast.fates.FateRun;
import org.holdfast.output.SnapshotWriter;
import org.holdfast.output.TrackWriter;
import org.holdfast.run.RunObserver;
import org.holdfast.run.Simulation;
import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.uncertain.UncertainValue;

/**
 * The physics behind a sweep: each run is a whole {@code evolve} of the scenario (fates only,
 * unless snapshots are asked for), on one thread, since a sweep's parallelism is over runs.
 * Stateless, so one instance serves every worker and every Spark executor. Besides the fates,
 * it reads the bound subgroups at the start and the end ({@link GroupAnalysis}), for the
 * outcomes a sweep counts: together, pairs, and the verdict over the members bound at the start.
 */
public final class EngineRunFunction implements RunFunction {

    private static final long serialVersionUID = 1L;

    @Override
    public RunOutcome run(Path scenario, Overrides overrides, long seed, long draw, boolean sample, double untilGyr,
            Path snapshotDir) {
        long t0 = System.nanoTime();
        UncertainNumbers numbers = sample ? UncertainNumbers.sampling(seed, draw) : UncertainNumbers.central();
        Scenario s = ScenarioReader.read(scenario, overrides.copy(), numbers, untilGyr);
        List<RunObserver> observers = new ArrayList<>();
        TrackWriter tracks = null;
        if (snapshotDir != null) {
            observers.add(new SnapshotWriter(snapshotDir, s.name(), Version.number()));
            tracks = new TrackWriter(snapshotDir);
            observers.add(tracks);
        }
        FateRun.Outcome r;
        Simulation sim = null;
        GroupAnalysis.State start;
        GroupAnalysis.State end;
        try {
            if (snapshotDir != null) {
                java.nio.file.Files.createDirectories(snapshotDir);
            }
            sim = FateRun.build(s, 1);
            start = GroupAnalysis.State.of(sim, k(s, sim.tGyr()));
            r = FateRun.run(s, sim, observers);
            end = GroupAnalysis.State.of(sim, k(s, sim.tGyr()));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        } finally {
            if (tracks != null) {
                tracks.close();
            }
            if (sim != null) {
                sim.close();
            }
        }
        List<MemberOutcome> fates = new ArrayList<>();
        for (org.holdfast.fates.MemberFate f : r.members()) {
            fates.add(new MemberOutcome(f.name(), f.fate().key(), finite(f.atGyr()), f.with(), finite(f.leftGyr()), null,
                    null, null));
        }
        GroupAnalysis.Result group = GroupAnalysis.analyse(fates, start, end);
        Map<String, Double> sampled = new TreeMap<>();
        if (sample) {
            for (UncertainValue v : s.uncertain()) {
                sampled.put(v.path(), v.value());
            }
        }
        double bu = r.boundUntilGyr();
        return new RunOutcome(group.verdict(), Double.isNaN(bu) || group.verdict().equals("bound") ? null : bu,
                group.members(),
                r.result().maxEnergyResidual(), (System.nanoTime() - t0) * 1e-9, sampled);
    }

    /** The dark-energy coefficient k(t) (1/Gyr^2) the fates use: zero when the run leaves the force out. */
    private static double k(Scenario s, double tGyr) {
        return s.run().darkEnergyForce() ? s.expansion().darkEnergyAcceleration(tGyr) : 0.0;
    }

    /** A time as written in the tables: null when the run has none. */
    private static Double finite(double tGyr) {
        return Double.isNaN(tGyr) ? null : tGyr;
    }
}
