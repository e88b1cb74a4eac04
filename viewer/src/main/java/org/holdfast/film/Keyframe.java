package org.holdfast.film;

import org.joml.Vector3d;
import org.joml.Vector3dc;

/**
 * A camera pose fixed at one film second.
 *
 * @param atS film second
 * @param eyeKpc camera position
 * @param targetKpc point the camera faces
 * @param up direction towards the top of the frame (need not be orthogonal to the view)
 * @param fovDeg vertical field of view (flat projection)
 */
public record Keyframe(double atS, Vector3dc eyeKpc, Vector3dc targetKpc, Vector3dc up, double fovDeg) {

    public Keyframe {
        if (!Double.isFinite(atS) || atS < 0) {
            throw new IllegalArgumentException("keyframe time must be >= 0 s: " + atS);
        }
        if (!(fovDeg > 0 && fovDeg <= 179)) {
            throw new IllegalArgumentException("keyframe field of view must be in (0, 179] degrees: " + fovDeg);
        }
        eyeKpc = new Vector3d(eyeKpc);
        targetKpc = new Vector3d(targetKpc);
        up = new Vector3d(up);
    }
}
