package org.holdfast.render;

/** The text and marks that can be drawn over a frame, each switched on or off by itself. */
public enum Overlay {
    /** The simulated time in words ("in 12.4 billion years") and in Gyr from today. */
    CLOCK,
    /** The scale factor a (1 today). */
    SCALE_FACTOR,
    /** A bar of a round length in kpc (flat projection only). */
    SCALE_BAR,
    /** Each galaxy's name beside its centre. */
    NAMES,
    /** Fate events so far: mergers, escapes, members torn away. */
    EVENTS
}
