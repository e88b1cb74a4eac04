package org.holdfast.run;

/**
 * Watches a run's stepping loop. Snapshots, progress, fate detection and film frames are all
 * observers of the same loop. The view passed in is live: read it during the call, copy what
 * must be kept, never modify it.
 */
public interface RunObserver {

    /** Before the first step, with the initial state (in the centre-of-mass frame). */
    default void init(RunView run) {
    }

    /** After every completed step. Keep it cheap. */
    default void afterStep(RunView run) {
    }

    /**
     * At each snapshot time: the start, every {@code snapshotEveryMyr}, and the final state.
     * No step is shortened to land there: inside a step the view shows the bodies sampled from
     * the step's interpolant at the snapshot time (and the tracers stepped there).
     */
    default void atSnapshot(RunView run) {
    }

    /** After the last step, with why the run stopped. */
    default void finish(RunView run, StopReason reason) {
    }
}
