package org.holdfast.film;

/**
 * Which simulated time (Gyr from today) each film second shows, and back. Two mappings:
 * {@link #linear} spends equal film time on equal simulated time; {@link #countdown} spends
 * equal film time on each equal <em>ratio</em> of the time left before a final moment (the big
 * rip, or a horizon the user picks), so that the last stretch before a rip, where everything
 * happens, does not flash by.
 */
public interface FilmClock {

    /** Simulated time shown at film second {@code filmS} (clamped to the film). */
    double simGyr(double filmS);

    /** Film second at which simulated time {@code tGyr} is shown. */
    double filmS(double tGyr);

    /** Film length in seconds. */
    double lengthS();

    /** Simulated time moves at a steady rate from {@code fromGyr} to {@code toGyr}. */
    static FilmClock linear(double lengthS, double fromGyr, double toGyr) {
        checkLength(lengthS);
        if (!Double.isFinite(fromGyr) || !Double.isFinite(toGyr) || fromGyr == toGyr) {
            throw new IllegalArgumentException("film clock needs two different finite times: " + fromGyr + ", " + toGyr);
        }
        return new FilmClock() {
            @Override
            public double simGyr(double filmS) {
                double u = clamp(filmS / lengthS);
                return fromGyr + (toGyr - fromGyr) * u;
            }

            @Override
            public double filmS(double tGyr) {
                return lengthS * (tGyr - fromGyr) / (toGyr - fromGyr);
            }

            @Override
            public double lengthS() {
                return lengthS;
            }
        };
    }

    /**
     * The time left before {@code finalGyr}, tau = finalGyr - t, shrinks (or grows)
     * geometrically: log tau is linear in film time, from tau at {@code fromGyr} to tau at
     * {@code toGyr}. Both must lie before {@code finalGyr}.
     */
    static FilmClock countdown(double lengthS, double fromGyr, double toGyr, double finalGyr) {
        checkLength(lengthS);
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
                double u = clamp(filmS / lengthS);
                return finalGyr - tau0 * Math.exp(logRatio * u);
            }

            @Override
            public double filmS(double tGyr) {
                return lengthS * Math.log((finalGyr - tGyr) / tau0) / logRatio;
            }

            @Override
            public double lengthS() {
                return lengthS;
            }
        };
    }

    private static void checkLength(double lengthS) {
        if (!(lengthS > 0) || !Double.isFinite(lengthS)) {
            throw new IllegalArgumentException("film length must be > 0 s: " + lengthS);
        }
    }

    private static double clamp(double u) {
        return u < 0 ? 0 : u > 1 ? 1 : u;
    }
}
