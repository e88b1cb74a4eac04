/**
 * The interactive view: what a frame shows ({@link org.holdfast.window.ViewState}: camera, clock,
 * layers), where frames come from ({@link org.holdfast.window.FrameSource}, filled by the CPU
 * renderer) and the {@code holdfast view} command. The window itself ({@code gl}) only uploads and
 * shows what a source drew; keys and the mouse become state changes in {@code input}.
 */
package org.holdfast.window;
