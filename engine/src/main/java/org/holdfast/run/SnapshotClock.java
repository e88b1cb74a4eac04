package org.holdfast.run;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.expansion.ExpansionTable;

/**
 * The snapshot times of a run: start + k every (k = 1, 2, ...) in the run's direction, and the
 * end. Times are computed from k, never accumulated, so they carry no round-off drift.
 *
 * <p>Toward a big rip or a big crunch at t_f the snapshots close in on it: once the regular
 * spacing would be coarser than {@link #PER_EFOLD} snapshots per e-fold of the time left
 * tau = t_f - t, they are spaced equally in ln tau instead (tau_j = tau_s e^(-j / PER_EFOLD)),
 * down to the run's end, which is within a millionth of the rip time of it (the expansion table
 * ends a ten-millionth of the age at the rip before it). A countdown
 * film, which spends equal film time on equal ratios of tau, then never has more than a few
 * frames between two snapshots: a film of N frames over a countdown of R e-folds has
 * N / (R PER_EFOLD) frames per snapshot interval (under 3 for 20 s at 30 frames/s, under 9 for
 * 60 s, over the 13 e-folds from today to the end of a w = -1.5 history).
 */
final class SnapshotClock {

    /** Snapshots per e-fold of the time left before a rip or crunch. */
    static final int PER_EFOLD = 16;

    private final double start;
    private final double end;
    private final double every;
    private final double dir;
    /** The rip or crunch the snapshots close in on, NaN when none lies ahead. */
    private final double finalGyr;
    /** Time left at which the spacing switches to equal steps in ln tau. */
    private final double tauSwitch;

    SnapshotClock(double start, double end, double everyGyr) {
        this(start, end, everyGyr, Double.NaN);
    }

    /**
     * @param finalGyr the big rip or crunch ahead of a forward run (NaN: none, regular spacing
     *        only)
     */
    SnapshotClock(double start, double end, double everyGyr, double finalGyr) {
        this.start = start;
        this.end = end;
        this.every = everyGyr > 0 && Double.isFinite(everyGyr) ? everyGyr : Double.POSITIVE_INFINITY;
        this.dir = Math.signum(end - start);
        boolean ahead = Double.isFinite(finalGyr) && dir > 0 && finalGyr > end && Double.isFinite(every);
        this.finalGyr = ahead ? finalGyr : Double.NaN;
        this.tauSwitch = ahead ? every / (1 - Math.exp(-1.0 / PER_EFOLD)) : Double.NaN;
    }

    /** The clock of a run from start to end in this history: dense toward its rip or crunch, if any. */
    static SnapshotClock of(double start, double end, double everyGyr, ExpansionHistory history) {
        return new SnapshotClock(start, end, everyGyr, finalTime(history));
    }

    /** The big rip or crunch that ends this history, NaN when it has neither (or is not a table). */
    static double finalTime(ExpansionHistory history) {
        if (history instanceof ExpansionTable t) {
            if (t.ripGyr().isPresent()) {
                return t.ripGyr().getAsDouble();
            }
            if (t.crunchGyr().isPresent()) {
                return t.crunchGyr().getAsDouble();
            }
        }
        return Double.NaN;
    }

    /** The first snapshot time strictly after t in the run's direction (the end at most). */
    double next(double t) {
        if (Double.isInfinite(every)) {
            return end;
        }
        double next;
        if (!Double.isNaN(finalGyr) && finalGyr - t <= tauSwitch * (1 + 1e-12)) {
            next = nextClosingIn(t);
        } else {
            double k = Math.floor((t - start) * dir / every + 1e-9) + 1;
            next = start + dir * k * every;
            if (!Double.isNaN(finalGyr) && finalGyr - next < tauSwitch) {
                next = finalGyr - tauSwitch;
            }
        }
        return dir * (end - next) <= 0 ? end : next;
    }

    /** The next time of the sequence tau_j = tauSwitch e^(-j / PER_EFOLD) after t. */
    private double nextClosingIn(double t) {
        double tau = finalGyr - t;
        double j = Math.floor(Math.log(tauSwitch / tau) * PER_EFOLD + 1e-6) + 1;
        double next = finalGyr - tauSwitch * Math.exp(-j / PER_EFOLD);
        return next > t ? next : finalGyr - tauSwitch * Math.exp(-(j + 1) / PER_EFOLD);
    }
}
