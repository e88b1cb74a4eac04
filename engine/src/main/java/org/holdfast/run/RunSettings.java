package org.holdfast.run;

import org.holdfast.group.CoulombLog;
import org.holdfast.integrators.Scheme;

/**
 * How a run steps and what it includes.
 *
 * @param startGyr start time, Gyr from today
 * @param untilGyr end time, Gyr from today; below startGyr the run goes into the past
 * @param scheme the integrator
 * @param accuracy step-size parameter of the adaptive step; NaN for a fixed step
 * @param stepMyr the fixed step in Myr; NaN for an adaptive step
 * @param snapshotEveryMyr interval between snapshots
 * @param darkEnergyForce include the dark-energy term k(t) r
 * @param backgroundMatter include the pull of the mean cosmic matter density
 * @param seed for everything random (tracer placement)
 * @param dynamicalFriction include Chandrasekhar's dynamical friction between members
 * @param coulombLog the run-wide Coulomb logarithm (members may give their own)
 * @param mergeWithinKpc members bound to each other and closer than this merge; NaN for the
 *     default of each pair ({@link Mergers#defaultDistanceKpc}); 0 for no mergers
 */
public record RunSettings(double startGyr, double untilGyr, Scheme scheme, double accuracy, double stepMyr,
        double snapshotEveryMyr, boolean darkEnergyForce, boolean backgroundMatter, long seed,
        boolean dynamicalFriction, CoulombLog coulombLog, double mergeWithinKpc) {

    /** Settings without dynamical friction, with mergers at each pair's default distance. */
    public RunSettings(double startGyr, double untilGyr, Scheme scheme, double accuracy, double stepMyr,
            double snapshotEveryMyr, boolean darkEnergyForce, boolean backgroundMatter, long seed) {
        this(startGyr, untilGyr, scheme, accuracy, stepMyr, snapshotEveryMyr, darkEnergyForce, backgroundMatter, seed,
                false, CoulombLog.DEFAULT, Double.NaN);
    }

    /** The same settings with friction switched on or off. */
    public RunSettings withFriction(boolean on, CoulombLog log) {
        return new RunSettings(startGyr, untilGyr, scheme, accuracy, stepMyr, snapshotEveryMyr, darkEnergyForce,
                backgroundMatter, seed, on, log, mergeWithinKpc);
    }

    /** The same settings with another merge distance (NaN: default, 0: none). */
    public RunSettings withMergeWithin(double kpc) {
        return new RunSettings(startGyr, untilGyr, scheme, accuracy, stepMyr, snapshotEveryMyr, darkEnergyForce,
                backgroundMatter, seed, dynamicalFriction, coulombLog, kpc);
    }

    /** Whether members may merge: not in a backward run (a merger cannot be undone), not at distance 0. */
    public boolean mergers() {
        return !backward() && mergeWithinKpc != 0;
    }

    /** Whether the step is fixed (stepMyr given) rather than adaptive. */
    public boolean fixedStep() {
        return !Double.isNaN(stepMyr);
    }

    /** Whether the run goes into the past. */
    public boolean backward() {
        return untilGyr < startGyr;
    }
}
