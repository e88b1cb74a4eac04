package org.holdfast.sweep.spark;

import java.io.Serializable;

import org.holdfast.sweep.RunRecord;
import org.holdfast.sweep.RunSpec;
import org.holdfast.sweep.RunTask;

/** The work of one Spark task: one run, made on an executor. */
final class RunOnExecutor implements Serializable {

    private static final long serialVersionUID = 1L;

    private final RunSpec spec;
    private final ScenarioShipment scenario;

    RunOnExecutor(RunSpec spec, ScenarioShipment scenario) {
        this.spec = spec;
        this.scenario = scenario;
    }

    RunRecord call(RunTask task) {
        return spec.execute(scenario.localFile(), task);
    }
}
