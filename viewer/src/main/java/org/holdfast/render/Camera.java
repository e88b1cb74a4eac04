package org.holdfast.render;

import org.joml.Matrix4d;
import org.joml.Vector3d;

import org.holdfast.render.ProjectionKind;

/**
 * A camera that orbits a target point: it sits {@code distanceKpc} from the target, turned by
 * {@code yawDeg} about the z axis (measured from +x towards +y) and raised by {@code pitchDeg}
 * above the x-y plane, and looks at the target with +z up. Immutable; each change returns a new
 * camera.
 *
 * @param targetXKpc   x of the point looked at, kpc
 * @param targetYKpc   y of the point looked at, kpc
 * @param targetZKpc   z of the point looked at, kpc
 * @param distanceKpc  distance from the target, kpc, within [{@link #MIN_DISTANCE_KPC}, {@link #MAX_DISTANCE_KPC}]
 * @param yawDeg       turn about +z, degrees in [0, 360)
 * @param pitchDeg     elevation, degrees within +-{@link #PITCH_LIMIT_DEG}
 * @param fovDeg       vertical field of view of the flat view, degrees
 * @param projection   flat picture or dome preview
 */
public record Camera(double targetXKpc, double targetYKpc, double targetZKpc, double distanceKpc,
                     double yawDeg, double pitchDeg, double fovDeg, ProjectionKind projection) {

    /** Closest approach to the target, kpc. */
    public static final double MIN_DISTANCE_KPC = 0.1;
    /** Farthest the camera may back away, kpc. */
    public static final double MAX_DISTANCE_KPC = 1.0e6;
    /** Elevation limit, degrees: short of the poles, where "up" would be undefined. */
    public static final double PITCH_LIMIT_DEG = 89.0;
    /** Narrowest flat field of view, degrees. */
    public static final double MIN_FOV_DEG = 5.0;
    /** Widest flat field of view, degrees. */
    public static final double MAX_FOV_DEG = 150.0;
    /** Field of view a fresh camera starts with, degrees. */
    public static final double DEFAULT_FOV_DEG = 50.0;

    public Camera {
        if (!(distanceKpc >= MIN_DISTANCE_KPC && distanceKpc <= MAX_DISTANCE_KPC)) {
            throw new IllegalArgumentException("distance " + distanceKpc + " kpc outside ["
                    + MIN_DISTANCE_KPC + ", " + MAX_DISTANCE_KPC + "]");
        }
        if (!(Math.abs(pitchDeg) <= PITCH_LIMIT_DEG)) {
            throw new IllegalArgumentException("pitch " + pitchDeg + " deg beyond +-" + PITCH_LIMIT_DEG);
        }
        if (!(fovDeg >= MIN_FOV_DEG && fovDeg <= MAX_FOV_DEG)) {
            throw new IllegalArgumentException("field of view " + fovDeg + " deg outside ["
                    + MIN_FOV_DEG + ", " + MAX_FOV_DEG + "]");
        }
        if (!Double.isFinite(targetXKpc + targetYKpc + targetZKpc + yawDeg)) {
            throw new IllegalArgumentException("camera target and yaw must be finite");
        }
        yawDeg = wrapDegrees(yawDeg);
        if (projection == null) {
            throw new IllegalArgumentException("projection must be given");
        }
    }

    /** A flat camera looking at the origin from {@code distanceKpc}. */
    public static Camera looking(double yawDeg, double pitchDeg, double distanceKpc) {
        return new Camera(0, 0, 0, distanceKpc, yawDeg, pitchDeg, DEFAULT_FOV_DEG, ProjectionKind.FLAT);
    }

    /** Turned by {@code dYawDeg} and raised by {@code dPitchDeg}; pitch stops at the limit. */
    public Camera orbit(double dYawDeg, double dPitchDeg) {
        double p = Math.max(-PITCH_LIMIT_DEG, Math.min(PITCH_LIMIT_DEG, pitchDeg + dPitchDeg));
        return new Camera(targetXKpc, targetYKpc, targetZKpc, distanceKpc, yawDeg + dYawDeg, p,
                fovDeg, projection);
    }

    /** Distance multiplied by {@code factor}, kept within the limits. */
    public Camera zoom(double factor) {
        double d = Math.max(MIN_DISTANCE_KPC, Math.min(MAX_DISTANCE_KPC, distanceKpc * factor));
        return withDistance(d);
    }

    public Camera withDistance(double newDistanceKpc) {
        return new Camera(targetXKpc, targetYKpc, targetZKpc, newDistanceKpc, yawDeg, pitchDeg,
                fovDeg, projection);
    }

    public Camera withTarget(double xKpc, double yKpc, double zKpc) {
        return new Camera(xKpc, yKpc, zKpc, distanceKpc, yawDeg, pitchDeg, fovDeg, projection);
    }

    /** Field of view multiplied by {@code factor}, kept within the limits. */
    public Camera widen(double factor) {
        double f = Math.max(MIN_FOV_DEG, Math.min(MAX_FOV_DEG, fovDeg * factor));
        return new Camera(targetXKpc, targetYKpc, targetZKpc, distanceKpc, yawDeg, pitchDeg, f,
                projection);
    }

    public Camera withFov(double newFovDeg) {
        return new Camera(targetXKpc, targetYKpc, targetZKpc, distanceKpc, yawDeg, pitchDeg,
                newFovDeg, projection);
    }

    public Camera withProjection(ProjectionKind p) {
        return new Camera(targetXKpc, targetYKpc, targetZKpc, distanceKpc, yawDeg, pitchDeg, fovDeg, p);
    }

    /** Where the camera sits, kpc, written into {@code dest}. */
    public Vector3d eyeKpc(Vector3d dest) {
        double y = Math.toRadians(yawDeg);
        double p = Math.toRadians(pitchDeg);
        double c = Math.cos(p);
        return dest.set(targetXKpc + distanceKpc * c * Math.cos(y),
                targetYKpc + distanceKpc * c * Math.sin(y),
                targetZKpc + distanceKpc * Math.sin(p));
    }

    /** The world-to-camera matrix (camera looks down its -z, +z world up), written into {@code dest}. */
    public Matrix4d viewMatrix(Matrix4d dest) {
        Vector3d eye = eyeKpc(new Vector3d());
        return dest.setLookAt(eye.x, eye.y, eye.z, targetXKpc, targetYKpc, targetZKpc, 0, 0, 1);
    }

    private static double wrapDegrees(double deg) {
        double w = deg % 360.0;
        return w < 0 ? w + 360.0 : w;
    }
}
