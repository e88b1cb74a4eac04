package org.holdfast.render.projection;

/**
 * Fulldome fisheye in the azimuthal equidistant form: the angle from the dome's zenith grows
 * linearly with the distance from the centre of a square frame, and the full span (180 degrees
 * by default, up to 240) fills the inscribed circle. This is the "dome master" frame that dome
 * projection systems take (common practice).
 *
 * <p>The tilt says how far the dome's zenith lies above the camera's forward direction: 0 puts
 * the view direction at the frame centre; 90 makes the camera's up the zenith, so that the
 * view direction sits on the lower rim of a 180-degree frame, the usual framing for a
 * horizontal dome whose audience faces front.
 */
public final class DomeProjection implements Projection {

    /** Largest span accepted, in degrees. */
    public static final double MAX_SPAN_DEG = 240;

    private final int size;
    private final double spanDeg;
    private final double tiltDeg;
    private final double halfSpanRad;
    private final double radiusPx;
    // Dome axis (zenith) and the direction drawn towards the top of the frame, camera space.
    private final double axisY;
    private final double axisZ;
    private final double topY;
    private final double topZ;

    /**
     * @param size width and height of the square frame in pixels
     * @param spanDeg full angle across the dome, in (0, 240] degrees
     * @param tiltDeg angle of the zenith above the camera's forward direction, in [-90, 90]
     */
    public DomeProjection(int size, double spanDeg, double tiltDeg) {
        if (size < 1) {
            throw new IllegalArgumentException("frame size must be positive: " + size);
        }
        if (!(spanDeg > 0 && spanDeg <= MAX_SPAN_DEG)) {
            throw new IllegalArgumentException("dome span must be in (0, 240] degrees: " + spanDeg);
        }
        if (!(tiltDeg >= -90 && tiltDeg <= 90)) {
            throw new IllegalArgumentException("dome tilt must be in [-90, 90] degrees: " + tiltDeg);
        }
        this.size = size;
        this.spanDeg = spanDeg;
        this.tiltDeg = tiltDeg;
        this.halfSpanRad = Math.toRadians(spanDeg) / 2;
        this.radiusPx = 0.5 * size;
        double t = Math.toRadians(tiltDeg);
        // forward (0, 0, -1) turned towards up (0, 1, 0) by the tilt; "top" stays orthogonal.
        this.axisY = Math.sin(t);
        this.axisZ = -Math.cos(t);
        this.topY = Math.cos(t);
        this.topZ = Math.sin(t);
    }

    /** A 180-degree dome with no tilt. */
    public DomeProjection(int size) {
        this(size, 180, 0);
    }

    public double spanDeg() {
        return spanDeg;
    }

    public double tiltDeg() {
        return tiltDeg;
    }

    @Override
    public int width() {
        return size;
    }

    @Override
    public int height() {
        return size;
    }

    @Override
    public boolean project(double x, double y, double z, double[] out) {
        double w = y * axisY + z * axisZ;
        double v = y * topY + z * topZ;
        double rho = Math.sqrt(x * x + v * v);
        double theta = Math.atan2(rho, w);
        if (theta > halfSpanRad || (rho == 0 && w <= 0)) {
            return false;
        }
        double r = radiusPx * theta / halfSpanRad;
        if (rho == 0) {
            out[0] = radiusPx;
            out[1] = radiusPx;
        } else {
            out[0] = radiusPx + r * x / rho;
            out[1] = radiusPx - r * v / rho;
        }
        return true;
    }

    @Override
    public boolean unproject(double px, double py, double[] dir) {
        double dx = px - radiusPx;
        double dy = radiusPx - py;
        double r = Math.sqrt(dx * dx + dy * dy);
        if (r > radiusPx) {
            return false;
        }
        double theta = halfSpanRad * r / radiusPx;
        double c = Math.cos(theta);
        double s = r == 0 ? 0 : Math.sin(theta) / r;
        double u = s * dx;
        double v = s * dy;
        dir[0] = u;
        dir[1] = c * axisY + v * topY;
        dir[2] = c * axisZ + v * topZ;
        return true;
    }

    @Override
    public double pixelsPerRadian() {
        return radiusPx / halfSpanRad;
    }

    @Override
    public String name() {
        return "dome";
    }
}
