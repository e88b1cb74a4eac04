package org.holdfast.sweep;

import java.io.Serializable;
import java.nio.file.Path;

import org.holdfast.schema.Overrides;

/**
 * Runs one realisation of a scenario headless and returns its fates: the one seam between the
 * sweep machinery and the physics. Implementations must be thread-safe (several workers call
 * one instance at once), deterministic for a given (scenario, overrides, seed, sample, until),
 * and serializable, because the Spark engine ships the instance to its executors.
 */
@FunctionalInterface
public interface RunFunction extends Serializable {

    /**
     * @param scenario the scenario file
     * @param overrides dotted-key values that replace scenario values, as {@code evolve --set}
     * @param seed the seed of the draws
     * @param draw the draw index: uncertain numbers take draw {@code draw} of {@code seed}, as
     *     {@code evolve --seed SEED --sample DRAW} does
     * @param sample whether to draw every uncertain number from its distribution with the seed
     *     (otherwise uncertain numbers take their central values)
     * @param untilGyr end of the run; NaN for the scenario's own until_gyr
     * @param snapshotDir where to write snapshots; null for none (fates only)
     * @return the fates
     * @throws org.holdfast.schema.ScenarioException for bad input (an unknown override key)
     */
    RunOutcome run(Path scenario, Overrides overrides, long seed, long draw, boolean sample, double untilGyr,
            Path snapshotDir);
}
