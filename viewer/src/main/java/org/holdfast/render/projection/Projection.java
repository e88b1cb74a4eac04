package org.holdfast.render.projection;

/**
 * A map from camera-space directions to frame pixels. Implementations are immutable and
 * allocate nothing in {@link #project} or {@link #unproject}, which the renderer calls once
 * per splat.
 */
public interface Projection {

    /** Frame width in pixels. */
    int width();

    /** Frame height in pixels. */
    int height();

    /**
     * Projects the camera-space point (x, y, z) (any length; only its direction matters).
     *
     * @param out receives the pixel position: out[0] = x, out[1] = y
     * @return false if the direction is not shown by this projection (behind a flat camera,
     *         outside the dome's span); out is then left unspecified
     */
    boolean project(double x, double y, double z, double[] out);

    /**
     * The unit camera-space direction that lands on pixel position (px, py).
     *
     * @param dir receives the direction: dir[0..2]
     * @return false if that pixel position shows no direction (outside the dome's disc)
     */
    boolean unproject(double px, double py, double[] dir);

    /**
     * Pixels per radian at the frame centre, used to turn an angle into a length on screen
     * (the scale bar, the size of a galaxy's marker).
     */
    double pixelsPerRadian();

    /** The short name used in film files and messages: flat, dome or panorama. */
    String name();
}
