package org.holdfast.film;

import org.holdfast.render.CameraPose;

/** Where the camera is at each second of a film. */
public interface CameraTrack {

    /** Writes the pose at film second {@code filmS} into {@code dest} and returns it. */
    CameraPose poseAt(double filmS, CameraPose dest);
}
