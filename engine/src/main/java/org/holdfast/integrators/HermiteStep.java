package org.holdfast.integrators;

/**
 * Dense output of a step from its two ends: quintic Hermite interpolation of each coordinate
 * from position, velocity and acceleration at the start and the end (local error O(h^6), more
 * than the second- and fourth-order splitting schemes need; common practice, e.g. Hairer,
 * N&oslash;rsett &amp; Wanner 1993, Solving ODEs I, sec. II.6), velocities from its derivative.
 * Nothing is allocated per step: {@link #begin} and {@link #end} copy into arrays sized once.
 */
public final class HermiteStep implements DenseOutput {

    private final double[] x0;
    private final double[] v0;
    private final double[] a0;
    private final double[] x1;
    private final double[] v1;
    private final double[] a1;
    private int n;
    private double t0;
    private double t1;

    /** @param capacity the most coordinates */
    public HermiteStep(int capacity) {
        x0 = new double[capacity];
        v0 = new double[capacity];
        a0 = new double[capacity];
        x1 = new double[capacity];
        v1 = new double[capacity];
        a1 = new double[capacity];
    }

    /** Records the start of a step. */
    public void begin(double t, int size, double[] x, double[] v, double[] a) {
        n = size;
        t0 = t;
        t1 = t;
        System.arraycopy(x, 0, x0, 0, size);
        System.arraycopy(v, 0, v0, 0, size);
        System.arraycopy(a, 0, a0, 0, size);
    }

    /** Records the end of the step begun last. */
    public void end(double t, double[] x, double[] v, double[] a) {
        t1 = t;
        System.arraycopy(x, 0, x1, 0, n);
        System.arraycopy(v, 0, v1, 0, n);
        System.arraycopy(a, 0, a1, 0, n);
    }

    @Override
    public double stepStart() {
        return t0;
    }

    @Override
    public double stepEnd() {
        return t1;
    }

    @Override
    public void sample(double t, double[] x, double[] v) {
        double h = t1 - t0;
        if (h == 0) {
            System.arraycopy(x0, 0, x, 0, n);
            System.arraycopy(v0, 0, v, 0, n);
            return;
        }
        double s = (t - t0) / h;
        double s2 = s * s;
        double s3 = s2 * s;
        double s4 = s3 * s;
        double s5 = s4 * s;
        // quintic Hermite basis on [0, 1] and its derivatives
        double h00 = 1 - 10 * s3 + 15 * s4 - 6 * s5;
        double h10 = s - 6 * s3 + 8 * s4 - 3 * s5;
        double h20 = 0.5 * (s2 - 3 * s3 + 3 * s4 - s5);
        double h01 = 10 * s3 - 15 * s4 + 6 * s5;
        double h11 = -4 * s3 + 7 * s4 - 3 * s5;
        double h21 = 0.5 * (s3 - 2 * s4 + s5);
        double d00 = -30 * s2 + 60 * s3 - 30 * s4;
        double d10 = 1 - 18 * s2 + 32 * s3 - 15 * s4;
        double d20 = 0.5 * (2 * s - 9 * s2 + 12 * s3 - 5 * s4);
        double d01 = -d00;
        double d11 = -12 * s2 + 28 * s3 - 15 * s4;
        double d21 = 0.5 * (3 * s2 - 8 * s3 + 5 * s4);
        double hh = h * h;
        for (int i = 0; i < n; i++) {
            x[i] = h00 * x0[i] + h01 * x1[i] + h * (h10 * v0[i] + h11 * v1[i]) + hh * (h20 * a0[i] + h21 * a1[i]);
            v[i] = (d00 * x0[i] + d01 * x1[i]) / h + d10 * v0[i] + d11 * v1[i] + h * (d20 * a0[i] + d21 * a1[i]);
        }
    }
}
