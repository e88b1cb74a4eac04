package org.holdfast.integrators;

/**
 * The interpolant of the last step an integrator took: positions and velocities at any time
 * between the step's start and its end, to the accuracy of the scheme, without another force
 * evaluation.
 */
public interface DenseOutput {

    /** Start of the last step. */
    double stepStart();

    /** End of the last step. */
    double stepEnd();

    /**
     * Writes the positions and velocities at time t (between {@link #stepStart} and
     * {@link #stepEnd}) into x and v, in the system's coordinate layout.
     */
    void sample(double t, double[] x, double[] v);
}
