package org.holdfast.window.gl;

/** No window can be opened here: no display, or GLFW or OpenGL would not start. */
public final class NoDisplayException extends Exception {

    private static final long serialVersionUID = 1L;

    public NoDisplayException(String reason) {
        super(reason);
    }
}
