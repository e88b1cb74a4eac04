package org.holdfast.scenario;

import java.util.Arrays;

import org.holdfast.group.CoulombLog;
import org.holdfast.run.RunSettings;
import org.holdfast.integrators.Scheme;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.Node;

/** Reads the {@code [run]} table of a scenario. */
public final class RunReader {

    /** Default adaptive-step accuracy parameter. */
    public static final double DEFAULT_ACCURACY = 0.01;

    /** Default snapshot interval, Myr. */
    public static final double DEFAULT_SNAPSHOT_MYR = 100.0;

    /** The most steps of a fixed-step run. */
    public static final long MAX_FIXED_STEPS = 1_000_000_000L;

    /** The smallest adaptive-step accuracy parameter. */
    public static final double MIN_ACCURACY = 1e-5;

    /** The most snapshots one run writes. */
    public static final long MAX_SNAPSHOTS = 100_000;

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
            // below about 1e-16 the error estimate is round-off and the step would shrink without end
            if (!(accuracy < 1e-3) || accuracy < 1e-16) {
                throw run.error("tolerance", "must be from 1e-16 to below 1e-3 (default 1e-9; 1e-12 to 1e-6 are"
                        + " sensible), got " + Node.fmt(accuracy));
            }
        } else {
            accuracy = run.positive("accuracy", DEFAULT_ACCURACY);
        }
        checkStepping(run, start, until, step, ias15 ? Double.NaN : accuracy);
        double snap = run.positive("snapshot_every_myr", DEFAULT_SNAPSHOT_MYR);
        checkSnapshotCount(run, start, until, snap, untilOverrideGyr);
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
     * Refuses step settings that would never finish or resolve nothing: more than
     * {@link #MAX_FIXED_STEPS} fixed steps, or an accuracy parameter outside [{@link #MIN_ACCURACY}, 1]
     * (the adaptive step is this fraction of the shortest dynamical time: above 1 no orbit is
     * resolved; far below 1e-5 leapfrog's truncation error, which falls as its square, is below
     * the rounding accumulated over its millions of steps and each step buys nothing; common practice).
     */
    private static void checkStepping(Node run, double start, double until, double stepMyr, double accuracy) {
        if (!Double.isNaN(stepMyr)) {
            double steps = Math.abs(until - start) * 1e3 / stepMyr;
            if (steps > MAX_FIXED_STEPS) {
                throw run.error("step_myr", String.format(java.util.Locale.ROOT,
                        "%s Myr over a run of %s Gyr is %.3g steps; at most %.0e (a step of at least %s Myr)",
                        Node.fmt(stepMyr), Node.fmt(Math.abs(until - start)), steps, (double) MAX_FIXED_STEPS,
                        Node.fmt(Math.abs(until - start) * 1e3 / MAX_FIXED_STEPS)));
            }
        } else if (accuracy < MIN_ACCURACY || accuracy > 1) {
            throw run.error("accuracy", "must be from " + Node.fmt(MIN_ACCURACY) + " to 1 (got " + Node.fmt(accuracy)
                    + "): the step is this fraction of the shortest dynamical time");
        }
    }

    /**
     * Refuses a run that would write more than {@link #MAX_SNAPSHOTS} snapshots (a mistyped
     * interval, 1e-9 Myr, would otherwise fill a disk before anyone stops it), before anything is
     * written.
     */
    private static void checkSnapshotCount(Node run, double start, double until, double snapMyr,
            double untilOverrideGyr) {
        double span = Math.abs(until - start);
        double count = span * 1e3 / snapMyr;
        if (count > MAX_SNAPSHOTS) {
            String key = "snapshot_every_myr";
            String msg = String.format(java.util.Locale.ROOT,
                    "%s Myr over a run of %s Gyr asks for %.3g snapshots; at most %,d are written"
                    + " (an interval of at least %s Myr)", Node.fmt(snapMyr), Node.fmt(span),
                    count, MAX_SNAPSHOTS, Node.fmt(span * 1e3 / MAX_SNAPSHOTS));
            boolean keyOverridden = run.where(key).startsWith("--");
            if (!(span < 1e12)) {
                msg = "a run of " + Node.fmt(span) + " Gyr is far longer than any expansion history holdfast can follow";
                keyOverridden = false;
            }
            if (!keyOverridden && !Double.isNaN(untilOverrideGyr)) {
                throw new ScenarioException("--until", null, msg);
            }
            if (!(span < 1e12)) {
                throw run.error("until_gyr", msg);
            }
            throw run.error(key, msg);
        }
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
