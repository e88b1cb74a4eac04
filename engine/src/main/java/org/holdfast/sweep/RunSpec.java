package org.holdfast.sweep;

import java.io.Serializable;
import java.nio.file.Path;
import java.util.Map;

import org.holdfast.schema.Overrides;

/**
 * What all runs of a sweep share: the physics, whether to sample, the end time and where
 * snapshots go. Serializable, so that a Spark executor can make runs from it.
 *
 * @param function the physics
 * @param sample draw uncertain numbers from their distributions
 * @param untilGyr end time; NaN for the scenario's own
 * @param snapshotRoot folder for per-run snapshot folders; null for none
 */
public record RunSpec(RunFunction function, boolean sample, double untilGyr, String snapshotRoot)
        implements Serializable {

    private static final long serialVersionUID = 1L;

    /**
     * Makes one run. The wall-clock time recorded is measured here, around the call, so that
     * every physics implementation is timed the same way.
     */
    public RunRecord execute(Path scenario, RunTask task) {
        Overrides o = Overrides.none();
        for (Map.Entry<String, String> e : task.overrides().entrySet()) {
            o.put(e.getKey(), e.getValue(), task.varied().contains(e.getKey()) ? Axis.OPTION : Overrides.OPTION);
        }
        Path snaps = snapshotRoot == null ? null
                : Path.of(snapshotRoot).resolve(String.format("run-%08d", task.run()));
        long t0 = System.nanoTime();
        RunOutcome out = function.run(scenario, o, task.seed(), task.draw(), sample, untilGyr, snaps);
        double wall = (System.nanoTime() - t0) * 1e-9;
        if (out == null) {
            throw new IllegalStateException("the physics returned no outcome for run " + task.run());
        }
        return new RunRecord(task.run(), task.point(), task.sample(), task.seed(), out.withWallS(wall));
    }
}
