package org.holdfast.run;

import org.holdfast.integrators.DenseOutput;

/**
 * Advances the bodies of a {@link GroupSystem} (never its tracers) by one step of the run's
 * scheme and leaves that step's interpolant behind. The loop never shortens a step to land on
 * an output time: outputs sample {@link #dense()}; a step ends early only at the end of the run,
 * the edge of the expansion history, or a located event.
 */
interface GalaxyStepper {

    /** Takes one step of at most |limit| (signed); returns the step taken, 0 if it could not step. */
    double step(double limit);

    /** The last step's interpolant (coordinates x..., y..., z... of the bodies). */
    DenseOutput dense();

    /** The state of the bodies was changed from outside (a merger): start afresh from it. */
    void restart();

    /** Force evaluations so far. */
    long evaluations();

    /** The earliest clock reading inside a step, as a fraction of the step. */
    double minTimeFraction();

    /** The latest clock reading inside a step, as a fraction of the step. */
    double maxTimeFraction();
}
