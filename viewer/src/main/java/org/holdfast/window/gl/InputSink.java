package org.holdfast.window.gl;

/** Receives the window's input events, already sorted out of GLFW's callbacks; each ignored unless overridden. */
public interface InputSink {

    /** A key went down or repeats; GLFW key code and modifier bits. */
    default void keyPressed(int key, int mods) {
    }

    /** A mouse button went down at (x, y) window pixels. */
    default void buttonPressed(int button, double x, double y) {
    }

    /** A mouse button came up. */
    default void buttonReleased(int button) {
    }

    /** The pointer moved to (x, y) window pixels. */
    default void pointerMoved(double x, double y) {
    }

    /** The wheel turned by {@code notches}, positive away from the user. */
    default void scrolled(double notches) {
    }
}
