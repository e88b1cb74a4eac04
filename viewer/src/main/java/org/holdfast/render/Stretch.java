package org.holdfast.render;

/**
 * Turns linear light into 8-bit display values. Two kinds: {@link #asinh} for films, which
 * keeps dense cores and faint tails visible together, and {@link #linear} for scientific
 * stills, where a pixel value must stay proportional to light.
 */
public interface Stretch {

    /**
     * Writes opaque 0xAARRGGBB pixels for rows [rowFrom, rowTo) of {@code light} into
     * {@code argb}, indexed x + y * width.
     */
    void toPixels(LightBuffer light, int[] argb, int rowFrom, int rowTo);

    /**
     * Writes 16-bit display values (0 to 65535, three per pixel, red first) for rows
     * [rowFrom, rowTo) of {@code light} into {@code rgb16}, indexed 3 (x + y * width) + channel:
     * the same stretch as {@link #toPixels}, kept to 16 bits for grading and dome masters.
     */
    void toDeepPixels(LightBuffer light, short[] rgb16, int rowFrom, int rowTo);

    /** Rounds a display value in [0, 1] to 16 bits (as an unsigned short). */
    static short toShort(double v) {
        int b = (int) (v * 65535 + 0.5);
        return (short) (b < 0 ? 0 : b > 65535 ? 65535 : b);
    }

    /** The display value in [0, 1] of a grey pixel whose three channels all hold {@code light}. */
    double grey(double light);

    /** Lupton et al. (2004) asinh stretch with softening {@code q} and gain {@code alpha}. */
    static Stretch asinh(double alpha, double q) {
        return new AsinhStretch(alpha, q);
    }

    /** Display value = gain x light, clipped to [0, 1]. */
    static Stretch linear(double gain) {
        return new LinearStretch(gain);
    }

    /** Rounds a display value in [0, 1] to 8 bits. */
    static int toByte(double v) {
        int b = (int) (v * 255 + 0.5);
        return b < 0 ? 0 : b > 255 ? 255 : b;
    }
}
