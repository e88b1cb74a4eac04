package org.holdfast.render.projection;

/**
 * Ordinary perspective (pinhole) projection with a vertical field of view: a point straight
 * ahead lands at the frame centre, and x/(-z), y/(-z) scale linearly to pixels.
 */
public final class FlatProjection implements Projection {

    private final int width;
    private final int height;
    private final double focalPx;
    private final double fovDeg;

    /**
     * @param width frame width in pixels
     * @param height frame height in pixels
     * @param fovDeg vertical field of view, in (0, 179] degrees
     */
    public FlatProjection(int width, int height, double fovDeg) {
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("frame size must be positive: " + width + "x" + height);
        }
        if (!(fovDeg > 0 && fovDeg <= 179)) {
            throw new IllegalArgumentException("field of view must be in (0, 179] degrees: " + fovDeg);
        }
        this.width = width;
        this.height = height;
        this.fovDeg = fovDeg;
        this.focalPx = 0.5 * height / Math.tan(Math.toRadians(fovDeg) / 2);
    }

    /** The vertical field of view in degrees. */
    public double fovDeg() {
        return fovDeg;
    }

    /** Distance from the eye to the image plane, in pixels. */
    public double focalPx() {
        return focalPx;
    }

    @Override
    public int width() {
        return width;
    }

    @Override
    public int height() {
        return height;
    }

    @Override
    public boolean project(double x, double y, double z, double[] out) {
        double depth = -z;
        if (!(depth > 0)) {
            return false;
        }
        double s = focalPx / depth;
        out[0] = 0.5 * width + x * s;
        out[1] = 0.5 * height - y * s;
        return true;
    }

    @Override
    public boolean unproject(double px, double py, double[] dir) {
        double x = px - 0.5 * width;
        double y = 0.5 * height - py;
        double n = Math.sqrt(x * x + y * y + focalPx * focalPx);
        dir[0] = x / n;
        dir[1] = y / n;
        dir[2] = -focalPx / n;
        return true;
    }

    @Override
    public double pixelsPerRadian() {
        return focalPx;
    }

    @Override
    public String name() {
        return "flat";
    }
}
