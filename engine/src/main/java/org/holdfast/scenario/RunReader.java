package org.holdfast.scenario;

import java.util.Arrays;

import org.holdfast.run.RunSettings;
import org.holdfast.run.RunSettings.Scheme;

/** Reads the {@code [run]} table of a scenario. */
public final class RunReader {

    /** Default adaptive-step accuracy parameter. */
    public static final double DEFAULT_ACCURACY = 0.01;

    /** Default snapshot interval, Myr. */
    public static final double DEFAULT_SNAPSHOT_MYR = 100.0;

    private RunReader() {
    }

    /**
     * Reads {@code [run]}.
     *
     * @param untilOverrideGyr replaces until_gyr when not NaN (the {@code --until} option)
     */
    public static RunSettings read(Node root, double untilOverrideGyr) {
        Node run = root.requireTable("run");
        run.allowOnly("until_gyr", "start_gyr", "integrator", "accuracy", "step_myr", "snapshot_every_myr",
                "dark_energy_force", "background_matter", "seed");
        double start = run.number("start_gyr", 0.0);
        double until = Double.isNaN(untilOverrideGyr) ? run.number("until_gyr") : untilOverrideGyr;
        if (until == start) {
            throw run.error("until_gyr", "the run would be empty: until_gyr equals start_gyr (" + Node.fmt(start) + ")");
        }
        String schemeName = run.choice("integrator",
                Arrays.stream(Scheme.values()).map(Scheme::key).toList(), Scheme.LEAPFROG.key());
        boolean hasStep = run.has("step_myr");
        boolean hasAccuracy = run.has("accuracy");
        if (hasStep && hasAccuracy) {
            throw run.error("step_myr", "give either step_myr (a fixed step) or accuracy (an adaptive step), not both");
        }
        double step = hasStep ? run.positive("step_myr") : Double.NaN;
        double accuracy = hasStep ? Double.NaN : run.positive("accuracy", DEFAULT_ACCURACY);
        double snap = run.positive("snapshot_every_myr", DEFAULT_SNAPSHOT_MYR);
        boolean de = run.bool("dark_energy_force", true);
        boolean matter = run.bool("background_matter", false);
        long seed = run.integer("seed", Long.MIN_VALUE, Long.MAX_VALUE, 1L);
        return new RunSettings(start, until, Scheme.of(schemeName), accuracy, step, snap, de, matter, seed);
    }
}
