/**
 * The GLFW window: it uploads each frame a {@link org.holdfast.window.FrameSource} drew as a
 * texture, copies it to the screen pixel for pixel, reads it back for screenshots, and passes
 * keys and the mouse to {@link org.holdfast.window.Controls}. No drawing of its own.
 */
package org.holdfast.window.gl;
