package org.holdfast.scenario;

import java.util.Arrays;

import org.holdfast.forces.CoulombLog;
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
        run.allowOnly("until_gyr", "start_gyr", "integrator", "accuracy", "tolerance", "step_myr", "snapshot_every_myr",
                "dark_energy_force", "background_matter", "seed", "dynamical_friction", "coulomb_log", "merge_within_kpc");
        double start = run.number("start_gyr", 0.0);
        double until = Double.isNaN(untilOverrideGyr) ? run.number("until_gyr") : untilOverrideGyr;
        if (until == start && !Double.isNaN(untilOverrideGyr)) {
            throw new ScenarioException("--until", null, "the run would be empty: it ends where it starts ("
                    + Node.fmt(start) + " Gyr from today)");
        }
        if (until == start) {
            throw run.error("until_gyr", "the run would be empty: until_gyr equals start_gyr (" + Node.fmt(start) + ")");
        }
        boolean hasStep = run.has("step_myr");
        boolean hasAccuracy = run.has("accuracy");
        // accuracy and step_myr belong to the splitting schemes: a scenario that gives one without
        // naming an integrator keeps the leapfrog it was written for
        Scheme fallback = hasStep || hasAccuracy ? Scheme.LEAPFROG : Scheme.IAS15;
        String schemeName = run.choice("integrator",
                Arrays.stream(Scheme.values()).map(Scheme::key).toList(), fallback.key());
        boolean ias15 = Scheme.IAS15.key().equals(schemeName);
        if (hasStep && hasAccuracy) {
            throw run.error("step_myr", "give either step_myr (a fixed step) or accuracy (an adaptive step), not both");
        }
        if (ias15 && hasAccuracy) {
            throw run.error("accuracy", "is the step parameter of leapfrog and yoshida4; ias15 takes tolerance"
                    + " (its step-control parameter epsilon, default 1e-9)");
        }
        if (!ias15 && run.has("tolerance")) {
            throw run.error("tolerance", "is the step-control parameter of ias15; " + schemeName + " takes accuracy");
        }
        if (hasStep && run.has("tolerance")) {
            throw run.error("tolerance", "give either step_myr (a fixed step) or tolerance (an adaptive step), not both");
        }
        double step = hasStep ? run.positive("step_myr") : Double.NaN;
        double accuracy;
        if (hasStep) {
            accuracy = Double.NaN;
        } else if (ias15) {
            accuracy = run.positive("tolerance", org.holdfast.integrators.Ias15.DEFAULT_EPSILON);
            if (!(accuracy < 1e-3)) {
                throw run.error("tolerance", "must be below 1e-3 (default 1e-9; 1e-12 to 1e-6 are sensible), got "
                        + Node.fmt(accuracy));
            }
        } else {
            accuracy = run.positive("accuracy", DEFAULT_ACCURACY);
        }
        double snap = run.positive("snapshot_every_myr", DEFAULT_SNAPSHOT_MYR);
        boolean de = run.bool("dark_energy_force", true);
        boolean matter = run.bool("background_matter", false);
        long seed = run.integer("seed", Long.MIN_VALUE, Long.MAX_VALUE, 1L);
        boolean friction = run.bool("dynamical_friction", false);
        CoulombLog log = coulombLog(run, CoulombLog.DEFAULT);
        double mergeWithin = Double.NaN;
        if (run.has("merge_within_kpc")) {
            mergeWithin = run.number("merge_within_kpc");
            if (mergeWithin < 0) {
                throw run.error("merge_within_kpc", "must be >= 0 (0: no mergers), got " + Node.fmt(mergeWithin));
            }
            if (until < start && mergeWithin > 0) {
                throw run.error("merge_within_kpc", "a backward run (until_gyr " + Node.fmt(until) + " before start_gyr "
                        + Node.fmt(start) + ") cannot have mergers: a merger cannot be undone; remove the key or set it to 0");
            }
        }
        return new RunSettings(start, until, Scheme.of(schemeName), accuracy, step, snap, de, matter, seed,
                friction, log, mergeWithin);
    }

    /**
     * Reads a {@code coulomb_log} key: a positive number, or the name of a published
     * prescription ({@link CoulombLog#PRESCRIPTIONS}).
     */
    public static CoulombLog coulombLog(Node node, CoulombLog fallback) {
        String key = "coulomb_log";
        if (!node.has(key)) {
            return fallback;
        }
        if (node.raw(key) instanceof String) {
            return CoulombLog.named(node.choice(key, CoulombLog.PRESCRIPTIONS));
        }
        double v = node.positive(key);
        if (Double.isInfinite(v)) {
            throw node.error(key, "must be finite");
        }
        return CoulombLog.constant(v);
    }
}
