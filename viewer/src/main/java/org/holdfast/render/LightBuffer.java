package org.holdfast.render;

import java.util.Arrays;

/**
 * Linear light of one frame: one float array holding red, green and blue side by side for
 * pixel {@code i = x + y * width} at {@code 3i, 3i + 1, 3i + 2}, so that a splat's few pixels
 * share cache lines. Light only ever adds, so the order of independent additions changes
 * nothing but float rounding; the renderer fixes that order too.
 */
public final class LightBuffer {

    private final int width;
    private final int height;
    /** Red, green, blue of pixel i at 3i, 3i + 1, 3i + 2. */
    final float[] rgb;

    public LightBuffer(int width, int height) {
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("frame size must be positive: " + width + "x" + height);
        }
        this.width = width;
        this.height = height;
        int n = Math.multiplyExact(width, height);
        this.rgb = new float[Math.multiplyExact(3, n)];
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** Sets every pixel to black. */
    public void clear() {
        Arrays.fill(rgb, 0f);
    }

    /** Sets the pixels of rows [rowFrom, rowTo) to black. */
    public void clearRows(int rowFrom, int rowTo) {
        Arrays.fill(rgb, 3 * rowFrom * width, 3 * rowTo * width, 0f);
    }

    /** Adds light to one pixel; pixels outside the frame are ignored. */
    public void add(int x, int y, float r, float g, float b) {
        if (x < 0 || y < 0 || x >= width || y >= height) {
            return;
        }
        int i = 3 * (x + y * width);
        rgb[i] += r;
        rgb[i + 1] += g;
        rgb[i + 2] += b;
    }

    public float red(int x, int y) {
        return rgb[3 * (x + y * width)];
    }

    public float green(int x, int y) {
        return rgb[3 * (x + y * width) + 1];
    }

    public float blue(int x, int y) {
        return rgb[3 * (x + y * width) + 2];
    }

    /** A copy of the light, red, green, blue per pixel. */
    public float[] copyRgb() {
        return rgb.clone();
    }

    /** Sum of one plane (0 red, 1 green, 2 blue) in double precision. */
    public double total(int channel) {
        double s = 0;
        for (int i = channel; i < rgb.length; i += 3) {
            s += rgb[i];
        }
        return s;
    }
}
