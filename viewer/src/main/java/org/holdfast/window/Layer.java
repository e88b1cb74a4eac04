package org.holdfast.window;

/** Things the renderer may draw over or into a frame; each can be switched on and off. */
public enum Layer {
    /** Paths the members took. */
    TRAILS,
    /** Member names beside them. */
    NAMES,
    /** The members' star particles. */
    STARS,
    /** Tracers of the Hubble flow around the group. */
    TRACERS,
    /** The clock: time in Gyr and the scale factor. */
    CLOCK,
    /** A note for each fate event as it happens. */
    EVENTS,
    /** The list of keys. */
    HELP
}
