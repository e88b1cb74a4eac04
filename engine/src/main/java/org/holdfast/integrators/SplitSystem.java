package org.holdfast.integrators;

/**
 * A system that a splitting integrator can advance: velocities change by kicks with stored
 * accelerations, positions and the clock by drifts, and accelerations are recomputed at the
 * current positions and time.
 */
public interface SplitSystem {

    /** v += a h, with the stored accelerations. */
    void kick(double h);

    /** x += v h and t += h. */
    void drift(double h);

    /** Recomputes the accelerations at the current positions and time. */
    void updateAccelerations();
}
