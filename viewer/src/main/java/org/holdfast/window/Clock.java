package org.holdfast.window;

/**
 * The view's clock: the time shown, how fast it runs (Gyr of cosmic time per second of wall
 * time), which way, and whether it runs at all. Immutable.
 *
 * @param tGyr          time shown, Gyr
 * @param rateGyrPerS   speed when playing, Gyr per second, positive
 * @param forward       true when time runs towards the future
 * @param playing       true when the clock runs
 */
public record Clock(double tGyr, double rateGyrPerS, boolean forward, boolean playing) {

    /** Slowest rate, Gyr per second. */
    public static final double MIN_RATE_GYR_PER_S = 1.0e-5;
    /** Fastest rate, Gyr per second. */
    public static final double MAX_RATE_GYR_PER_S = 1.0e3;

    public Clock {
        if (!Double.isFinite(tGyr)) {
            throw new IllegalArgumentException("clock time must be finite");
        }
        if (!(rateGyrPerS >= MIN_RATE_GYR_PER_S && rateGyrPerS <= MAX_RATE_GYR_PER_S)) {
            throw new IllegalArgumentException("rate " + rateGyrPerS + " Gyr/s outside ["
                    + MIN_RATE_GYR_PER_S + ", " + MAX_RATE_GYR_PER_S + "]");
        }
    }

    /** A paused clock at {@code tGyr}, running forward at {@code rateGyrPerS} once played. */
    public static Clock pausedAt(double tGyr, double rateGyrPerS) {
        return new Clock(tGyr, rateGyrPerS, true, false);
    }

    /**
     * The clock {@code dtSeconds} of wall time later. Time stays within [startGyr, endGyr]; on
     * reaching an end the clock stops there.
     */
    public Clock advance(double dtSeconds, double startGyr, double endGyr) {
        if (!playing || dtSeconds <= 0) {
            return this;
        }
        double t = tGyr + (forward ? 1 : -1) * rateGyrPerS * dtSeconds;
        if (t >= endGyr && forward) {
            return new Clock(endGyr, rateGyrPerS, forward, false);
        }
        if (t <= startGyr && !forward) {
            return new Clock(startGyr, rateGyrPerS, forward, false);
        }
        return new Clock(Math.max(startGyr, Math.min(endGyr, t)), rateGyrPerS, forward, playing);
    }

    public Clock withPlaying(boolean p) {
        return new Clock(tGyr, rateGyrPerS, forward, p);
    }

    public Clock withForward(boolean f) {
        return new Clock(tGyr, rateGyrPerS, f, playing);
    }

    /** The rate multiplied by {@code factor}, kept within the limits. */
    public Clock scaleRate(double factor) {
        double r = Math.max(MIN_RATE_GYR_PER_S, Math.min(MAX_RATE_GYR_PER_S, rateGyrPerS * factor));
        return new Clock(tGyr, r, forward, playing);
    }

    /** Moved to {@code t}, clamped into [startGyr, endGyr]. */
    public Clock at(double t, double startGyr, double endGyr) {
        return new Clock(Math.max(startGyr, Math.min(endGyr, t)), rateGyrPerS, forward, playing);
    }
}
