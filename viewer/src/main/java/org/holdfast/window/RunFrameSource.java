package org.holdfast.window;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.List;

import org.holdfast.render.CameraPose;
import org.holdfast.render.FateEvent;
import org.holdfast.render.FrameRenderer;
import org.holdfast.render.Overlay;
import org.holdfast.render.RenderSettings;
import org.holdfast.render.projection.DomeProjection;
import org.holdfast.render.projection.FlatProjection;
import org.holdfast.render.Camera;
import org.holdfast.window.FrameSource;
import org.holdfast.window.Layer;
import org.holdfast.window.Layers;
import org.holdfast.render.ProjectionKind;
import org.holdfast.window.ViewState;
import org.holdfast.window.input.Bindings;
import org.holdfast.replay.LiveRun;
import org.holdfast.replay.ReplayScene;
import org.holdfast.replay.RunArchive;
import org.joml.Vector3d;

/**
 * The frames of {@code holdfast view} for a run folder: the CPU renderer draws the replayed scene
 * from the window's orbit camera. The window's layers switch the renderer's looks: trails,
 * star and flow tracers, names, the clock (time, scale factor and scale bar), fate events and
 * the key list.
 * The dome preview is a square 180-degree dome master centred in the window. Splats show their
 * nominal brightness from the run's overview distance, as in {@code holdfast render}.
 */
public final class RunFrameSource implements FrameSource {

    private final ReplayScene scene;
    private final AutoCloseable owned;
    private final LiveRun live;
    private final CameraPose pose = new CameraPose();
    private double[] eventTimes;
    private int snapshotsSeen;
    private boolean endSeen;
    private FrameRenderer renderer;
    private String rendererKey = "";

    /**
     * @param owned closed with this source (a temporary run), or null
     */
    public RunFrameSource(RunArchive run, AutoCloseable owned) {
        this(run, owned, null);
    }

    private RunFrameSource(RunArchive run, AutoCloseable owned, LiveRun live) {
        this.scene = new ReplayScene(run);
        this.owned = owned;
        this.live = live;
        this.snapshotsSeen = run.snapshotCount();
        this.eventTimes = eventTimes(run);
    }

    /**
     * The frames of a scenario evolving as it plays: the span grows with each snapshot the run
     * writes, and the live run is closed (cancelled if still going) with this source.
     */
    public static RunFrameSource following(LiveRun live) {
        try {
            return new RunFrameSource(RunArchive.open(live.dir()), live, live);
        } catch (RuntimeException e) {
            live.close();
            throw e;
        }
    }

    /** The run folder as read so far. */
    public RunArchive archive() {
        return scene.run();
    }

    private static double[] eventTimes(RunArchive run) {
        return run.events().stream().mapToDouble(FateEvent::tGyr).sorted().toArray();
    }

    /** Takes in what a live run has written since the last look; cheap when nothing is new. */
    private void catchUp() {
        if (live == null || endSeen) {
            return;
        }
        boolean ended = live.finished();
        int written = live.snapshotsWritten();
        if (written == snapshotsSeen && !ended) {
            return;
        }
        RunArchive run = scene.run();
        run.refresh();
        run.useEventsUntilSummary(live.eventsSoFar());
        snapshotsSeen = written;
        endSeen = ended;
        eventTimes = eventTimes(run);
    }

    /** The pose of the window's orbit camera: at its eye, facing its target, +z towards the top. */
    public static CameraPose poseOf(Camera c, CameraPose dest) {
        Vector3d eye = c.eyeKpc(new Vector3d());
        return dest.lookAt(eye, new Vector3d(c.targetXKpc(), c.targetYKpc(), c.targetZKpc()),
                new Vector3d(0, 0, 1), c.fovDeg());
    }

    /** The renderer's overlays for the window's layers. */
    public static RenderSettings settingsFor(Layers layers, RenderSettings dest) {
        dest.noOverlays();
        dest.overlay(Overlay.NAMES, layers.has(Layer.NAMES));
        dest.overlay(Overlay.EVENTS, layers.has(Layer.EVENTS));
        dest.overlay(Overlay.CLOCK, layers.has(Layer.CLOCK));
        dest.overlay(Overlay.SCALE_FACTOR, layers.has(Layer.CLOCK));
        dest.overlay(Overlay.SCALE_BAR, layers.has(Layer.CLOCK));
        RenderSettings defaults = new RenderSettings();
        dest.trailBrightness(layers.has(Layer.TRAILS) ? defaults.trailBrightness() : 0);
        dest.starBrightness(layers.has(Layer.STARS) ? defaults.starBrightness() : 0);
        dest.flowBrightness(layers.has(Layer.TRACERS) ? defaults.flowBrightness() : 0);
        return dest;
    }

    @Override
    public void draw(ViewState view, int width, int height, int[] argb) {
        catchUp();
        Camera c = view.camera();
        boolean dome = c.projection() == ProjectionKind.DOME;
        int side = Math.min(width, height);
        String key = width + "x" + height + (dome ? "dome" : "flat") + view.layers().bits();
        if (!key.equals(rendererKey)) {
            if (renderer != null) {
                renderer.close();
            }
            // glows as angles, as a film's: the window previews what render draws
            RenderSettings s = settingsFor(view.layers(), new RenderSettings())
                    .referenceDistanceKpc(scene.overviewDistanceKpc())
                    .angularGlow(RenderSettings.DEFAULT_GLOW_DEG, dome ? side / 180.0 : RenderSettings.pxPerDegFlat(height));
            renderer = new FrameRenderer(dome ? new DomeProjection(side) : new FlatProjection(width, height, c.fovDeg()), s);
            rendererKey = key;
        }
        double t = Math.max(startGyr(), Math.min(endGyr(), view.clock().tGyr()));
        BufferedImage img = renderer.render(scene.at(t), poseOf(c, pose));
        if (view.layers().has(Layer.HELP)) {
            paintKeys(img);
        }
        if (dome) {
            Arrays.fill(argb, 0, width * height, 0xFF000000);
            int offset = (width - side) / 2 + (height - side) / 2 * width;
            img.getRGB(0, 0, side, side, argb, offset, width);
        } else {
            img.getRGB(0, 0, width, height, argb, 0, width);
        }
    }

    /** The key list over a darkened panel at the upper right. */
    private static void paintKeys(BufferedImage img) {
        List<String> lines = Bindings.helpLines();
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, Math.max(10, img.getHeight() / 48)));
            FontMetrics fm = g.getFontMetrics();
            int w = lines.stream().mapToInt(fm::stringWidth).max().orElse(0) + 2 * fm.getHeight();
            int h = (lines.size() + 1) * fm.getHeight();
            int x = Math.max(0, img.getWidth() - w - fm.getHeight());
            int y = fm.getHeight();
            g.setColor(new Color(0, 0, 0, 190));
            g.fillRect(x, y, w, h);
            g.setColor(new Color(0xEDE6D6));
            for (int i = 0; i < lines.size(); i++) {
                g.drawString(lines.get(i), x + fm.getHeight(), y + (i + 1) * fm.getHeight());
            }
        } finally {
            g.dispose();
        }
    }

    @Override
    public double startGyr() {
        catchUp();
        return scene.run().earliestGyr();
    }

    @Override
    public double endGyr() {
        catchUp();
        return scene.run().latestGyr();
    }

    @Override
    public double[] eventTimesGyr() {
        catchUp();
        return eventTimes.clone();
    }

    @Override
    public boolean growing() {
        catchUp();
        return live != null && !scene.run().complete() && live.failure() == null;
    }

    @Override
    public double runStartGyr() {
        return live != null ? live.startGyr() : scene.run().firstGyr();
    }

    @Override
    public double runEndGyr() {
        return live != null && growing() ? live.plannedEndGyr() : scene.run().lastGyr();
    }

    @Override
    public void awaitGyr(double tGyr) {
        if (live != null) {
            live.awaitGyr(tGyr);
            catchUp();
        }
    }

    @Override
    public String status() {
        return live == null ? "" : live.status();
    }

    @Override
    public List<String> memberNames() {
        return scene.run().initialNames();
    }

    @Override
    public boolean memberCentreKpc(int index, double tGyr, double[] xyzKpc) {
        double t = Math.max(startGyr(), Math.min(endGyr(), tGyr));
        return scene.centreOf(memberNames().get(index), t, xyzKpc);
    }

    @Override
    public double overviewDistanceKpc() {
        return scene.overviewDistanceKpc();
    }

    @Override
    public void discard() {
        if (live == null) {
            close();
            return;
        }
        closeRenderer();
        live.discard();
    }

    @Override
    public void close() {
        closeRenderer();
        if (owned != null) {
            try {
                owned.close();
            } catch (Exception e) {
                // nothing useful to do about a temporary folder that would not go
            }
        }
    }

    private void closeRenderer() {
        if (renderer != null) {
            renderer.close();
            renderer = null;
        }
    }
}
