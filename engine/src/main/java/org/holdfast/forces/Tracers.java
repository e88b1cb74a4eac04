package org.holdfast.forces;

/**
 * Massless tracers (stars and flow) in structure-of-arrays form: 10 doubles and two ints each
 * ({@link #BYTES_PER_TRACER}).
 */
public final class Tracers {

    /**
     * Heap bytes per tracer: position, velocity, acceleration, dynamical time, host index and
     * the step level of its own integration.
     */
    public static final long BYTES_PER_TRACER = 10L * Double.BYTES + 2L * Integer.BYTES;

    public final double[] x;
    public final double[] y;
    public final double[] z;
    public final double[] vx;
    public final double[] vy;
    public final double[] vz;
    public final double[] ax;
    public final double[] ay;
    public final double[] az;
    /**
     * The tracer's shortest dynamical time at its last force evaluation, Gyr: 1 / sqrt of the
     * largest G M(&lt;r) / r^3 of any halo at its place, or of 4 |c| of the background.
     */
    public final double[] tau;
    /** Work space of {@link TracerField#advance}: the tracer's step level. */
    public final int[] level;
    /** Index of the body a star belongs to, or -1 for flow tracers. */
    public final int[] host;
    public final int count;

    public Tracers(int count) {
        this.count = count;
        x = new double[count];
        y = new double[count];
        z = new double[count];
        vx = new double[count];
        vy = new double[count];
        vz = new double[count];
        ax = new double[count];
        ay = new double[count];
        az = new double[count];
        host = new int[count];
        tau = new double[count];
        level = new int[count];
    }
}
