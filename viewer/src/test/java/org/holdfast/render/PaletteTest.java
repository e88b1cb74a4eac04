package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The galaxy colours stay apart. Colour differences are CIE 1976 L*a*b* distances from sRGB
 * (IEC 61966-2-1:1999 for the sRGB transfer curve and primaries, D65 white; CIE 15:2004 for
 * L*a*b*). Red-green colour-blind viewers lose mostly the a* (red-green) axis and keep
 * lightness and the b* (blue-yellow) axis (common practice), so we also require the colours to
 * differ in (L*, b*) alone. The thresholds are the design criteria of the palette.
 */
class PaletteTest {

    static double[] lab(int rgb) {
        double r = lin(((rgb >> 16) & 0xFF) / 255.0);
        double g = lin(((rgb >> 8) & 0xFF) / 255.0);
        double b = lin((rgb & 0xFF) / 255.0);
        double x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
        double y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
        double z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
        double fx = f(x);
        double fy = f(y);
        double fz = f(z);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    private static double lin(double c) {
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static double f(double t) {
        double d = 6.0 / 29;
        return t > d * d * d ? Math.cbrt(t) : t / (3 * d * d) + 4.0 / 29;
    }

    @Test
    void coloursAreFarApartForEveryone() {
        for (int i = 0; i < Palette.size(); i++) {
            for (int j = i + 1; j < Palette.size(); j++) {
                double[] a = lab(Palette.rgb(i));
                double[] b = lab(Palette.rgb(j));
                double full = Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
                double redGreenBlind = Math.hypot(a[0] - b[0], a[2] - b[2]);
                String pair = Palette.name(i) + "/" + Palette.name(j);
                assertTrue(full >= 30, pair + " differ by " + full);
                assertTrue(redGreenBlind >= 15, pair + " differ in lightness and blue-yellow by " + redGreenBlind);
            }
        }
    }

    @Test
    void everyColourShowsOnABlackSky() {
        for (int i = 0; i < Palette.size(); i++) {
            assertTrue(lab(Palette.rgb(i))[0] >= 45, Palette.name(i) + " is bright enough");
        }
    }

    @Test
    void indicesWrap() {
        assertTrue(Palette.rgb(Palette.size()) == Palette.rgb(0));
        assertTrue(Palette.rgb(-1) == Palette.rgb(Palette.size() - 1));
    }
}
