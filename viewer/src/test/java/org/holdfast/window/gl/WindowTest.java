package org.holdfast.window.gl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;
import static org.lwjgl.glfw.GLFW.*;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.render.Camera;
import org.holdfast.window.Clock;
import org.holdfast.window.FrameSize;
import org.holdfast.window.PatternSource;
import org.holdfast.render.ProjectionKind;
import org.holdfast.window.ViewRun;
import org.holdfast.window.ViewState;
import org.holdfast.window.Controls;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * The real window on a real display (CI: {@code xvfb-run -a -s "-screen 0 1920x1080x24"}). What
 * the window shows, read back with glReadPixels, must equal what the source drew for the same
 * view: the window adds no look of its own.
 */
@Timeout(60)
@Tag("slow")
class WindowTest {

    /**
     * Allowed difference per colour channel between the frame drawn and the frame read back: none.
     * The copy is a nearest-sampled 1:1 blit of an 8-bit texture into an 8-bit window with no
     * blending or colour conversion, so any difference is a fault.
     */
    private static final int TOLERANCE = 0;

    @TempDir
    Path dir;

    @BeforeAll
    static void needsDisplay() {
        String display = System.getenv("DISPLAY");
        assumeTrue(display != null && !display.isBlank(),
                "DISPLAY is not set: window tests skipped (run the suite under xvfb-run -a)");
    }

    @Test
    void screenshotEqualsTheFrameTheSourceDraws() throws Exception {
        PatternSource source = new PatternSource();
        Path shot = dir.resolve("trio.png");
        ViewRun.Result r = ViewRun.run((input, sets, keep) -> source, "view", dir.toString(), "--frames", "3",
                "--screenshot", shot.toString(), "--camera", "30,10,500", "--at-gyr", "2.5", "--size", "320x200");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(3, source.drawCount());
        ViewState shown = source.lastView();
        assertEquals(new Camera(0, 0, 0, 500, 30, 10, Camera.DEFAULT_FOV_DEG, ProjectionKind.FLAT), shown.camera());
        assertEquals(2.5, shown.clock().tGyr(), 0);
        assertFalse(shown.clock().playing());
        int[] expected = PatternSource.frame(shown, 320, 200);
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(shot, expected, 320, 200));
        // The pattern is lopsided: the same frame upside down would differ a lot.
        int[] flipped = new int[expected.length];
        for (int y = 0; y < 200; y++) {
            System.arraycopy(expected, y * 320, flipped, (199 - y) * 320, 320);
        }
        assertTrue(FrameCompare.maxChannelDifference(shot, flipped, 320, 200) > 100);
        assertTrue(r.out().contains("saved " + shot), r.out());
    }

    @Test
    void domePreviewAndFpsReport() throws Exception {
        PatternSource source = new PatternSource();
        Path shot = dir.resolve("dome.png");
        ViewRun.Result r = ViewRun.run((input, sets, keep) -> source, "view", dir.toString(), "--frames", "5", "--dome",
                "--fps-report", "--screenshot", shot.toString(), "--size", "256x256");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(ProjectionKind.DOME, source.lastView().camera().projection());
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(shot,
                PatternSource.frame(source.lastView(), 256, 256), 256, 256));
        assertTrue(r.out().matches("(?s).*frames 5 in [0-9.]+ s: [0-9.]+ frames/s at 256x256.*"), r.out());
    }

    @Test
    void resizeMidRunKeepsShowingTheSourceExactly() throws Exception {
        PatternSource source = new PatternSource() {
            @Override
            public void draw(ViewState view, int width, int height, int[] argb) {
                super.draw(view, width, height, argb);
                if (drawCount() == 2) {
                    glfwSetWindowSize(glfwGetCurrentContext(), 200, 150);
                }
            }
        };
        Path shot = dir.resolve("resized.png");
        ViewRun.Result r = ViewRun.run((input, sets, keep) -> source, "view", dir.toString(), "--frames", "6",
                "--screenshot", shot.toString(), "--size", "320x240");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(shot,
                PatternSource.frame(source.lastView(), 200, 150), 200, 150));
    }

    @Test
    void closingMidRunStillLeavesTheScreenshot() throws Exception {
        PatternSource source = new PatternSource() {
            @Override
            public void draw(ViewState view, int width, int height, int[] argb) {
                super.draw(view, width, height, argb);
                if (drawCount() == 2) {
                    glfwSetWindowShouldClose(glfwGetCurrentContext(), true);
                }
            }
        };
        Path shot = dir.resolve("closed.png");
        ViewRun.Result r = ViewRun.run((input, sets, keep) -> source, "view", dir.toString(), "--frames", "50",
                "--screenshot", shot.toString(), "--size", "160x120");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(2, source.drawCount());
        assertTrue(r.out().contains("closed after 2 frames"), r.out());
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(shot,
                PatternSource.frame(source.lastView(), 160, 120), 160, 120));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left beside the screenshot");
        }
    }

    @Test
    void fixedClockStepMakesPlayingRepeatable() throws Exception {
        PatternSource source = new PatternSource();
        Path shot = dir.resolve("played.png");
        ViewRun.Result r = ViewRun.run((input, sets, keep) -> source, "view", dir.toString(), "--frames", "4", "--play",
                "--at-gyr", "1", "--frame-gyr", "0.5", "--screenshot", shot.toString(), "--size", "96x64");
        assertEquals(0, r.exitCode(), r.err());
        // Frame 1 shows the start; each later frame is one step on.
        assertEquals(2.5, source.lastView().clock().tGyr(), 1e-12);
        assertTrue(source.lastView().clock().playing());
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(shot,
                PatternSource.frame(source.lastView(), 96, 64), 96, 64));
    }

    @Test
    void wholeScreenKeyFillsTheScreenAndComesBack() throws Exception {
        ViewLoop[] loop = new ViewLoop[1];
        int[][] sizes = new int[5][];
        int[] screen = new int[2];
        PatternSource source = new PatternSource() {
            @Override
            public void draw(ViewState view, int width, int height, int[] argb) {
                super.draw(view, width, height, argb);
                sizes[drawCount() - 1] = new int[] {width, height};
                var mode = glfwGetVideoMode(glfwGetPrimaryMonitor());
                screen[0] = mode.width();
                screen[1] = mode.height();
                if (drawCount() == 1 || drawCount() == 3) {
                    loop[0].keyPressed(GLFW_KEY_W, 0);
                }
            }
        };
        ViewLoop.Settings settings = new ViewLoop.Settings(new FrameSize(160, 100), 5, null,
                new FrameSize(320, 200), dir, false, 0.0, false);
        loop[0] = new ViewLoop(source, new Controls(source, ViewState.of(Camera.looking(0, 0, 300),
                Clock.pausedAt(0, 1))), settings, "pattern", new PrintWriter(new StringWriter(), true));
        loop[0].run();
        assertEquals(160, sizes[0][0]);
        assertEquals(screen[0], sizes[2][0], "frame as wide as the screen");
        assertEquals(screen[1], sizes[2][1], "frame as high as the screen");
        assertEquals(160, sizes[4][0], "back to the window");
        assertEquals(100, sizes[4][1]);
    }

    @Test
    void screenshotKeysWriteTheWindowAndTheLargeSize() throws Exception {
        ViewLoop[] loop = new ViewLoop[1];
        PatternSource source = new PatternSource() {
            @Override
            public void draw(ViewState view, int width, int height, int[] argb) {
                super.draw(view, width, height, argb);
                if (drawCount() == 1) {
                    loop[0].keyPressed(GLFW_KEY_P, 0);
                    loop[0].keyPressed(GLFW_KEY_P, GLFW_MOD_SHIFT);
                } else if (drawCount() == 3) {
                    // Draw 2 was the large shot, drawn afresh at its own size; 3 is frame two.
                    assertEquals(120, width);
                    loop[0].keyPressed(GLFW_KEY_Q, 0);
                }
            }
        };
        ViewState start = ViewState.of(Camera.looking(45, -20, 300), Clock.pausedAt(7.25, 0.1));
        StringWriter out = new StringWriter();
        ViewLoop.Settings settings = new ViewLoop.Settings(new FrameSize(120, 90), 0, null,
                new FrameSize(300, 200), dir, false, 0.0, false);
        loop[0] = new ViewLoop(source, new Controls(source, start), settings, "pattern", new PrintWriter(out, true));
        ViewLoop.Outcome o = loop[0].run();
        assertEquals(2, o.frames(), "Q quits before the third frame");
        assertEquals(3, source.drawCount(), "two frames and one large shot");
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(dir.resolve("shot-0001.png"),
                PatternSource.frame(start, 120, 90), 120, 90));
        assertEquals(TOLERANCE, FrameCompare.maxChannelDifference(dir.resolve("shot-0002.png"),
                PatternSource.frame(start, 300, 200), 300, 200));
        assertTrue(out.toString().contains("(300x200)"), out.toString());
    }
}
