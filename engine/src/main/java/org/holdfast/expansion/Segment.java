package org.holdfast.expansion;

/**
 * One piece of the expansion table: nodes uniform in a time-like variable u, and on each
 * interval three quintic Hermite polynomials (for ln a, H and the dark-energy term k) built
 * from the value and the first two u-derivatives at both ends. Quintic Hermite interpolation
 * has an error of order h^6 (common practice; e.g. Burden &amp; Faires, Numerical Analysis,
 * section 3.4, from memory).
 *
 * <p>The variable u is t itself in the middle of the history, ln(t - t_BB) after the Big Bang
 * and -ln(t_rip - t) before a big rip, so that power-law behaviour near either singularity is
 * nearly linear in u and needs few nodes.
 */
final class Segment {

    /** u = ln(t - t_BB). */
    static final int EARLY = 0;
    /** u = t. */
    static final int MID = 1;
    /** u = -ln(t_rip - t). */
    static final int LATE = 2;

    /** Values per node: L, L_u, L_uu, H, H_u, H_uu, k, k_u, k_uu. */
    static final int NODE = 9;

    final int kind;
    final double u0;
    final double u1;
    final int intervals;
    final double h;
    final double invH;
    final double[] lnA;
    final double[] hub;
    final double[] k;

    Segment(int kind, double u0, double u1, int intervals) {
        this.kind = kind;
        this.u0 = u0;
        this.u1 = u1;
        this.intervals = intervals;
        this.h = (u1 - u0) / intervals;
        this.invH = 1.0 / h;
        this.lnA = new double[6 * intervals];
        this.hub = new double[6 * intervals];
        this.k = new double[6 * intervals];
    }

    /** The u of node i (the last node is exactly u1). */
    double node(int i) {
        return i == intervals ? u1 : u0 + i * h;
    }

    /** Sets the polynomials of every interval from node values (NODE per node, u-derivatives). */
    void fill(double[] nodes) {
        for (int i = 0; i < intervals; i++) {
            int a = i * NODE;
            int b = a + NODE;
            hermite(lnA, i, nodes[a], nodes[a + 1], nodes[a + 2], nodes[b], nodes[b + 1], nodes[b + 2]);
            hermite(hub, i, nodes[a + 3], nodes[a + 4], nodes[a + 5], nodes[b + 3], nodes[b + 4], nodes[b + 5]);
            hermite(k, i, nodes[a + 6], nodes[a + 7], nodes[a + 8], nodes[b + 6], nodes[b + 7], nodes[b + 8]);
        }
    }

    private void hermite(double[] c, int i, double p0, double d0, double s0, double p1, double d1, double s1) {
        double dd0 = d0 * h;
        double dd1 = d1 * h;
        double ss0 = s0 * h * h;
        double ss1 = s1 * h * h;
        double dp = p1 - p0;
        int j = 6 * i;
        c[j] = p0;
        c[j + 1] = dd0;
        c[j + 2] = 0.5 * ss0;
        c[j + 3] = 10 * dp - 6 * dd0 - 4 * dd1 - 1.5 * ss0 + 0.5 * ss1;
        c[j + 4] = -15 * dp + 8 * dd0 + 7 * dd1 + 1.5 * ss0 - ss1;
        c[j + 5] = 6 * dp - 3 * dd0 - 3 * dd1 - 0.5 * ss0 + 0.5 * ss1;
    }

    /** Interval holding u (clamped to the segment). */
    int index(double u) {
        int i = (int) ((u - u0) * invH);
        return i < 0 ? 0 : (i >= intervals ? intervals - 1 : i);
    }

    static double value(double[] c, int i, double s) {
        int j = 6 * i;
        return c[j] + s * (c[j + 1] + s * (c[j + 2] + s * (c[j + 3] + s * (c[j + 4] + s * c[j + 5]))));
    }

    /** d/ds of the polynomial; divide by h for d/du. */
    static double slope(double[] c, int i, double s) {
        int j = 6 * i;
        return c[j + 1] + s * (2 * c[j + 2] + s * (3 * c[j + 3] + s * (4 * c[j + 4] + s * 5 * c[j + 5])));
    }

    /** Bytes held by the polynomials. */
    long bytes() {
        return 3L * 6 * intervals * Double.BYTES;
    }
}
