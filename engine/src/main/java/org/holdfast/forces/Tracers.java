package org.holdfast.forces;

/**
 * Massless tracers (stars and flow) in structure-of-arrays form: 9 doubles and one int each
 * ({@link #BYTES_PER_TRACER}).
 */
public final class Tracers {

    /** Heap bytes per tracer: position, velocity, acceleration and host index. */
    public static final long BYTES_PER_TRACER = 9L * Double.BYTES + Integer.BYTES;

    public final double[] x;
    public final double[] y;
    public final double[] z;
    public final double[] vx;
    public final double[] vy;
    public final double[] vz;
    public final double[] ax;
    public final double[] ay;
    public final double[] az;
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
    }
}
