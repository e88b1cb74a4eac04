package org.holdfast.render;

/**
 * Positions between two saved snapshots. Galaxies, whose velocities are saved, use the cubic
 * Hermite interpolant (matches position and velocity at both ends, so exact for motion that is
 * a cubic in time); tracers, saved without velocities or too many to afford them, may use
 * straight-line blending. Velocities are in kpc/Gyr (convert km/s with
 * {@link org.holdfast.units.Units#KMS_TO_KPC_PER_GYR}).
 */
public final class SnapshotInterpolation {

    private SnapshotInterpolation() {
    }

    /**
     * Cubic Hermite interpolation of one coordinate on [t0, t1] at t.
     *
     * @param x0 value at t0, v0 its rate (per Gyr); likewise x1, v1 at t1
     */
    public static double hermite(double t0, double x0, double v0, double t1, double x1, double v1, double t) {
        double h = t1 - t0;
        double s = (t - t0) / h;
        double s2 = s * s;
        double s3 = s2 * s;
        double h00 = 2 * s3 - 3 * s2 + 1;
        double h10 = s3 - 2 * s2 + s;
        double h01 = -2 * s3 + 3 * s2;
        double h11 = s3 - s2;
        return h00 * x0 + h10 * h * v0 + h01 * x1 + h11 * h * v1;
    }

    /**
     * Rate of change (per Gyr) of the cubic Hermite interpolant of {@link #hermite(double, double,
     * double, double, double, double, double)} at t: the derivative of its basis functions.
     */
    public static double hermiteRate(double t0, double x0, double v0, double t1, double x1, double v1, double t) {
        double h = t1 - t0;
        double s = (t - t0) / h;
        double s2 = s * s;
        double d00 = 6 * s2 - 6 * s;
        double d10 = 3 * s2 - 4 * s + 1;
        double d01 = -6 * s2 + 6 * s;
        double d11 = 3 * s2 - 2 * s;
        return (d00 * x0 + d01 * x1) / h + d10 * v0 + d11 * v1;
    }

    /**
     * Cubic Hermite interpolation of whole arrays of coordinates.
     *
     * @param n number of values to interpolate
     * @param out receives n values (may not alias the inputs)
     */
    public static void hermite(double t0, double[] x0, double[] v0, double t1, double[] x1, double[] v1, double t,
            int n, double[] out) {
        checkInterval(t0, t1, t);
        double h = t1 - t0;
        double s = (t - t0) / h;
        double s2 = s * s;
        double s3 = s2 * s;
        double h00 = 2 * s3 - 3 * s2 + 1;
        double h10 = (s3 - 2 * s2 + s) * h;
        double h01 = -2 * s3 + 3 * s2;
        double h11 = (s3 - s2) * h;
        for (int i = 0; i < n; i++) {
            out[i] = h00 * x0[i] + h10 * v0[i] + h01 * x1[i] + h11 * v1[i];
        }
    }

    /**
     * Cubic Hermite interpolation of float coordinates (tracers saved with their velocities).
     *
     * @param v0 rates at t0 in the units of {@code x0} per Gyr after multiplying by
     *        {@code rateScale} (pass {@link org.holdfast.units.Units#KMS_TO_KPC_PER_GYR} for km/s)
     * @param out receives n values (may not alias the inputs)
     */
    public static void hermite(double t0, float[] x0, float[] v0, double t1, float[] x1, float[] v1, double t,
            double rateScale, int n, float[] out) {
        checkInterval(t0, t1, t);
        double h = t1 - t0;
        double s = (t - t0) / h;
        double s2 = s * s;
        double s3 = s2 * s;
        double h00 = 2 * s3 - 3 * s2 + 1;
        double h10 = (s3 - 2 * s2 + s) * h * rateScale;
        double h01 = -2 * s3 + 3 * s2;
        double h11 = (s3 - s2) * h * rateScale;
        for (int i = 0; i < n; i++) {
            out[i] = (float) (h00 * x0[i] + h10 * v0[i] + h01 * x1[i] + h11 * v1[i]);
        }
    }

    /**
     * Weights of the cubic Hermite interpolant in comoving coordinates: with u = x / a and
     * u' = (v - H x) / a at both snapshots, x(t) = a(t) u(t) = w[0] x0 + w[1] v0 + w[2] x1 +
     * w[3] v1, and its rate x'(t) = H(t) x(t) + a(t) u'(t) = w[4] x0 + w[5] v0 + w[6] x1 + w[7] v1.
     * A body carried by the expansion (constant u) is then followed exactly however much a grows
     * between snapshots, where interpolating x itself overshoots by orders of magnitude near a rip
     * (the comoving frame: common practice in cosmological simulations). With a = 1 and H = 0 at
     * all three times these are the weights of the ordinary Hermite interpolant.
     *
     * @param a0 scale factor at t0, h0 Hubble rate there (per Gyr); likewise a1, h1 at t1, at, ht at t
     * @param w receives 8 weights
     */
    public static void comovingWeights(double t0, double a0, double h0, double t1, double a1, double h1, double t,
            double at, double ht, double[] w) {
        checkInterval(t0, t1, t);
        double h = t1 - t0;
        double s = (t - t0) / h;
        double s2 = s * s;
        double s3 = s2 * s;
        double p00 = 2 * s3 - 3 * s2 + 1;
        double p10 = (s3 - 2 * s2 + s) * h;
        double p01 = -2 * s3 + 3 * s2;
        double p11 = (s3 - s2) * h;
        double d00 = (6 * s2 - 6 * s) / h;
        double d10 = 3 * s2 - 4 * s + 1;
        double d01 = (-6 * s2 + 6 * s) / h;
        double d11 = 3 * s2 - 2 * s;
        double r0 = at / a0;
        double r1 = at / a1;
        w[0] = r0 * (p00 - p10 * h0);
        w[1] = r0 * p10;
        w[2] = r1 * (p01 - p11 * h1);
        w[3] = r1 * p11;
        w[4] = ht * w[0] + r0 * (d00 - d10 * h0);
        w[5] = ht * w[1] + r0 * d10;
        w[6] = ht * w[2] + r1 * (d01 - d11 * h1);
        w[7] = ht * w[3] + r1 * d11;
    }

    /**
     * x = w[0] x0 + w[1] v0 + w[2] x1 + w[3] v1 for whole float arrays (tracers), with rates
     * multiplied by {@code rateScale} first (km/s to kpc/Gyr).
     */
    public static void combine(double[] w, float[] x0, float[] v0, float[] x1, float[] v1, double rateScale, int n,
            float[] out) {
        double c0 = w[0];
        double c1 = w[1] * rateScale;
        double c2 = w[2];
        double c3 = w[3] * rateScale;
        for (int i = 0; i < n; i++) {
            out[i] = (float) (c0 * x0[i] + c1 * v0[i] + c2 * x1[i] + c3 * v1[i]);
        }
    }

    /** Straight-line blending of float coordinates (tracers) at t in [t0, t1]. */
    public static void linear(double t0, float[] x0, double t1, float[] x1, double t, int n, float[] out) {
        checkInterval(t0, t1, t);
        float s = (float) ((t - t0) / (t1 - t0));
        float r = 1 - s;
        for (int i = 0; i < n; i++) {
            out[i] = r * x0[i] + s * x1[i];
        }
    }

    private static void checkInterval(double t0, double t1, double t) {
        if (!(t1 != t0) || !Double.isFinite(t0) || !Double.isFinite(t1)) {
            throw new IllegalArgumentException("snapshot times must differ and be finite: " + t0 + ", " + t1);
        }
        double lo = Math.min(t0, t1);
        double hi = Math.max(t0, t1);
        if (!(t >= lo && t <= hi)) {
            throw new IllegalArgumentException("time " + t + " Gyr lies outside the snapshots [" + lo + ", " + hi + "]");
        }
    }
}
