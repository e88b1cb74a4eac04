package org.holdfast.render;

import java.util.Arrays;

/**
 * Linear light of one frame in three float planes (red, green, blue), each indexed
 * {@code x + y * width}. Light only ever adds, so the order of independent additions changes
 * nothing but float rounding; the renderer fixes that order too.
 */
public final class LightBuffer {

    private final int width;
    private final int height;
    final float[] red;
    final float[] green;
    final float[] blue;

    public LightBuffer(int width, int height) {
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("frame size must be positive: " + width + "x" + height);
        }
        this.width = width;
        this.height = height;
        int n = Math.multiplyExact(width, height);
        this.red = new float[n];
        this.green = new float[n];
        this.blue = new float[n];
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** Sets every pixel to black. */
    public void clear() {
        Arrays.fill(red, 0f);
        Arrays.fill(green, 0f);
        Arrays.fill(blue, 0f);
    }

    /** Adds light to one pixel; pixels outside the frame are ignored. */
    public void add(int x, int y, float r, float g, float b) {
        if (x < 0 || y < 0 || x >= width || y >= height) {
            return;
        }
        int i = x + y * width;
        red[i] += r;
        green[i] += g;
        blue[i] += b;
    }

    public float red(int x, int y) {
        return red[x + y * width];
    }

    public float green(int x, int y) {
        return green[x + y * width];
    }

    public float blue(int x, int y) {
        return blue[x + y * width];
    }

    /** Sum of one plane (0 red, 1 green, 2 blue) in double precision. */
    public double total(int channel) {
        float[] p = channel == 0 ? red : channel == 1 ? green : blue;
        double s = 0;
        for (float v : p) {
            s += v;
        }
        return s;
    }
}
