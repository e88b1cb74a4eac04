package org.holdfast.film;

/**
 * Which simulated time (Gyr from today) each film second shows, and back. Two mappings:
 * {@link #linear} spends equal film time on equal simulated time; {@link #countdown} spends
 * equal film time on each equal <em>ratio</em> of the time left before a final moment (the big
 * rip, or a horizon the user picks), so that the last stretch before a rip, where everything
 * happens, does not flash by.
 *
 * <p>A clock runs from its start time at film second 0 to its end time at film second
 * {@link #endS()}; a film makes that the second of its last frame ({@link FilmSpec#lastFrameS}),
 * so that the first frame shows the start and the last frame the end.
 */
public interface FilmClock {

    /** Simulated time shown at film second {@code filmS} (clamped to the film). */
    double simGyr(double filmS);

    /** Film second at which simulated time {@code tGyr} is shown. */
    double filmS(double tGyr);

    /** Film second at which the clock shows its end time; it stays there after. */
    double endS();

    /** The mapping in words, for a frames folder's manifest, e.g. "countdown to 41.5 Gyr". */
    String describe();

    /** Simulated time moves at a steady rate from {@code fromGyr} at 0 s to {@code toGyr} at {@code endS}. */
    static FilmClock linear(double endS, double fromGyr, double toGyr) {
        checkLength(endS);
        if (!Double.isFinite(fromGyr) || !Double.isFinite(toGyr) || fromGyr == toGyr) {
            throw new IllegalArgumentException("film clock needs two different finite times: " + fromGyr + ", " + toGyr);
        }
        return new FilmClock() {
            @Override
            public double simGyr(double filmS) {
                double u = clamp(filmS / endS);
                return u == 1 ? toGyr : fromGyr + (toGyr - fromGyr) * u;
            }

            @Override
            public double filmS(double tGyr) {
                return endS * (tGyr - fromGyr) / (toGyr - fromGyr);
            }

            @Override
            public double endS() {
                return endS;
            }

            @Override
            public String describe() {
                return "linear";
            }
        };
    }

    /**
     * The time left before {@code finalGyr}, tau = finalGyr - t, shrinks (or grows)
     * geometrically: log tau is linear in film time, from tau at {@code fromGyr} (0 s) to tau at
     * {@code toGyr} ({@code endS}). Both must lie before {@code finalGyr}.
     */
    static FilmClock countdown(double endS, double fromGyr, double toGyr, double finalGyr) {
        checkLength(endS);
        double tau0 = finalGyr - fromGyr;
        double tau1 = finalGyr - toGyr;
        if (!(tau0 > 0) || !(tau1 > 0) || tau0 == tau1 || !Double.isFinite(finalGyr)) {
            throw new IllegalArgumentException("countdown needs start " + fromGyr + " and end " + toGyr
                    + " to differ and both lie before the final time " + finalGyr + " Gyr");
        }
        double logRatio = Math.log(tau1 / tau0);
        return new FilmClock() {
            @Override
            public double simGyr(double filmS) {
                double u = clamp(filmS / endS);
                return u == 1 ? toGyr : finalGyr - tau0 * Math.exp(logRatio * u);
            }

            @Override
            public double filmS(double tGyr) {
                return endS * Math.log((finalGyr - tGyr) / tau0) / logRatio;
            }

            @Override
            public double endS() {
                return endS;
            }

            @Override
            public String describe() {
                return "countdown to " + finalGyr + " Gyr";
            }
        };
    }

    private static void checkLength(double endS) {
        if (!(endS > 0) || !Double.isFinite(endS)) {
            throw new IllegalArgumentException("the clock's end must be > 0 s into the film: " + endS);
        }
    }

    private static double clamp(double u) {
        return u < 0 ? 0 : u > 1 ? 1 : u;
    }
}
