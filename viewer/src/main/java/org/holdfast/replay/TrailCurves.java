package org.holdfast.replay;

import org.holdfast.expansion.ExpansionTable;
import java.util.HashMap;
import java.util.Map;

import org.holdfast.render.SnapshotInterpolation;
import org.holdfast.units.Units;

/**
 * The trail of a galaxy's centre as a smooth curve: between two saved samples of its track
 * (position and velocity at each snapshot) the trail follows the cubic Hermite curve (in
 * comoving coordinates when the run's expansion history is known) that also moves the galaxy
 * between snapshots ({@link ReplayScene}), cut into {@link #PIECES}
 * straight pieces of equal time, so that a loop shows no corners. The pieces are fixed per
 * interval, so a frame's trail depends only on its time.
 *
 * <p>Each track is made dense once and kept, until the archive hands out a new track array
 * (a live run's tracks grow).
 */
final class TrailCurves {

    /** Straight pieces per interval between saved samples. */
    static final int PIECES = 16;

    private final Map<String, double[][]> from = new HashMap<>();
    private final Map<String, double[][]> dense = new HashMap<>();

    /**
     * The dense path of a track: rows t, x, y, z with {@code PIECES * (n - 1) + 1} columns, saved
     * sample k at column {@code PIECES * k}.
     *
     * @param track rows t, x, y, z, vx, vy, vz (km/s), as {@link RunArchive#track} gives them
     */
    double[][] dense(String name, double[][] track, ExpansionTable history) {
        double[][] d = dense.get(name);
        if (d != null && from.get(name) == track) {
            return d;
        }
        d = densify(track, history);
        dense.put(name, d);
        from.put(name, track);
        return d;
    }

    static double[][] densify(double[][] track, ExpansionTable history) {
        int n = track[0].length;
        int m = n == 0 ? 0 : PIECES * (n - 1) + 1;
        double[][] d = new double[4][m];
        double[] w = new double[8];
        for (int k = 0; k < n; k++) {
            for (int row = 0; row < 4; row++) {
                d[row][PIECES * k] = track[row][k];
            }
            if (k + 1 < n) {
                double t0 = track[0][k];
                double t1 = track[0][k + 1];
                for (int p = 1; p < PIECES; p++) {
                    double t = t0 + (t1 - t0) * p / PIECES;
                    int at = PIECES * k + p;
                    d[0][at] = t;
                    weights(history, t0, t1, t, w);
                    for (int axis = 0; axis < 3; axis++) {
                        d[1 + axis][at] = along(track, k, axis, w);
                    }
                }
            }
        }
        return d;
    }

    /** One coordinate of the Hermite curve between saved samples k and k + 1, with weights w. */
    private static double along(double[][] track, int k, int axis, double[] w) {
        double c = Units.KMS_TO_KPC_PER_GYR;
        return w[0] * track[1 + axis][k] + w[1] * track[4 + axis][k] * c
                + w[2] * track[1 + axis][k + 1] + w[3] * track[4 + axis][k + 1] * c;
    }

    /**
     * The interpolation weights on [t0, t1] at t ({@link SnapshotInterpolation#comovingWeights}):
     * in comoving coordinates when the history covers all three times, else plain Hermite. The
     * one rule for galaxies, tracers and trails, so that trails lie on the galaxies' curves.
     *
     * @return the scale factor at t from the history, or NaN when it does not cover them
     */
    static double weights(ExpansionTable h, double t0, double t1, double t, double[] w) {
        if (h != null && inside(h, t0) && inside(h, t1) && inside(h, t)) {
            double at = h.scaleFactor(t);
            SnapshotInterpolation.comovingWeights(t0, h.scaleFactor(t0), h.hubbleRate(t0), t1, h.scaleFactor(t1),
                    h.hubbleRate(t1), t, at, h.hubbleRate(t), w);
            return at;
        }
        SnapshotInterpolation.comovingWeights(t0, 1, 0, t1, 1, 0, t, 1, 0, w);
        return Double.NaN;
    }

    private static boolean inside(ExpansionTable h, double t) {
        return t >= h.earliestGyr() && t <= h.latestGyr();
    }
}
