package org.holdfast.render;

/** How the camera's view is laid onto the frame. */
public enum ProjectionKind {
    /** An ordinary perspective picture with the camera's field of view. */
    FLAT,
    /** A preview of the fulldome master: a fisheye circle filling the frame's short side. */
    DOME
}
