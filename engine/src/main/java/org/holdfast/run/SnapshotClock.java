package org.holdfast.run;

/**
 * The snapshot times of a run: start + k every (k = 1, 2, ...) in the run's direction, and the
 * end. Times are computed from k, never accumulated, so they carry no round-off drift.
 */
final class SnapshotClock {

    private final double start;
    private final double end;
    private final double every;
    private final double dir;

    SnapshotClock(double start, double end, double everyGyr) {
        this.start = start;
        this.end = end;
        this.every = everyGyr > 0 && Double.isFinite(everyGyr) ? everyGyr : Double.POSITIVE_INFINITY;
        this.dir = Math.signum(end - start);
    }

    /** The first snapshot time strictly after t in the run's direction (the end at most). */
    double next(double t) {
        if (Double.isInfinite(every)) {
            return end;
        }
        double k = Math.floor((t - start) * dir / every + 1e-9) + 1;
        double next = start + dir * k * every;
        return dir * (end - next) <= 0 ? end : next;
    }
}
