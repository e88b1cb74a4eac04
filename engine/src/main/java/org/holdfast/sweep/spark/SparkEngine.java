package org.holdfast.sweep.spark;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.holdfast.sweep.RunRecord;
import org.holdfast.sweep.RunSpec;
import org.holdfast.sweep.RunTask;
import org.holdfast.sweep.SweepEngine;

/**
 * Makes the runs as Spark tasks, one run per task. The scenario's text and every file it refers
 * to (a w(a) table) travel with the job ({@link ScenarioShipment}; executors need not see the
 * driver's files); each executor writes them to a local temporary folder once. Runs go out in batches; each batch's records come back to the driver, which
 * appends them to the journal, so a stopped Spark sweep resumes like a local one and loses at
 * most the batch in flight.
 */
public final class SparkEngine implements SweepEngine {

    /** Runs per batch, per core of the cluster. */
    static final int BATCH_PER_CORE = 16;

    private final String master;

    /** @param master the Spark master URL; null for the one spark-submit configured */
    public SparkEngine(String master) {
        this.master = master;
    }

    @Override
    public void run(Path scenario, RunSpec spec, List<RunTask> tasks, Consumer<RunRecord> sink) throws IOException {
        if (tasks.isEmpty()) {
            return;
        }
        SparkConf conf = new SparkConf().setAppName("holdfast sweep " + scenario.getFileName());
        if (master != null) {
            conf.setMaster(master);
        }
        conf.setIfMissing("spark.ui.enabled", "false");
        java.util.Set<String> values = new java.util.LinkedHashSet<>();
        for (RunTask t : tasks) {
            values.addAll(t.overrides().values());
        }
        ScenarioShipment shipment = ScenarioShipment.of(scenario, values);
        try (JavaSparkContext sc = new JavaSparkContext(conf)) {
            int cores = Math.max(1, sc.defaultParallelism());
            int batch = cores * BATCH_PER_CORE;
            RunOnExecutor work = new RunOnExecutor(spec, shipment);
            for (int from = 0; from < tasks.size(); from += batch) {
                List<RunTask> part = tasks.subList(from, Math.min(tasks.size(), from + batch));
                List<RunRecord> done = sc.parallelize(List.copyOf(part), part.size()).map(work::call).collect();
                done.forEach(sink);
            }
        }
    }
}
