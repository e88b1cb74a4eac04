package org.holdfast.window.gl;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.opengl.GL11.*;
import static org.lwjgl.opengl.GL12.GL_BGRA;
import static org.lwjgl.opengl.GL12.GL_UNSIGNED_INT_8_8_8_8_REV;
import static org.lwjgl.opengl.GL30.*;

import org.lwjgl.glfw.Callbacks;
import org.lwjgl.glfw.GLFWErrorCallback;
import org.lwjgl.opengl.GL;
import org.lwjgl.system.MemoryStack;

/**
 * One GLFW window with an OpenGL 3.2 core context. A frame is shown by uploading the ARGB
 * buffer into a texture ({@code GL_BGRA}, {@code GL_UNSIGNED_INT_8_8_8_8_REV}: the byte order of
 * a Java ARGB {@code int}) and blitting that texture to the window with nearest sampling, turned
 * upright (buffer row 0 is the top, GL's row 0 the bottom). No shader, no filtering, no blending:
 * the window shows exactly the pixels it was given.
 *
 * <p>Use from one thread: {@link #open}, then per frame {@link #pollEvents}, {@link #show},
 * optionally {@link #readBack}, {@link #swap}; finally {@link #close}.
 */
public final class GlWindow implements AutoCloseable {

    /** Why no window can open when no display is named. */
    public static final String NO_DISPLAY = "no display to open a window on (DISPLAY is not set)";

    private static volatile String lastGlfwError = "";

    private final long handle;
    private final GLFWErrorCallback errorCallback;
    private final int texture;
    private final int framebuffer;
    private int textureWidth;
    private int textureHeight;
    private final int[] sizeX = new int[1];
    private final int[] sizeY = new int[1];
    /** Window position and size to return to from the whole screen; null while windowed. */
    private int[] windowedBounds;

    private GlWindow(long handle, GLFWErrorCallback errorCallback) {
        this.handle = handle;
        this.errorCallback = errorCallback;
        this.texture = glGenTextures();
        this.framebuffer = glGenFramebuffers();
    }

    /**
     * Starts GLFW and opens a window of {@code width} x {@code height} screen units.
     *
     * @param everyVsync swap at the display's refresh (interactive) or as fast as possible
     * @throws NoDisplayException if there is no display or GLFW or OpenGL will not start
     */
    public static GlWindow open(String title, int width, int height, boolean everyVsync, InputSink input)
            throws NoDisplayException {
        GLFWErrorCallback cb = startGlfw();
        glfwDefaultWindowHints();
        glfwWindowHint(GLFW_VISIBLE, GLFW_TRUE);
        glfwWindowHint(GLFW_RESIZABLE, GLFW_TRUE);
        glfwWindowHint(GLFW_CONTEXT_VERSION_MAJOR, 3);
        glfwWindowHint(GLFW_CONTEXT_VERSION_MINOR, 2);
        glfwWindowHint(GLFW_OPENGL_PROFILE, GLFW_OPENGL_CORE_PROFILE);
        glfwWindowHint(GLFW_OPENGL_FORWARD_COMPAT, GLFW_TRUE);
        glfwWindowHint(GLFW_SAMPLES, 0);
        long h = glfwCreateWindow(width, height, title, 0L, 0L);
        if (h == 0L) {
            String why = lastGlfwError;
            shutDown(cb);
            throw new NoDisplayException("could not open a window with OpenGL 3.2 (" + why + ")");
        }
        glfwMakeContextCurrent(h);
        try {
            GL.createCapabilities();
        } catch (IllegalStateException e) {
            glfwDestroyWindow(h);
            shutDown(cb);
            throw new NoDisplayException("OpenGL did not start (" + e.getMessage() + ")");
        }
        glfwSwapInterval(everyVsync ? 1 : 0);
        GlWindow w = new GlWindow(h, cb);
        w.installInput(input);
        return w;
    }

    /** True if the environment names a display (X11 or Wayland); whether it works shows at {@link #open}. */
    public static boolean displayNamed() {
        return !blank(System.getenv("DISPLAY")) || !blank(System.getenv("WAYLAND_DISPLAY"));
    }

    private static boolean blank(String s) {
        return s == null || s.isBlank();
    }

    private static GLFWErrorCallback startGlfw() throws NoDisplayException {
        String display = System.getenv("DISPLAY");
        String wayland = System.getenv("WAYLAND_DISPLAY");
        boolean x11 = !blank(display);
        if (!displayNamed()) {
            throw new NoDisplayException(NO_DISPLAY);
        }
        lastGlfwError = "";
        GLFWErrorCallback cb = GLFWErrorCallback.create(
                (code, description) -> lastGlfwError = GLFWErrorCallback.getDescription(description));
        glfwSetErrorCallback(cb);
        if (x11) {
            glfwInitHint(GLFW_PLATFORM, GLFW_PLATFORM_X11);
        }
        if (!glfwInit()) {
            String why = lastGlfwError;
            glfwSetErrorCallback(null);
            cb.free();
            throw new NoDisplayException("the window system would not start on display '"
                    + (x11 ? display : wayland) + "' (" + why + ")");
        }
        return cb;
    }

    private static void shutDown(GLFWErrorCallback cb) {
        glfwTerminate();
        glfwSetErrorCallback(null);
        cb.free();
    }

    private void installInput(InputSink input) {
        glfwSetKeyCallback(handle, (win, key, scancode, action, mods) -> {
            if (action == GLFW_PRESS || action == GLFW_REPEAT) {
                input.keyPressed(key, mods);
            }
        });
        glfwSetMouseButtonCallback(handle, (win, button, action, mods) -> {
            if (action == GLFW_PRESS) {
                try (MemoryStack stack = MemoryStack.stackPush()) {
                    var x = stack.mallocDouble(1);
                    var y = stack.mallocDouble(1);
                    glfwGetCursorPos(win, x, y);
                    input.buttonPressed(button, x.get(0), y.get(0));
                }
            } else if (action == GLFW_RELEASE) {
                input.buttonReleased(button);
            }
        });
        glfwSetCursorPosCallback(handle, (win, x, y) -> input.pointerMoved(x, y));
        glfwSetScrollCallback(handle, (win, dx, dy) -> input.scrolled(dy));
    }

    /** Handles pending window events (input, resizes, close requests). */
    public void pollEvents() {
        glfwPollEvents();
    }

    /** Waits up to {@code seconds} for an event: for when nothing can be drawn (minimised). */
    public void waitEvents(double seconds) {
        glfwWaitEventsTimeout(seconds);
    }

    /** True once the user closed the window or {@link #requestClose()} was called. */
    public boolean closeRequested() {
        return glfwWindowShouldClose(handle);
    }

    public void requestClose() {
        glfwSetWindowShouldClose(handle, true);
    }

    /** The drawable size in pixels written into {@code widthHeight}; zeros while minimised. */
    public int[] framebufferSize(int[] widthHeight) {
        glfwGetFramebufferSize(handle, sizeX, sizeY);
        widthHeight[0] = sizeX[0];
        widthHeight[1] = sizeY[0];
        return widthHeight;
    }

    /** True while the window fills the screen. */
    public boolean wholeScreen() {
        return windowedBounds != null;
    }

    /** Fills the primary monitor at its current mode, or goes back to the window it was. */
    public void toggleWholeScreen() {
        if (windowedBounds == null) {
            long monitor = glfwGetPrimaryMonitor();
            var mode = monitor == 0L ? null : glfwGetVideoMode(monitor);
            if (mode == null) {
                return;
            }
            int[] x = new int[1];
            int[] y = new int[1];
            int[] w = new int[1];
            int[] h = new int[1];
            glfwGetWindowPos(handle, x, y);
            glfwGetWindowSize(handle, w, h);
            windowedBounds = new int[] {x[0], y[0], w[0], h[0]};
            glfwSetWindowMonitor(handle, monitor, 0, 0, mode.width(), mode.height(), mode.refreshRate());
        } else {
            int[] b = windowedBounds;
            windowedBounds = null;
            glfwSetWindowMonitor(handle, 0L, b[0], b[1], b[2], b[3], GLFW_DONT_CARE);
        }
    }

    public void setTitle(String title) {
        glfwSetWindowTitle(handle, title);
    }

    /** Uploads {@code argb} (width x height, row 0 on top) and copies it to the whole window. */
    public void show(int[] argb, int width, int height) {
        glBindTexture(GL_TEXTURE_2D, texture);
        if (width != textureWidth || height != textureHeight) {
            glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MIN_FILTER, GL_NEAREST);
            glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MAG_FILTER, GL_NEAREST);
            glTexImage2D(GL_TEXTURE_2D, 0, GL_RGBA8, width, height, 0, GL_BGRA,
                    GL_UNSIGNED_INT_8_8_8_8_REV, (java.nio.IntBuffer) null);
            glBindFramebuffer(GL_READ_FRAMEBUFFER, framebuffer);
            glFramebufferTexture2D(GL_READ_FRAMEBUFFER, GL_COLOR_ATTACHMENT0, GL_TEXTURE_2D, texture, 0);
            int status = glCheckFramebufferStatus(GL_READ_FRAMEBUFFER);
            if (status != GL_FRAMEBUFFER_COMPLETE) {
                throw new IllegalStateException("frame texture not usable, status 0x" + Integer.toHexString(status));
            }
            textureWidth = width;
            textureHeight = height;
        }
        glPixelStorei(GL_UNPACK_ALIGNMENT, 4);
        glPixelStorei(GL_UNPACK_ROW_LENGTH, 0);
        glTexSubImage2D(GL_TEXTURE_2D, 0, 0, 0, width, height, GL_BGRA, GL_UNSIGNED_INT_8_8_8_8_REV, argb);
        glBindFramebuffer(GL_READ_FRAMEBUFFER, framebuffer);
        glBindFramebuffer(GL_DRAW_FRAMEBUFFER, 0);
        glViewport(0, 0, width, height);
        glBlitFramebuffer(0, height, width, 0, 0, 0, width, height, GL_COLOR_BUFFER_BIT, GL_NEAREST);
        glBindFramebuffer(GL_READ_FRAMEBUFFER, 0);
    }

    /**
     * Reads what the window is about to show (call after {@link #show}, before {@link #swap})
     * into {@code argb}, row 0 on top, alpha forced opaque.
     */
    public void readBack(int[] argb, int width, int height) {
        glBindFramebuffer(GL_READ_FRAMEBUFFER, 0);
        glReadBuffer(GL_BACK);
        glPixelStorei(GL_PACK_ALIGNMENT, 4);
        glReadPixels(0, 0, width, height, GL_BGRA, GL_UNSIGNED_INT_8_8_8_8_REV, argb);
        int[] row = new int[width];
        for (int y = 0; y < height / 2; y++) {
            int top = y * width;
            int bottom = (height - 1 - y) * width;
            System.arraycopy(argb, top, row, 0, width);
            System.arraycopy(argb, bottom, argb, top, width);
            System.arraycopy(row, 0, argb, bottom, width);
        }
        for (int i = 0; i < width * height; i++) {
            argb[i] |= 0xFF000000;
        }
    }

    /** Puts the frame on screen. */
    public void swap() {
        glfwSwapBuffers(handle);
    }

    /** The OpenGL renderer's name, for reports ("llvmpipe ..."). */
    public String rendererName() {
        return glGetString(GL_RENDERER);
    }

    @Override
    public void close() {
        glDeleteFramebuffers(framebuffer);
        glDeleteTextures(texture);
        GL.setCapabilities(null);
        Callbacks.glfwFreeCallbacks(handle);
        glfwDestroyWindow(handle);
        shutDown(errorCallback);
    }
}
