package org.holdfast.run;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.Binding;
import org.holdfast.forces.Bodies;
import org.holdfast.integrators.DenseOutput;

/**
 * Mergers as located events (the switching-function design of Hipparchus's event handling):
 * for every pair, g(t) = d(t)^2 - R^2 with R its merge distance, sampled on the step's dense
 * output at four points; where g falls through zero the crossing is located by bisection on the
 * interpolant to {@value #TOLERANCE} of the step, and there the pair is tested for binding
 * ({@link Binding#test}, as {@link Mergers} does). The earliest bound crossing is the event: the
 * run sets the bodies to the interpolant there, merges ({@link Mergers#merge}) and restarts the
 * integrator. A pair already inside R at a step's end is left to {@link Mergers#check}, as
 * before (it may become bound later, braked by friction). Nothing is allocated unless a
 * crossing is found.
 */
final class MergerEvents {

    /** Root tolerance as a fraction of the step. */
    static final double TOLERANCE = 1e-13;
    private static final int SAMPLES = 4;

    private final Mergers mergers;
    private final ExpansionHistory history;
    private final boolean darkEnergy;
    private final double[] px;
    private final double[] pv;
    private final double[] radius2;
    private final double[] gPrev;
    private final double[] gNow;
    private final double[] dx = new double[3];
    private final double[] dv = new double[3];
    private int radiiCount = -1;
    private final Object[] radiiHalos;
    private int first;
    private int second;
    private boolean inside;

    MergerEvents(Mergers mergers, ExpansionHistory history, boolean darkEnergy, int capacity) {
        this.mergers = mergers;
        this.history = history;
        this.darkEnergy = darkEnergy;
        this.px = new double[3 * capacity];
        this.pv = new double[3 * capacity];
        int pairs = capacity * (capacity - 1) / 2 + 1;
        this.radius2 = new double[pairs];
        this.gPrev = new double[pairs];
        this.gNow = new double[pairs];
        this.radiiHalos = new Object[capacity];
    }

    /**
     * The earliest time in (t0, t1] at which a pair comes within its merge distance bound, or
     * NaN; then {@link #first} and {@link #second} name the pair.
     */
    double locate(Bodies b, DenseOutput d, double t0, double t1) {
        int n = b.count();
        refreshRadii(b, n);
        d.sample(t0, px, pv);
        separations(n, gPrev);
        double prevT = t0;
        for (int q = 1; q <= SAMPLES; q++) {
            double tq = q == SAMPLES ? t1 : t0 + (t1 - t0) * q / SAMPLES;
            d.sample(tq, px, pv);
            separations(n, gNow);
            double best = Double.NaN;
            int p = 0;
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++, p++) {
                    if (gPrev[p] > 0 && gNow[p] <= 0) {
                        double root = bisect(d, n, i, j, p, prevT, tq);
                        if ((Double.isNaN(best) || Math.abs(root - t0) < Math.abs(best - t0)) && bound(b, n, i, j, root, d)) {
                            best = root;
                            first = i;
                            second = j;
                        }
                    }
                }
            }
            if (!Double.isNaN(best)) {
                return best;
            }
            System.arraycopy(gNow, 0, gPrev, 0, p);
            prevT = tq;
        }
        inside = false;
        int pairs = n * (n - 1) / 2;
        for (int p = 0; p < pairs; p++) {
            inside |= gNow[p] <= 0;
        }
        return Double.NaN;
    }

    /** Whether some pair was inside its merge distance at the end of the last step without an event. */
    boolean anyInside() {
        return inside;
    }

    int first() {
        return first;
    }

    int second() {
        return second;
    }

    private void refreshRadii(Bodies b, int n) {
        boolean same = n == radiiCount;
        for (int i = 0; same && i < n; i++) {
            same = radiiHalos[i] == b.halo[i];
        }
        if (same) {
            return;
        }
        int p = 0;
        for (int i = 0; i < n; i++) {
            radiiHalos[i] = b.halo[i];
            for (int j = i + 1; j < n; j++, p++) {
                double r = mergers.distanceFor(b.halo[i], b.halo[j]);
                radius2[p] = r * r;
            }
        }
        radiiCount = n;
    }

    private void separations(int n, double[] g) {
        int p = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++, p++) {
                g[p] = gap(n, i, j, p);
            }
        }
    }

    private double gap(int n, int i, int j, int p) {
        double ex = px[j] - px[i];
        double ey = px[n + j] - px[n + i];
        double ez = px[2 * n + j] - px[2 * n + i];
        return ex * ex + ey * ey + ez * ez - radius2[p];
    }

    private double bisect(DenseOutput d, int n, int i, int j, int p, double a, double bEnd) {
        double lo = a;
        double hi = bEnd;
        double tol = TOLERANCE * Math.abs(bEnd - a) * SAMPLES;
        for (int k = 0; k < 200 && Math.abs(hi - lo) > tol; k++) {
            double mid = 0.5 * (lo + hi);
            if (mid == lo || mid == hi) {
                break;
            }
            d.sample(mid, px, pv);
            if (gap(n, i, j, p) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return hi;
    }

    /** The binding test of {@link Mergers}, at time t on the interpolant. */
    private boolean bound(Bodies b, int n, int i, int j, double t, DenseOutput d) {
        d.sample(t, px, pv);
        for (int k = 0; k < 3; k++) {
            dx[k] = px[k * n + j] - px[k * n + i];
            dv[k] = pv[k * n + j] - pv[k * n + i];
        }
        double kde = darkEnergy ? history.darkEnergyAcceleration(t) : 0;
        return Binding.test(b.mass[i] + b.mass[j], kde, dx, dv).bound();
    }
}
