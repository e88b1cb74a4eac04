package org.holdfast.render;

/** Display value proportional to light (gain x light), each channel clipped to [0, 1]. */
final class LinearStretch implements Stretch {

    private final double gain;

    LinearStretch(double gain) {
        if (!(gain > 0 && Double.isFinite(gain))) {
            throw new IllegalArgumentException("linear gain must be > 0: " + gain);
        }
        this.gain = gain;
    }

    @Override
    public double grey(double light) {
        return Math.max(0, Math.min(1, gain * light));
    }

    @Override
    public void toPixels(LightBuffer light, int[] argb, int rowFrom, int rowTo) {
        int w = light.width();
        for (int k = rowFrom * w, end = rowTo * w; k < end; k++) {
            float[] rgb = light.rgb;
            argb[k] = 0xFF000000 | Stretch.toByte(gain * rgb[3 * k]) << 16
                    | Stretch.toByte(gain * rgb[3 * k + 1]) << 8 | Stretch.toByte(gain * rgb[3 * k + 2]);
        }
    }

    @Override
    public void toDeepPixels(LightBuffer light, short[] rgb16, int rowFrom, int rowTo) {
        int w = light.width();
        float[] rgb = light.rgb;
        for (int k = 3 * rowFrom * w, end = 3 * rowTo * w; k < end; k++) {
            rgb16[k] = Stretch.toShort(gain * rgb[k]);
        }
    }
}
