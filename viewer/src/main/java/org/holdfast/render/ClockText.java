package org.holdfast.render;

import java.util.Locale;

/** The words the clock overlay shows for a simulated time. */
public final class ClockText {

    private ClockText() {
    }

    /**
     * The time in words: "today", "in 12.4 billion years", "in 350 million years",
     * "2.1 billion years ago".
     */
    public static String words(double tGyr) {
        double abs = Math.abs(tGyr);
        String amount;
        if (abs < 0.0005) {
            return "today";
        } else if (abs < 0.9995) {
            amount = String.format(Locale.ROOT, "%d million years", Math.round(abs * 1000));
        } else {
            amount = String.format(Locale.ROOT, "%.1f billion years", abs);
        }
        return tGyr > 0 ? "in " + amount : amount + " ago";
    }

    /**
     * The clock's first line for a frame: the time left before the big rip in units that shrink
     * as it nears ("rip in 3.21 million years", "rip in 41,200 years"), three figures so that it
     * changes from frame to frame of a countdown; {@link #words} when the universe does not rip
     * (ripGyr NaN) or the rip is past.
     */
    public static String headline(double tGyr, double ripGyr) {
        if (Double.isFinite(ripGyr) && ripGyr > tGyr) {
            return "rip in " + org.holdfast.units.TimeWords.span(ripGyr - tGyr);
        }
        return words(tGyr);
    }

    /** The time in Gyr from today with its sign: "+12.40 Gyr from today". */
    public static String gyr(double tGyr) {
        return String.format(Locale.ROOT, "%+.2f Gyr from today", tGyr);
    }

    /** The time in Gyr from today, short: "+3.1 Gyr". */
    public static String gyrShort(double tGyr) {
        return String.format(Locale.ROOT, "%+.1f Gyr", tGyr);
    }

    /**
     * The scale factor: "a = 1.834"; from 1000 on (the last stretch before a big rip) in powers
     * of ten, "a = 4.08 x 10^7", rather than a row of digits.
     */
    public static String scaleFactor(double a) {
        if (!(a >= 1000) || Double.isInfinite(a)) {
            return String.format(Locale.ROOT, "a = %.3f", a);
        }
        int exponent = (int) Math.floor(Math.log10(a));
        double mantissa = a / Math.pow(10, exponent);
        if (mantissa >= 9.995) {
            mantissa /= 10;
            exponent++;
        }
        return String.format(Locale.ROOT, "a = %.2f x 10^%d", mantissa, exponent);
    }

    /** A length for the scale bar: "50 kpc", "2 Mpc". */
    public static String length(double kpc) {
        if (kpc >= 1000) {
            return trim(kpc / 1000) + " Mpc";
        }
        return trim(kpc) + " kpc";
    }

    /** The round length (1, 2 or 5 times a power of ten) closest below {@code maxKpc}. */
    public static double roundLength(double maxKpc) {
        if (!(maxKpc > 0) || !Double.isFinite(maxKpc)) {
            throw new IllegalArgumentException("scale bar length must be positive: " + maxKpc);
        }
        double p = Math.pow(10, Math.floor(Math.log10(maxKpc)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * p <= maxKpc * (1 + 1e-12)) {
                return m * p;
            }
        }
        return p;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%d", (long) v)
                : String.format(Locale.ROOT, "%.3g", v);
    }
}
