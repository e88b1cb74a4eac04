package org.holdfast.window;

/** How the camera's view is laid onto the frame. */
public enum Projection {
    /** An ordinary perspective picture with the camera's field of view. */
    FLAT,
    /** A preview of the fulldome master: a fisheye circle filling the frame's short side. */
    DOME
}
