package org.holdfast.render;

/**
 * The asinh intensity stretch of Lupton, Blanton, Fekete, Hogg, O'Mullane, Szalay and Wherry
 * (2004, PASP 116, 133): with I = (R + G + B) / 3, each channel is scaled by
 * F(I) / I where F(I) = asinh(alpha Q I) / Q. Faint light is nearly linear (slope alpha), bright
 * light nearly logarithmic, and the ratio of the channels, hence the hue, is kept. A pixel whose
 * largest channel would pass 1 is scaled down as a whole, again keeping its hue (the same paper's
 * treatment of saturated pixels).
 */
final class AsinhStretch implements Stretch {

    private final double alpha;
    private final double q;

    AsinhStretch(double alpha, double q) {
        if (!(alpha > 0 && Double.isFinite(alpha))) {
            throw new IllegalArgumentException("asinh gain alpha must be > 0: " + alpha);
        }
        if (!(q > 0 && Double.isFinite(q))) {
            throw new IllegalArgumentException("asinh softening Q must be > 0: " + q);
        }
        this.alpha = alpha;
        this.q = q;
    }

    @Override
    public double grey(double light) {
        if (!(light > 0)) {
            return 0;
        }
        return Math.min(1, asinh(alpha * q * light) / q);
    }

    @Override
    public void toPixels(LightBuffer light, int[] argb, int rowFrom, int rowTo) {
        int w = light.width();
        float[] rgb = light.rgb;
        for (int k = rowFrom * w, end = rowTo * w; k < end; k++) {
            double r = rgb[3 * k];
            double g = rgb[3 * k + 1];
            double b = rgb[3 * k + 2];
            double i = (r + g + b) / 3;
            if (!(i > 0)) {
                argb[k] = 0xFF000000;
                continue;
            }
            double f = asinh(alpha * q * i) / (q * i);
            r *= f;
            g *= f;
            b *= f;
            double max = Math.max(r, Math.max(g, b));
            if (max > 1) {
                r /= max;
                g /= max;
                b /= max;
            }
            argb[k] = 0xFF000000 | Stretch.toByte(r) << 16 | Stretch.toByte(g) << 8 | Stretch.toByte(b);
        }
    }

    @Override
    public void toDeepPixels(LightBuffer light, short[] rgb16, int rowFrom, int rowTo) {
        int w = light.width();
        float[] rgb = light.rgb;
        for (int k = rowFrom * w, end = rowTo * w; k < end; k++) {
            double r = rgb[3 * k];
            double g = rgb[3 * k + 1];
            double b = rgb[3 * k + 2];
            double i = (r + g + b) / 3;
            double f = i > 0 ? asinh(alpha * q * i) / (q * i) : 0;
            r *= f;
            g *= f;
            b *= f;
            double max = Math.max(r, Math.max(g, b));
            if (max > 1) {
                r /= max;
                g /= max;
                b /= max;
            }
            rgb16[3 * k] = Stretch.toShort(r);
            rgb16[3 * k + 1] = Stretch.toShort(g);
            rgb16[3 * k + 2] = Stretch.toShort(b);
        }
    }

    static double asinh(double x) {
        // x >= 0 here; this form loses nothing for small x and never overflows for large x
        return x < 1e150 ? Math.log(x + Math.sqrt(x * x + 1)) : Math.log(2 * x);
    }
}
