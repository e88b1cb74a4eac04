package org.holdfast.window.gl;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Locale;

import org.holdfast.window.FrameSize;
import org.holdfast.window.FrameSource;
import org.holdfast.window.Screenshots;
import org.holdfast.window.ViewState;
import org.holdfast.window.Controls;
import org.holdfast.window.input.Request;

/**
 * The event loop of {@code holdfast view}: each frame the clock moves on by the wall time that
 * passed, the source draws into one reused buffer, the window shows it. Keys and the mouse go to
 * the {@link Controls}; screenshots are written whole (temporary name, then rename).
 */
public final class ViewLoop implements InputSink {

    /**
     * How the loop runs.
     *
     * @param window      window size in screen units
     * @param frameLimit  quit after this many frames shown; 0 for no limit
     * @param screenshot  PNG written from the last frame shown; null for none
     * @param largeShot   size of screenshots taken with the large-shot key
     * @param shotsDir    folder for screenshots taken with keys
     * @param fpsReport   print frame rate and time per frame at the end
     * @param frameGyr    clock step per frame while playing, Gyr; 0 to follow the wall clock
     * @param wholeScreen start filling the screen
     */
    public record Settings(FrameSize window, long frameLimit, Path screenshot, FrameSize largeShot,
                           Path shotsDir, boolean fpsReport, double frameGyr, boolean wholeScreen) {
    }

    /** How the loop ended. */
    public record Outcome(long frames, boolean closedEarly, Path screenshot) {
    }

    private static final double TITLE_INTERVAL_S = 0.25;

    private final FrameSource source;
    private final Controls controls;
    private final Settings settings;
    private final String inputName;
    private final PrintWriter out;
    private final ArrayDeque<Request> shotRequests = new ArrayDeque<>();
    private boolean quitRequested;

    private GlWindow window;
    private int[] frame = new int[0];
    private final int[] drawable = new int[2];
    private int frameWidth;
    private int frameHeight;

    public ViewLoop(FrameSource source, Controls controls, Settings settings, String inputName, PrintWriter out) {
        this.source = source;
        this.controls = controls;
        this.settings = settings;
        this.inputName = inputName;
        this.out = out;
    }

    /** Opens the window, runs until the frame limit, a quit key or the window closing. */
    public Outcome run() throws NoDisplayException, IOException {
        boolean scripted = settings.frameLimit() > 0;
        window = GlWindow.open(title(), settings.window().width(), settings.window().height(), !scripted, this);
        if (settings.wholeScreen()) {
            window.toggleWholeScreen();
        }
        try {
            return loop();
        } finally {
            window.close();
            window = null;
        }
    }

    private Outcome loop() throws IOException {
        long limit = settings.frameLimit();
        long frames = 0;
        long drawNs = 0;
        long showNs = 0;
        long startNs = System.nanoTime();
        long lastNs = startNs;
        double sinceTitle = TITLE_INTERVAL_S;
        Path written = null;
        while (!window.closeRequested() && !quitRequested && (limit <= 0 || frames < limit)) {
            window.pollEvents();
            if (quitRequested) {
                break;
            }
            long now = System.nanoTime();
            double dt = (now - lastNs) * 1e-9;
            lastNs = now;
            controls.tick(frames == 0 ? 0.0 : clockSeconds(dt));
            int[] fb = window.framebufferSize(drawable);
            if (fb[0] <= 0 || fb[1] <= 0) {
                window.waitEvents(0.1);
                continue;
            }
            ensureFrame(fb[0], fb[1]);
            ViewState view = controls.state();
            long t0 = System.nanoTime();
            source.draw(view, frameWidth, frameHeight, frame);
            long t1 = System.nanoTime();
            window.show(frame, frameWidth, frameHeight);
            boolean last = limit > 0 && frames == limit - 1;
            if (last && settings.screenshot() != null) {
                written = readBackTo(settings.screenshot());
            }
            handleShotRequests(view);
            window.swap();
            long t2 = System.nanoTime();
            drawNs += t1 - t0;
            showNs += t2 - t1;
            frames++;
            sinceTitle += dt;
            if (sinceTitle >= TITLE_INTERVAL_S) {
                window.setTitle(title());
                sinceTitle = 0;
            }
        }
        boolean early = limit > 0 && frames < limit;
        if (settings.screenshot() != null && written == null) {
            written = lastDrawnTo(settings.screenshot(), frames);
        }
        if (settings.fpsReport()) {
            reportRate(frames, System.nanoTime() - startNs, drawNs, showNs);
        }
        return new Outcome(frames, early, written);
    }

    /** Wall seconds the clock should run for this frame: real, or one fixed clock step. */
    private double clockSeconds(double wallSeconds) {
        return settings.frameGyr() > 0 ? settings.frameGyr() / controls.state().clock().rateGyrPerS() : wallSeconds;
    }

    private void handleShotRequests(ViewState view) throws IOException {
        while (!shotRequests.isEmpty()) {
            Request r = shotRequests.poll();
            if (r == Request.WHOLE_SCREEN) {
                window.toggleWholeScreen();
            } else if (r == Request.SCREENSHOT) {
                Path p = readBackTo(Screenshots.nextFreeName(settings.shotsDir()));
                out.println("saved " + p + " (" + frameWidth + "x" + frameHeight + ")");
            } else if (r == Request.SCREENSHOT_LARGE) {
                FrameSize s = settings.largeShot();
                int[] big = new int[s.width() * s.height()];
                source.draw(view, s.width(), s.height(), big);
                Path p = Screenshots.nextFreeName(settings.shotsDir());
                Screenshots.writePng(p, big, s.width(), s.height());
                out.println("saved " + p + " (" + s + ")");
            }
            out.flush();
        }
    }

    private Path readBackTo(Path file) throws IOException {
        int[] shown = new int[frameWidth * frameHeight];
        window.readBack(shown, frameWidth, frameHeight);
        Screenshots.writePng(file, shown, frameWidth, frameHeight);
        return file;
    }

    /** The window went away before the last frame: keep the last frame drawn, if any. */
    private Path lastDrawnTo(Path file, long frames) throws IOException {
        if (frames == 0) {
            out.println("the window closed before a frame was shown: no screenshot written");
            out.flush();
            return null;
        }
        Screenshots.writePng(file, frame, frameWidth, frameHeight);
        out.println("the window closed after " + frames + " frames: " + file + " holds the last frame drawn");
        out.flush();
        return file;
    }

    private void ensureFrame(int w, int h) {
        if (w != frameWidth || h != frameHeight) {
            frame = new int[w * h];
            frameWidth = w;
            frameHeight = h;
        }
    }

    private void reportRate(long frames, long wallNs, long drawNs, long showNs) {
        double wallS = wallNs * 1e-9;
        double n = Math.max(1, frames);
        out.println(String.format(Locale.ROOT,
                "frames %d in %.3f s: %.1f frames/s at %dx%d (draw %.2f ms, upload+show %.2f ms per frame)",
                frames, wallS, frames / Math.max(wallS, 1e-9), frameWidth, frameHeight,
                drawNs * 1e-6 / n, showNs * 1e-6 / n));
        out.flush();
    }

    private String title() {
        ViewState v = controls.state();
        String status = source.status();
        return String.format(Locale.ROOT, "holdfast view: %s | t = %.3f Gyr | %.3g Gyr/s %s, %s%s",
                inputName, v.clock().tGyr(), v.clock().rateGyrPerS(),
                v.clock().forward() ? "forward" : "backward", v.clock().playing() ? "playing" : "paused",
                status.isEmpty() ? "" : " | " + status);
    }

    @Override
    public void keyPressed(int key, int mods) {
        Request r = controls.keyPressed(key, mods);
        if (r == Request.QUIT) {
            quitRequested = true;
        } else if (r != Request.NONE) {
            shotRequests.add(r);
        }
    }

    @Override
    public void buttonPressed(int button, double x, double y) {
        controls.buttonPressed(button, x, y);
    }

    @Override
    public void buttonReleased(int button) {
        controls.buttonReleased(button);
    }

    @Override
    public void pointerMoved(double x, double y) {
        controls.pointerMoved(x, y);
    }

    @Override
    public void scrolled(double notches) {
        controls.scrolled(notches);
    }
}
