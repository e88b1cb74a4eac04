package org.holdfast.replay;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.render.SceneFrame;
import org.holdfast.render.SnapshotInterpolation;
import org.holdfast.units.Units;

/**
 * Fills a {@link SceneFrame} for any time of a run from its two nearest snapshots. Galaxies and
 * tracers both move along the cubic Hermite interpolant of their saved positions and velocities
 * in comoving coordinates, scaled by a(t) (exact for motion that is cubic in time between
 * snapshots in the comoving frame, and for anything carried by the expansion: near a rip,
 * where a grows by a large factor between snapshots, nothing overshoots); the scale factor and
 * the rate H come from the run's expansion history (an older run folder without a recorded
 * cosmology falls back to plain Hermite curves and a linear blend of the snapshots' a). A galaxy that merges between two snapshots glides from its own
 * last state towards its survivor's next one and disappears at the merger's time. Trails follow
 * the same curves through the saved track samples up to now (from {@code tracks.csv}, see
 * {@link TrailCurves}) and end at the current position.
 *
 * <p>Holds its arrays and reuses them frame after frame; one scene per renderer.
 */
public final class ReplayScene {

    private final RunArchive run;
    private final SceneFrame frame = new SceneFrame();
    private final List<String> order;
    private String[] names = new String[0];
    private int[] colour = new int[0];
    private double[] gx = new double[0];
    private double[] gy = new double[0];
    private double[] gz = new double[0];
    /** Current velocities of the galaxies shown, kpc/Gyr (where their trails end). */
    private double[] gvx = new double[0];
    private double[] gvy = new double[0];
    private double[] gvz = new double[0];
    private final TrailCurves curves = new TrailCurves();
    private float[] tx = new float[0];
    private float[] ty = new float[0];
    private float[] tz = new float[0];
    private final List<FateEvent> shown = new ArrayList<>();
    /** The event list {@link #shown} was taken from; null before the first frame. */
    private List<FateEvent> shownFrom;

    public ReplayScene(RunArchive run) {
        this.run = run;
        this.order = run.initialNames();
    }

    /** The run replayed. */
    public RunArchive run() {
        return run;
    }

    /**
     * The scene at {@code tGyr}, which must lie within the run.
     *
     * @throws IllegalArgumentException for a time outside the snapshots
     */
    public SceneFrame at(double tGyr) {
        if (!(tGyr >= run.earliestGyr() && tGyr <= run.latestGyr())) {
            throw new IllegalArgumentException("time " + tGyr + " Gyr outside the run (" + run.earliestGyr()
                    + " to " + run.latestGyr() + ")");
        }
        int i = run.bracket(tGyr);
        Snapshot s0 = run.snapshot(i);
        Snapshot s1 = run.snapshotCount() > 1 ? run.snapshot(i + 1) : s0;
        double a = weights(s0, s1, tGyr);
        fillGalaxies(s0, s1, tGyr);
        fillTracers(s0, s1, tGyr);
        frame.setClock(tGyr, a);
        frame.setRip(run.ripGyr());
        showEvents(tGyr);
        return frame;
    }

    /**
     * Fills {@link #w} for the interval [s0, s1] at t and returns the scale factor at t: from the
     * run's expansion history when it is known (positions then interpolate in comoving
     * coordinates), else blended from the snapshots' values (positions then interpolate as they
     * are, an older run folder).
     */
    private double weights(Snapshot s0, Snapshot s1, double t) {
        org.holdfast.expansion.ExpansionTable h = run.history();
        if (s1 == s0) {
            return h != null && t >= h.earliestGyr() && t <= h.latestGyr() ? h.scaleFactor(t) : s0.scaleFactor();
        }
        double a = TrailCurves.weights(h, s0.tGyr(), s1.tGyr(), t, w);
        return !Double.isNaN(a) ? a
                : s0.scaleFactor() + (s1.scaleFactor() - s0.scaleFactor()) * (t - s0.tGyr()) / (s1.tGyr() - s0.tGyr());
    }

    /** Weights of the trail's last piece. */
    private final double[] pw = new double[8];

    /** Interpolation weights of the current frame (see {@link SnapshotInterpolation#comovingWeights}). */
    private final double[] w = new double[8];

    /** Sets the events up to t, only when they differ from the last frame's (setEvents copies them). */
    private void showEvents(double tGyr) {
        List<FateEvent> all = run.events();
        double dir = run.lastGyr() >= run.firstGyr() ? 1 : -1;
        boolean same = all == shownFrom;
        int k = 0;
        for (int i = 0; i < all.size(); i++) {
            FateEvent e = all.get(i);
            if ((e.tGyr() - tGyr) * dir <= 0) {
                same &= k < shown.size() && shown.get(k) == e;
                k++;
            }
        }
        if (same && k == shown.size()) {
            return;
        }
        shown.clear();
        for (int i = 0; i < all.size(); i++) {
            FateEvent e = all.get(i);
            if ((e.tGyr() - tGyr) * dir <= 0) {
                shown.add(e);
            }
        }
        shownFrom = all;
        frame.setEvents(shown);
    }

    /** Position of galaxy {@code name} at {@code tGyr} into xyz; false when it is not there then. */
    public boolean centreOf(String name, double tGyr, double[] xyz) {
        SceneFrame f = at(tGyr);
        for (int g = 0; g < f.galaxyCount(); g++) {
            if (f.name(g).equals(name)) {
                xyz[0] = f.galaxyX(g);
                xyz[1] = f.galaxyY(g);
                xyz[2] = f.galaxyZ(g);
                return true;
            }
        }
        return false;
    }

    private void fillGalaxies(Snapshot s0, Snapshot s1, double t) {
        int n = s0.galaxyCount();
        ensureGalaxies(n);
        double k = Units.KMS_TO_KPC_PER_GYR;
        int shownCount = 0;
        for (int g = 0; g < n; g++) {
            String name = s0.names()[g];
            int j = s1.indexOf(name);
            if (s1 == s0) {
                j = g;
            } else if (j < 0) {
                FateEvent merger = mergerOf(name, s0.tGyr(), s1.tGyr());
                if (merger != null && (t - merger.tGyr()) * (s1.tGyr() - s0.tGyr()) >= 0) {
                    continue;
                }
                j = merger == null ? -1 : s1.indexOf(merger.members().get(0));
                if (j < 0) {
                    continue;
                }
            }
            names[shownCount] = name;
            int c = order.indexOf(name);
            colour[shownCount] = c >= 0 ? c : g;
            if (s1 == s0) {
                gx[shownCount] = s0.positionKpc()[0][g];
                gy[shownCount] = s0.positionKpc()[1][g];
                gz[shownCount] = s0.positionKpc()[2][g];
                gvx[shownCount] = s0.velocityKms()[0][g] * k;
                gvy[shownCount] = s0.velocityKms()[1][g] * k;
                gvz[shownCount] = s0.velocityKms()[2][g] * k;
            } else {
                gx[shownCount] = coordinate(s0, g, s1, j, 0, t, k);
                gy[shownCount] = coordinate(s0, g, s1, j, 1, t, k);
                gz[shownCount] = coordinate(s0, g, s1, j, 2, t, k);
                gvx[shownCount] = rate(s0, g, s1, j, 0, t, k);
                gvy[shownCount] = rate(s0, g, s1, j, 1, t, k);
                gvz[shownCount] = rate(s0, g, s1, j, 2, t, k);
            }
            shownCount++;
        }
        frame.setGalaxies(shownCount, names, colour, gx, gy, gz);
        for (int g = 0; g < shownCount; g++) {
            setTrail(g, t);
        }
    }

    private double coordinate(Snapshot s0, int g, Snapshot s1, int j, int axis, double t, double k) {
        return w[0] * s0.positionKpc()[axis][g] + w[1] * s0.velocityKms()[axis][g] * k
                + w[2] * s1.positionKpc()[axis][j] + w[3] * s1.velocityKms()[axis][j] * k;
    }

    private double rate(Snapshot s0, int g, Snapshot s1, int j, int axis, double t, double k) {
        return w[4] * s0.positionKpc()[axis][g] + w[5] * s0.velocityKms()[axis][g] * k
                + w[6] * s1.positionKpc()[axis][j] + w[7] * s1.velocityKms()[axis][j] * k;
    }

    /** The merger that took {@code name} away between two snapshot times, or null. */
    private FateEvent mergerOf(String name, double t0, double t1) {
        double lo = Math.min(t0, t1);
        double hi = Math.max(t0, t1);
        List<FateEvent> all = run.events();
        for (int i = 0; i < all.size(); i++) {
            FateEvent e = all.get(i);
            if (e.kind() == RunEvent.Kind.MERGED && e.tGyr() >= lo && e.tGyr() <= hi
                    && e.members().indexOf(name) > 0) {
                return e;
            }
        }
        return null;
    }

    private double[][] trailT = new double[0][];
    private double[][] trailX = new double[0][];
    private double[][] trailY = new double[0][];
    private double[][] trailZ = new double[0][];

    /**
     * The trail of shown galaxy g at t: the dense curve through its saved samples before t, then
     * the Hermite curve from the last of them to where the galaxy is now, moving as it moves now
     * (for motion that is cubic between snapshots this is the very curve the galaxy follows).
     */
    private void setTrail(int g, double t) {
        double[][] track = run.track(names[g]);
        if (track == null) {
            return;
        }
        double dir = run.lastGyr() >= run.firstGyr() ? 1 : -1;
        int saved = track[0].length;
        int m = 0;
        while (m < saved && (track[0][m] - t) * dir < 0) {
            m++;
        }
        int p = TrailCurves.PIECES;
        int prefix = m == 0 ? 0 : p * (m - 1) + 1;
        int count = m == 0 ? 1 : prefix + p;
        if (trailT[g] == null || trailT[g].length < count) {
            int room = Math.max(count, saved == 0 ? 1 : p * saved + 1);
            trailT[g] = new double[room];
            trailX[g] = new double[room];
            trailY[g] = new double[room];
            trailZ[g] = new double[room];
        }
        if (m > 0) {
            double[][] dense = curves.dense(names[g], track, run.history());
            System.arraycopy(dense[0], 0, trailT[g], 0, prefix);
            System.arraycopy(dense[1], 0, trailX[g], 0, prefix);
            System.arraycopy(dense[2], 0, trailY[g], 0, prefix);
            System.arraycopy(dense[3], 0, trailZ[g], 0, prefix);
            lastPiece(g, track, m - 1, t, prefix);
        }
        trailT[g][count - 1] = t;
        trailX[g][count - 1] = frame.galaxyX(g);
        trailY[g][count - 1] = frame.galaxyY(g);
        trailZ[g][count - 1] = frame.galaxyZ(g);
        frame.setTrail(g, count, trailT[g], trailX[g], trailY[g], trailZ[g]);
    }

    /** The inner points of the last piece, from saved sample k to now, from column {@code at}. */
    private void lastPiece(int g, double[][] track, int k, double t, int at) {
        double c = Units.KMS_TO_KPC_PER_GYR;
        double t0 = track[0][k];
        int p = TrailCurves.PIECES;
        if (t == t0) {
            for (int i = 1; i < p; i++) {
                trailT[g][at + i - 1] = t;
                trailX[g][at + i - 1] = gx[g];
                trailY[g][at + i - 1] = gy[g];
                trailZ[g][at + i - 1] = gz[g];
            }
            return;
        }
        for (int i = 1; i < p; i++) {
            double ti = t0 + (t - t0) * i / p;
            TrailCurves.weights(run.history(), t0, t, ti, pw);
            trailT[g][at + i - 1] = ti;
            trailX[g][at + i - 1] = pw[0] * track[1][k] + pw[1] * track[4][k] * c + pw[2] * gx[g] + pw[3] * gvx[g];
            trailY[g][at + i - 1] = pw[0] * track[2][k] + pw[1] * track[5][k] * c + pw[2] * gy[g] + pw[3] * gvy[g];
            trailZ[g][at + i - 1] = pw[0] * track[3][k] + pw[1] * track[6][k] * c + pw[2] * gz[g] + pw[3] * gvz[g];
        }
    }

    private void fillTracers(Snapshot s0, Snapshot s1, double t) {
        int m = s0.tracerCount();
        if (tx.length < m) {
            tx = new float[m];
            ty = new float[m];
            tz = new float[m];
        }
        if (s1 == s0 || s1.tracerCount() != m) {
            System.arraycopy(s0.tracerKpc()[0], 0, tx, 0, m);
            System.arraycopy(s0.tracerKpc()[1], 0, ty, 0, m);
            System.arraycopy(s0.tracerKpc()[2], 0, tz, 0, m);
        } else {
            double k = Units.KMS_TO_KPC_PER_GYR;
            float[][] p0 = s0.tracerKpc();
            float[][] v0 = s0.tracerKms();
            float[][] p1 = s1.tracerKpc();
            float[][] v1 = s1.tracerKms();
            SnapshotInterpolation.combine(w, p0[0], v0[0], p1[0], v1[0], k, m, tx);
            SnapshotInterpolation.combine(w, p0[1], v0[1], p1[1], v1[1], k, m, ty);
            SnapshotInterpolation.combine(w, p0[2], v0[2], p1[2], v1[2], k, m, tz);
        }
        frame.setTracers(m, tx, ty, tz, s0.tracerHost());
    }

    private void ensureGalaxies(int n) {
        if (names.length < n) {
            names = new String[n];
            colour = new int[n];
            gx = new double[n];
            gy = new double[n];
            gz = new double[n];
            gvx = new double[n];
            gvy = new double[n];
            gvz = new double[n];
            trailT = new double[n][];
            trailX = new double[n][];
            trailY = new double[n][];
            trailZ = new double[n][];
        }
    }

    /** A camera distance that shows every galaxy at the start: 2.5 times the farthest, at least 100 kpc. */
    public double overviewDistanceKpc() {
        SceneFrame f = at(run.firstGyr());
        double far = 0;
        for (int g = 0; g < f.galaxyCount(); g++) {
            far = Math.max(far, Math.sqrt(f.galaxyX(g) * f.galaxyX(g) + f.galaxyY(g) * f.galaxyY(g)
                    + f.galaxyZ(g) * f.galaxyZ(g)));
        }
        return Math.max(100, 2.5 * far);
    }
}
