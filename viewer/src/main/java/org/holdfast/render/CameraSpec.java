package org.holdfast.render;

import org.holdfast.render.ProjectionKind;
import org.holdfast.render.Camera;

/**
 * The {@code --camera} option: {@code YAW,PITCH,DISTANCE[,FOV]}, angles in degrees and the
 * distance in kpc, e.g. {@code 30,15,800} or {@code 30,15,800,40}. Yaw turns the camera about +z
 * from the +x axis, pitch raises it above the x-y plane; it looks at the group's centre.
 */
public record CameraSpec(double yawDeg, double pitchDeg, double distanceKpc, double fovDeg) {

    /**
     * Reads the option's text.
     *
     * @throws IllegalArgumentException with a message fit for the user
     */
    public static CameraSpec parse(String text) {
        String[] parts = text.split(",", -1);
        if (parts.length < 3 || parts.length > 4) {
            throw new IllegalArgumentException(
                    "expected YAW,PITCH,DISTANCE[,FOV] (degrees, degrees, kpc, degrees), e.g. 30,15,800; got '" + text + "'");
        }
        double yaw = number(parts[0], "yaw", text);
        double pitch = number(parts[1], "pitch", text);
        double dist = number(parts[2], "distance", text);
        double fov = parts.length == 4 ? number(parts[3], "field of view", text) : Camera.DEFAULT_FOV_DEG;
        if (Math.abs(pitch) > Camera.PITCH_LIMIT_DEG) {
            throw new IllegalArgumentException("pitch " + parts[1].trim() + " must lie within +-"
                    + Camera.PITCH_LIMIT_DEG + " degrees");
        }
        if (!(dist >= Camera.MIN_DISTANCE_KPC && dist <= Camera.MAX_DISTANCE_KPC)) {
            throw new IllegalArgumentException("distance " + parts[2].trim() + " must lie within "
                    + Camera.MIN_DISTANCE_KPC + " to " + Camera.MAX_DISTANCE_KPC + " kpc");
        }
        if (!(fov >= Camera.MIN_FOV_DEG && fov <= Camera.MAX_FOV_DEG)) {
            throw new IllegalArgumentException("field of view " + parts[3].trim() + " must lie within "
                    + Camera.MIN_FOV_DEG + " to " + Camera.MAX_FOV_DEG + " degrees");
        }
        return new CameraSpec(yaw, pitch, dist, fov);
    }

    private static double number(String part, String what, String whole) {
        try {
            double v = Double.parseDouble(part.trim());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException(what + " '" + part.trim() + "' is not a number in '" + whole + "'");
    }

    /** The camera this describes, looking at the origin with the given projection. */
    public Camera camera(ProjectionKind projection) {
        return new Camera(0, 0, 0, distanceKpc, yawDeg, pitchDeg, fovDeg, projection);
    }
}
