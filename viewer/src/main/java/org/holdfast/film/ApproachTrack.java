package org.holdfast.film;

import org.holdfast.render.CameraPose;
import org.joml.Vector3d;
import org.joml.Vector3dc;

/**
 * Preset {@code approach}: the camera glides along a straight line from a far point to a near
 * one, facing a target, starting and stopping gently (smoothstep easing, 3u^2 - 2u^3, common
 * practice), so that the speed is zero at both ends.
 */
public final class ApproachTrack implements CameraTrack {

    private final Vector3d from;
    private final Vector3d to;
    private final Vector3d target;
    private final Vector3d up;
    private final double lengthS;
    private final double fovDeg;
    private final Vector3d eye = new Vector3d();

    public ApproachTrack(Vector3dc fromKpc, Vector3dc toKpc, Vector3dc targetKpc, Vector3dc up, double lengthS,
            double fovDeg) {
        if (!(lengthS > 0)) {
            throw new IllegalArgumentException("approach needs a length > 0 s: " + lengthS);
        }
        this.from = new Vector3d(fromKpc);
        this.to = new Vector3d(toKpc);
        this.target = new Vector3d(targetKpc);
        this.up = new Vector3d(up);
        this.lengthS = lengthS;
        this.fovDeg = fovDeg;
    }

    @Override
    public CameraPose poseAt(double filmS, CameraPose dest) {
        double u = Math.max(0, Math.min(1, filmS / lengthS));
        double e = u * u * (3 - 2 * u);
        from.lerp(to, e, eye);
        return dest.lookAt(eye, target, up, fovDeg);
    }
}
