package org.holdfast.units;

import java.util.Locale;

/**
 * A span of time in words, in the unit that suits it and three significant figures: "3.21
 * billion years", "412 million years", "41,200 years", "12.3 days", "5.40 hours", "17.0
 * seconds", and beyond that powers of ten of seconds. Three figures change whenever the span
 * changes by more than about 1%, so a countdown that shrinks the time left by a steady ratio
 * per frame shows new text on every frame.
 */
public final class TimeWords {

    private static final double DAY_S = 86_400.0;

    private TimeWords() {
    }

    /** The span {@code gyr} (Gyr, not negative) in words. */
    public static String span(double gyr) {
        if (!(gyr >= 0) || Double.isInfinite(gyr)) {
            throw new IllegalArgumentException("a span of time must be a finite number >= 0: " + gyr);
        }
        double years = gyr * 1e9;
        if (years >= 999.5e6) {
            return sig3(gyr) + " billion years";
        }
        if (years >= 999.5e3) {
            return sig3(years / 1e6) + " million years";
        }
        if (years >= 0.9995) {
            return grouped(years) + " years";
        }
        double s = gyr * Units.GYR_S;
        if (s >= 0.9995 * DAY_S) {
            return sig3(s / DAY_S) + " days";
        }
        if (s >= 0.9995 * 3600) {
            return sig3(s / 3600) + " hours";
        }
        if (s >= 0.9995 * 60) {
            return sig3(s / 60) + " minutes";
        }
        if (s >= 0.9995e-3) {
            return sig3(s) + " seconds";
        }
        if (s == 0) {
            return "0 seconds";
        }
        return String.format(Locale.ROOT, "%.2e seconds", s).replace("e-", " x 10^-").replace("e+", " x 10^");
    }

    /** Three significant figures, with trailing zeros kept: 3.20, 41.0, 412. */
    static String sig3(double v) {
        if (v >= 99.95) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        if (v >= 9.995) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        if (v >= 0.9995) {
            return String.format(Locale.ROOT, "%.2f", v);
        }
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static double round3(double v) {
        double p = Math.pow(10, Math.floor(Math.log10(v)) - 2);
        return Math.round(v / p) * p;
    }

    /** A whole number of years to three figures, with thousands separators: 41,200; 7.50 below 10. */
    private static String grouped(double years) {
        if (years < 9.995) {
            return sig3(years);
        }
        if (years < 99.95) {
            return String.format(Locale.ROOT, "%.1f", years);
        }
        return String.format(Locale.ROOT, "%,d", Math.round(round3(years)));
    }
}
