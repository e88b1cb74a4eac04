package org.holdfast.film;

import org.holdfast.render.CameraPose;
import org.joml.Vector3d;
import org.joml.Vector3dc;

/**
 * Preset {@code orbit}: the camera circles a centre at a fixed radius and height, at a steady
 * rate, always facing the centre.
 */
public final class OrbitTrack implements CameraTrack {

    private final Vector3d centre;
    private final Vector3d up;
    private final Vector3d axisA;
    private final Vector3d axisB;
    private final double radiusKpc;
    private final double riseKpc;
    private final double turns;
    private final double lengthS;
    private final double fovDeg;
    private final Vector3d eye = new Vector3d();

    /**
     * @param centreKpc point circled and faced
     * @param up axis of the circle, also the frame's up
     * @param radiusKpc radius of the circle
     * @param riseKpc height of the circle above the centre, along up
     * @param turns turns made over the film (negative: the other way)
     * @param lengthS length of the film
     */
    public OrbitTrack(Vector3dc centreKpc, Vector3dc up, double radiusKpc, double riseKpc, double turns,
            double lengthS, double fovDeg) {
        if (!(radiusKpc > 0) || !(lengthS > 0) || !Double.isFinite(turns) || !Double.isFinite(riseKpc)) {
            throw new IllegalArgumentException("orbit needs radius > 0, length > 0, finite turns and rise");
        }
        this.centre = new Vector3d(centreKpc);
        this.up = new Vector3d(up).normalize();
        Vector3d any = Math.abs(this.up.x) < 0.9 ? new Vector3d(1, 0, 0) : new Vector3d(0, 1, 0);
        this.axisA = new Vector3d(any).sub(new Vector3d(this.up).mul(any.dot(this.up))).normalize();
        this.axisB = new Vector3d(this.up).cross(axisA);
        this.radiusKpc = radiusKpc;
        this.riseKpc = riseKpc;
        this.turns = turns;
        this.lengthS = lengthS;
        this.fovDeg = fovDeg;
    }

    @Override
    public CameraPose poseAt(double filmS, CameraPose dest) {
        double phase = 2 * Math.PI * turns * filmS / lengthS;
        double c = radiusKpc * Math.cos(phase);
        double s = radiusKpc * Math.sin(phase);
        eye.set(centre.x + c * axisA.x + s * axisB.x + riseKpc * up.x,
                centre.y + c * axisA.y + s * axisB.y + riseKpc * up.y,
                centre.z + c * axisA.z + s * axisB.z + riseKpc * up.z);
        return dest.lookAt(eye, centre, up, fovDeg);
    }
}
