package org.holdfast.render.projection;

/**
 * Equirectangular panorama of the whole sky in a 2:1 frame: azimuth (0 straight ahead,
 * positive to the right) maps linearly to x across the full width, elevation linearly to y,
 * +90 degrees at the top edge (common practice for 360-degree video).
 */
public final class PanoramaProjection implements Projection {

    private final int width;
    private final int height;

    /** @param height frame height in pixels; the width is twice that */
    public PanoramaProjection(int height) {
        if (height < 1) {
            throw new IllegalArgumentException("frame height must be positive: " + height);
        }
        this.width = 2 * height;
        this.height = height;
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
        double horizontal = Math.sqrt(x * x + z * z);
        if (horizontal == 0 && y == 0) {
            return false;
        }
        double azimuth = Math.atan2(x, -z);
        double elevation = Math.atan2(y, horizontal);
        out[0] = width * (0.5 + azimuth / (2 * Math.PI));
        out[1] = height * (0.5 - elevation / Math.PI);
        return true;
    }

    @Override
    public boolean unproject(double px, double py, double[] dir) {
        double azimuth = (px / width - 0.5) * 2 * Math.PI;
        double elevation = (0.5 - py / height) * Math.PI;
        double c = Math.cos(elevation);
        dir[0] = c * Math.sin(azimuth);
        dir[1] = Math.sin(elevation);
        dir[2] = -c * Math.cos(azimuth);
        return true;
    }

    @Override
    public double pixelsPerRadian() {
        return width / (2 * Math.PI);
    }

    @Override
    public String name() {
        return "panorama";
    }
}
