package org.holdfast.bench;

import java.util.Map;

/**
 * A group of benchmarks that {@code holdfast bench} runs. Implementations are found with
 * {@link java.util.ServiceLoader} (listed in {@code META-INF/services}), so the viewer module
 * adds its rendering benchmarks without the engine knowing about them.
 */
public interface BenchSuite {

    /** Short name, used by {@code holdfast bench --only NAME}. */
    String name();

    /**
     * Runs the benchmarks and puts each figure into {@code results} under a stable key whose
     * name carries its unit ({@code lookup_ns}, {@code pair_interactions_per_s}).
     *
     * @param quick fewer repetitions, for a smoke test; figures are then rough
     */
    void run(boolean quick, Map<String, Object> results);
}
