package org.holdfast.integrators;

/**
 * A {@link SplitSystem} that can try a step and take it back, and that knows its own shortest
 * dynamical time. During a trial the system may leave out its massless parts, which do not
 * change the step.
 */
public interface TrialSystem extends SplitSystem {

    /** The shortest dynamical time of the current state, Gyr (infinite if nothing sets one). */
    double timescale();

    /** Saves the state and starts a trial. */
    void beginTrial();

    /** Restores the state saved by {@link #beginTrial} and ends the trial. */
    void endTrial();
}
