package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.holdfast.cli.Version;
import org.holdfast.fates.FateRun;
import org.holdfast.output.SnapshotWriter;
import org.holdfast.output.TrackWriter;
import org.holdfast.run.RunObserver;
import org.holdfast.scenario.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.uncertain.UncertainValue;

/**
 * The physics behind a sweep: each run is a whole {@code evolve} of the scenario (fates only,
 * unless snapshots are asked for), on one thread, since a sweep's parallelism is over runs.
 * Stateless, so one instance serves every worker and every Spark executor.
 */
public final class EngineRunFunction implements RunFunction {

    private static final long serialVersionUID = 1L;

    @Override
    public RunOutcome run(Path scenario, Overrides overrides, long seed, boolean sample, double untilGyr,
            Path snapshotDir) {
        long t0 = System.nanoTime();
        UncertainNumbers numbers = sample ? UncertainNumbers.sampling(seed, 0) : UncertainNumbers.central();
        Scenario s = ScenarioReader.read(scenario, overrides.copy(), numbers, untilGyr);
        List<RunObserver> observers = new ArrayList<>();
        TrackWriter tracks = null;
        if (snapshotDir != null) {
            observers.add(new SnapshotWriter(snapshotDir, s.name(), Version.number()));
            tracks = new TrackWriter(snapshotDir);
            observers.add(tracks);
        }
        FateRun.Outcome r;
        try {
            if (snapshotDir != null) {
                java.nio.file.Files.createDirectories(snapshotDir);
            }
            r = FateRun.run(s, observers, 1);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        } finally {
            if (tracks != null) {
                tracks.close();
            }
        }
        r.simulation().close();
        List<MemberFate> members = new ArrayList<>();
        for (org.holdfast.fates.MemberFate f : r.members()) {
            members.add(new MemberFate(f.name(), f.fate().key(), Double.isNaN(f.atGyr()) ? null : f.atGyr(), f.with()));
        }
        Map<String, Double> sampled = new TreeMap<>();
        if (sample) {
            for (UncertainValue v : s.uncertain()) {
                sampled.put(v.path(), v.value());
            }
        }
        double bu = r.boundUntilGyr();
        return new RunOutcome(r.verdict().key(), Double.isNaN(bu) ? null : bu, members,
                r.result().maxEnergyResidual(), (System.nanoTime() - t0) * 1e-9, sampled);
    }
}
