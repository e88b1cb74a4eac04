package org.holdfast.render;

/**
 * A small circular Gaussian point spread, precomputed for sub-pixel positions: the footprint
 * is (2R+1) x (2R+1) pixels, and the weights along each axis are the Gaussian of the pixel
 * centres' offsets, renormalised to sum to one. The 2-D weight is the product of the two axes,
 * so a splat that lies wholly inside the frame deposits exactly its brightness (up to float
 * rounding), wherever it falls between pixels.
 *
 * <p>Sub-pixel positions are rounded to the nearest 1/{@value #PHASES} of a pixel (so a splat
 * on a pixel centre is exactly symmetric); no exponential is evaluated per splat.
 */
public final class SplatKernel {

    /** Sub-pixel phases per pixel. */
    public static final int PHASES = 32;

    private final double sigmaPx;
    private final int radius;
    private final int taps;
    /** weights[phase * taps + i]: weight of the i-th pixel of the footprint. */
    private final float[] weights;

    /** @param sigmaPx standard deviation of the Gaussian in pixels, in [0.3, 8] */
    public SplatKernel(double sigmaPx) {
        if (!(sigmaPx >= 0.3 && sigmaPx <= 8)) {
            throw new IllegalArgumentException("splat sigma must be in [0.3, 8] pixels: " + sigmaPx);
        }
        this.sigmaPx = sigmaPx;
        this.radius = Math.max(1, (int) Math.ceil(2 * sigmaPx - 0.5));
        this.taps = 2 * radius + 1;
        this.weights = new float[(PHASES + 1) * taps];
        for (int p = 0; p <= PHASES; p++) {
            // offset of the splat from its pixel's centre, in [-0.5, 0.5]
            double off = (double) p / PHASES - 0.5;
            double sum = 0;
            double[] w = new double[taps];
            for (int i = 0; i < taps; i++) {
                double d = (i - radius) - off;
                w[i] = Math.exp(-0.5 * d * d / (sigmaPx * sigmaPx));
                sum += w[i];
            }
            for (int i = 0; i < taps; i++) {
                weights[p * taps + i] = (float) (w[i] / sum);
            }
        }
    }

    public double sigmaPx() {
        return sigmaPx;
    }

    /** Pixels either side of the centre pixel that the footprint reaches. */
    public int radius() {
        return radius;
    }

    /**
     * First row of the footprint of a splat at {@code fy}; the footprint spans
     * {@code 2 * radius() + 1} rows from there. Same integer arithmetic as {@link #draw}.
     */
    int topRow(double fy) {
        return (int) Math.floor(fy) - radius;
    }

    /**
     * Adds one splat, touching only rows in [rowFrom, rowTo) (a band owned by the caller) and
     * columns inside the frame.
     *
     * @param fx splat position in continuous pixel coordinates (likewise fy)
     * @param r light to deposit in red (likewise g, b)
     */
    public void draw(LightBuffer buf, double fx, double fy, float r, float g, float b, int rowFrom, int rowTo) {
        int width = buf.width();
        int cx = (int) Math.floor(fx);
        int cy = (int) Math.floor(fy);
        int px = phase(fx - cx);
        int py = phase(fy - cy);
        int x0 = cx - radius;
        int y0 = cy - radius;
        int iFrom = Math.max(0, -x0);
        int iTo = Math.min(taps, width - x0);
        int jFrom = Math.max(0, rowFrom - y0);
        int jTo = Math.min(taps, rowTo - y0);
        float[] rgb = buf.rgb;
        int wx = px * taps;
        int wy = py * taps;
        if (taps == 3 && iFrom == 0 && iTo == 3) {
            // the common small splat wholly inside the columns: three pixels per row, unrolled
            float k0 = weights[wx];
            float k1 = weights[wx + 1];
            float k2 = weights[wx + 2];
            for (int j = jFrom; j < jTo; j++) {
                float ky = weights[wy + j];
                float kr = r * ky;
                float kg = g * ky;
                float kb = b * ky;
                int k = 3 * ((y0 + j) * width + x0);
                rgb[k] += kr * k0;
                rgb[k + 1] += kg * k0;
                rgb[k + 2] += kb * k0;
                rgb[k + 3] += kr * k1;
                rgb[k + 4] += kg * k1;
                rgb[k + 5] += kb * k1;
                rgb[k + 6] += kr * k2;
                rgb[k + 7] += kg * k2;
                rgb[k + 8] += kb * k2;
            }
            return;
        }
        for (int j = jFrom; j < jTo; j++) {
            float ky = weights[wy + j];
            float kr = r * ky;
            float kg = g * ky;
            float kb = b * ky;
            int row = (y0 + j) * width + x0;
            for (int i = iFrom; i < iTo; i++) {
                float kx = weights[wx + i];
                int k = 3 * (row + i);
                rgb[k] += kr * kx;
                rgb[k + 1] += kg * kx;
                rgb[k + 2] += kb * kx;
            }
        }
    }

    /** Adds one splat anywhere in the frame. */
    public void draw(LightBuffer buf, double fx, double fy, float r, float g, float b) {
        draw(buf, fx, fy, r, g, b, 0, buf.height());
    }

    private static int phase(double frac) {
        int p = (int) (frac * PHASES + 0.5);
        return p < 0 ? 0 : p > PHASES ? PHASES : p;
    }
}
