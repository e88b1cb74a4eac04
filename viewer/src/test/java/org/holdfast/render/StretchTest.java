package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The asinh stretch of Lupton et al. (2004, PASP 116, 133): with I the mean of the channels,
 * each channel is multiplied by asinh(alpha Q I) / (Q I); the hue (channel ratios) is kept and
 * saturated pixels are scaled down as a whole.
 */
class StretchTest {

    static final double ALPHA = 0.4;
    static final double Q = 9;

    private static int[] pixel(Stretch s, float r, float g, float b) {
        LightBuffer buf = new LightBuffer(1, 1);
        buf.add(0, 0, r, g, b);
        int[] out = new int[1];
        s.toPixels(buf, out, 0, 1);
        int p = out[0];
        return new int[] {(p >> 16) & 0xFF, (p >> 8) & 0xFF, p & 0xFF, p >>> 24};
    }

    @Test
    void greyPixelsMatchTheFormula() {
        Stretch s = Stretch.asinh(ALPHA, Q);
        for (double i = 1e-3; i < 5000; i *= 1.7) {
            double expected = Math.min(1, Math.log(ALPHA * Q * i + Math.sqrt(Math.pow(ALPHA * Q * i, 2) + 1)) / Q);
            assertEquals(expected, s.grey(i), 1e-12, "I = " + i);
            int[] p = pixel(s, (float) i, (float) i, (float) i);
            int want = Stretch.toByte(Math.min(1, AsinhStretch.asinh(ALPHA * Q * (float) i) / Q));
            assertEquals(want, p[0], "8-bit value at I = " + i);
            assertEquals(p[0], p[1]);
            assertEquals(p[0], p[2]);
            assertEquals(255, p[3], "opaque");
        }
    }

    @Test
    void stretchIsMonotonicAndStartsLinear() {
        Stretch s = Stretch.asinh(ALPHA, Q);
        double prev = s.grey(0);
        assertEquals(0, prev);
        for (double i = 1e-6; i < 1e6; i *= 1.05) {
            double v = s.grey(i);
            assertTrue(v >= prev, "monotonic at I = " + i);
            prev = v;
        }
        // slope alpha for faint light: asinh(x) = x - x^3/6 + ...
        assertEquals(ALPHA * 1e-5, s.grey(1e-5), 1e-12);
    }

    @Test
    void hueIsKeptAndSaturationScalesTheWholePixel() {
        Stretch s = Stretch.asinh(ALPHA, Q);
        int[] faint = pixel(s, 4f, 2f, 1f);
        assertEquals(2.0, faint[0] / (double) faint[1], 0.05, "red:green stays 2:1");
        int[] bright = pixel(s, 4e6f, 2e6f, 1e6f);
        assertEquals(255, bright[0], "the brightest channel saturates");
        assertEquals(128, bright[1], 1, "and the others keep their ratio to it");
        assertEquals(64, bright[2], 1);
    }

    @Test
    void linearStretchIsProportionalAndClips() {
        Stretch s = Stretch.linear(2);
        int[] p = pixel(s, 0.1f, 0.25f, 0.9f);
        assertEquals(Stretch.toByte(0.2), p[0]);
        assertEquals(Stretch.toByte(0.5), p[1]);
        assertEquals(255, p[2]);
        assertEquals(0.5, s.grey(0.25), 1e-15);
    }

    @Test
    void rejectsNonPositiveParameters() {
        assertThrows(IllegalArgumentException.class, () -> Stretch.asinh(0, 9));
        assertThrows(IllegalArgumentException.class, () -> Stretch.asinh(1, -1));
        assertThrows(IllegalArgumentException.class, () -> Stretch.linear(0));
    }
}
