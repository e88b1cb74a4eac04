package org.holdfast.window.gl;

/** Receives the window's input events, already sorted out of GLFW's callbacks. */
public interface InputSink {

    /** A key went down or repeats; GLFW key code and modifier bits. */
    void keyPressed(int key, int mods);

    /** A mouse button went down at (x, y) window pixels. */
    void buttonPressed(int button, double x, double y);

    /** A mouse button came up. */
    void buttonReleased(int button);

    /** The pointer moved to (x, y) window pixels. */
    void pointerMoved(double x, double y);

    /** The wheel turned by {@code notches}, positive away from the user. */
    void scrolled(double notches);
}
