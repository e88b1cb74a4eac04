package org.holdfast.window.gl;

import java.util.Map;

import org.holdfast.bench.BenchSuite;
import org.holdfast.render.Camera;
import org.holdfast.window.Clock;
import org.holdfast.window.FrameSize;
import org.holdfast.window.FrameSource;
import org.holdfast.window.ViewState;

/**
 * {@code holdfast bench --only window}: frames per second of the window at 1280x720, target 30.
 * Until the renderer is connected this measures the window's own share, upload and present of a
 * frame that changes every time, with a source that does no drawing to speak of;
 * {@link #measure} takes any source, so the full figure (renderer with 10^5 tracers) is one call.
 */
public final class WindowBench implements BenchSuite {

    /** Frames per second the window must sustain at 1280x720. */
    public static final double TARGET_FRAMES_PER_S = 30.0;

    private static final FrameSize SIZE = new FrameSize(1280, 720);

    /** Frame rate and time per frame of a measured run. */
    public record Rate(double framesPerS, double drawMsPerFrame, double showMsPerFrame, String glRenderer) {
    }

    @Override
    public String name() {
        return "window";
    }

    @Override
    public void run(boolean quick, Map<String, Object> results) {
        String key = "window_upload_present_" + SIZE;
        try {
            Rate r = measure(new StripeSource(), SIZE, quick ? 10 : 30, quick ? 60 : 300);
            results.put(key + "_frames_per_s", round(r.framesPerS()));
            results.put(key + "_ms_per_frame", round(r.showMsPerFrame()));
            results.put("window_target_frames_per_s", TARGET_FRAMES_PER_S);
            results.put("window_meets_target", r.framesPerS() >= TARGET_FRAMES_PER_S);
            results.put("window_gl_renderer", r.glRenderer());
            Rate full = measureRenderer(quick);
            results.put("window_frames_per_s_1280x720_1e5_tracers", round(full.framesPerS()));
            results.put("window_draw_ms_per_frame_1e5_tracers", round(full.drawMsPerFrame()));
            results.put("window_meets_target_1e5_tracers", full.framesPerS() >= TARGET_FRAMES_PER_S);
        } catch (NoDisplayException e) {
            results.put("window_skipped", e.getMessage());
        }
    }

    /** The window showing the CPU renderer's frames of a synthetic run with 10^5 tracers. */
    private static Rate measureRenderer(boolean quick) throws NoDisplayException {
        java.nio.file.Path root;
        try {
            root = java.nio.file.Files.createTempDirectory("holdfast-window-bench-");
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        try {
            org.holdfast.replay.ReplayBench.write(root, 100_000);
            try (org.holdfast.window.RunFrameSource source =
                    new org.holdfast.window.RunFrameSource(org.holdfast.replay.RunArchive.open(root), null)) {
                return measure(source, SIZE, quick ? 5 : 20, quick ? 30 : 150);
            }
        } finally {
            org.holdfast.replay.ReplayBench.delete(root);
        }
    }

    /**
     * Opens a window of {@code size}, shows {@code warmup} frames unmeasured, then {@code frames}
     * measured ones, each drawn by {@code source} for a clock a little later than the last.
     */
    public static Rate measure(FrameSource source, FrameSize size, int warmup, int frames) throws NoDisplayException {
        int w = size.width();
        int h = size.height();
        int[] argb = new int[w * h];
        try (GlWindow window = GlWindow.open("holdfast bench", w, h, false, IGNORE_INPUT)) {
            int[] fb = window.framebufferSize(new int[2]);
            if (fb[0] != w || fb[1] != h) {
                throw new NoDisplayException("the display gave a " + fb[0] + "x" + fb[1] + " window, not " + size);
            }
            double t0 = source.startGyr();
            double dt = (source.endGyr() - t0) / (warmup + frames);
            Camera camera = new Camera(0, 0, 0, source.overviewDistanceKpc(), 30, 20, Camera.DEFAULT_FOV_DEG,
                    org.holdfast.render.ProjectionKind.FLAT);
            long drawNs = 0;
            long showNs = 0;
            long start = 0;
            for (int i = 0; i < warmup + frames; i++) {
                if (i == warmup) {
                    drawNs = 0;
                    showNs = 0;
                    start = System.nanoTime();
                }
                ViewState view = ViewState.of(camera, Clock.pausedAt(t0 + i * dt, 1.0));
                long a = System.nanoTime();
                source.draw(view, w, h, argb);
                long b = System.nanoTime();
                window.pollEvents();
                window.show(argb, w, h);
                window.swap();
                showNs += System.nanoTime() - b;
                drawNs += b - a;
            }
            double wallS = (System.nanoTime() - start) * 1e-9;
            return new Rate(frames / wallS, drawNs * 1e-6 / frames, showNs * 1e-6 / frames, window.rendererName());
        }
    }

    private static double round(double v) {
        return Math.round(v * 100.0) / 100.0;
    }

    private static final InputSink IGNORE_INPUT = new InputSink() {
    };

    /** Changes one stripe of the frame each time, so every upload carries new pixels. */
    private static final class StripeSource implements FrameSource {
        private int frame;

        @Override
        public void draw(ViewState view, int width, int height, int[] argb) {
            int row = frame++ % height;
            java.util.Arrays.fill(argb, row * width, (row + 1) * width, 0xFF000000 | (frame * 0x9E3779) & 0xFFFFFF);
        }

        @Override
        public double startGyr() {
            return 0;
        }

        @Override
        public double endGyr() {
            return 1;
        }

        @Override
        public double[] eventTimesGyr() {
            return new double[0];
        }
    }
}
