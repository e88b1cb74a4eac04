package org.holdfast.viewer;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.holdfast.window.FrameSources.CannotOpenException;
import org.holdfast.window.FrameSources.SourceOpener;
import org.holdfast.window.gl.GlWindow;
import org.holdfast.window.gl.NoDisplayException;
import org.holdfast.window.gl.ViewLoop;
import org.holdfast.window.input.Bindings;
import org.holdfast.window.Controls;
import org.holdfast.render.ProjectionKind;
import org.holdfast.render.Camera;
import org.holdfast.render.CameraSpec;
import org.holdfast.window.Clock;
import org.holdfast.window.FrameSize;
import org.holdfast.window.FrameSource;
import org.holdfast.window.FrameSources;
import org.holdfast.window.ViewState;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code holdfast view}: the interactive window, also scriptable for rehearsals and tests. */
@Command(name = "view",
        mixinStandardHelpOptions = true,
        header = "Watch and steer a run in a window.",
        description = {
            "Opens a window on a finished run (its folder of snapshots) or on a scenario,",
            "which evolves on a background thread as it plays: the clock waits where the run",
            "has got to, and everything already evolved can be replayed both ways. The run",
            "goes to a temporary folder, removed on quitting, or to --out DIR to keep it.",
            "Drag to turn the camera, wheel to zoom, H in the window (or --keys) for the",
            "keys. With --frames it shows that many frames and quits: for rehearsals and tests.",
            "",
            "Examples:",
            "  holdfast evolve scenarios/hollin-group.toml    # writes hollin-group-run/",
            "  holdfast view hollin-group-run",
            "  holdfast view scenarios/hollin-group.toml --play --out hollin-live",
            "  holdfast view hollin-group-run --at-gyr 4.2 --camera 40,25,350 \\",
            "      --frames 1 --screenshot hollin-4.2.png",
            "  holdfast view --keys"
        })
public final class ViewCommand implements Callable<Integer> {

    /** Exit code for input that cannot be used, or no display. */
    static final int EXIT_BAD_INPUT = 2;

    @Parameters(index = "0", arity = "0..1", paramLabel = "RUN_DIR|SCENARIO",
            description = "A run folder to replay or a scenario (.toml) to evolve as it plays.")
    Path input;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "For a scenario: override a value by its dotted key (repeatable), as in holdfast evolve.")
    List<String> sets = new ArrayList<>();

    @Option(names = "--out", paramLabel = "DIR",
            description = "For a scenario: keep its run folder here (must not exist or be empty) instead of a temporary one.")
    Path outDir;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1280x720",
            description = "Window size in pixels (default ${DEFAULT-VALUE}).")
    String size;

    @Option(names = "--frames", paramLabel = "N",
            description = "Quit after N frames (scripted mode).")
    Long frames;

    @Option(names = "--screenshot", paramLabel = "FILE",
            description = "Write the last frame shown to this PNG, read back from the window.")
    Path screenshot;

    @Option(names = "--large-shot", paramLabel = "WxH",
            description = "Size of screenshots taken with Shift+P (default: twice the window).")
    String largeShot;

    @Option(names = "--shots-dir", paramLabel = "DIR", defaultValue = ".",
            description = "Folder for screenshots taken with P and Shift+P (default: here).")
    Path shotsDir;

    @Option(names = "--camera", paramLabel = "YAW,PITCH,DIST[,FOV]",
            description = "Start camera: yaw and pitch in degrees, distance in kpc, optional field "
                    + "of view in degrees, e.g. 30,15,800.")
    String camera;

    @Option(names = "--at-gyr", paramLabel = "T",
            description = "Start the clock at T Gyr (default: the run's start); a scenario is shown once its run gets there.")
    Double atGyr;

    @Option(names = "--play", description = "Start with the clock running.")
    boolean play;

    @Option(names = "--rate", paramLabel = "GYR_PER_S",
            description = "Clock speed in Gyr per second (default: the whole run in 30 s).")
    Double rateGyrPerS;

    @Option(names = "--frame-gyr", paramLabel = "DT",
            description = "While playing, step the clock DT Gyr per frame instead of following the "
                    + "wall clock (repeatable rehearsals).")
    Double frameGyr;

    @Option(names = "--whole-screen", description = "Start filling the screen (W switches back and forth).")
    boolean wholeScreen;

    @Option(names = "--dome", description = "Start in the dome preview instead of the flat view.")
    boolean dome;

    @Option(names = "--fps-report", description = "Print frames per second and time per frame at the end.")
    boolean fpsReport;

    @Option(names = "--keys", description = "Print the key list and exit.")
    boolean keys;

    @Spec
    CommandSpec spec;

    private final SourceOpener opener;

    /** The command with the real sources. */
    public ViewCommand() {
        this(FrameSources::open);
    }

    /** The command with sources from {@code opener} (tests, embedding). */
    public ViewCommand(SourceOpener opener) {
        this.opener = opener;
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (keys) {
            Bindings.helpLines().forEach(out::println);
            out.flush();
            return 0;
        }
        ViewLoop.Settings settings;
        CameraSpec cam;
        try {
            settings = settings();
            cam = camera == null ? null : CameraSpec.parse(camera);
        } catch (BadOption e) {
            return fail(e.getMessage());
        } catch (IllegalArgumentException e) {
            return fail("--camera: " + e.getMessage());
        }
        if (input == null) {
            return fail("RUN_DIR|SCENARIO: give a run folder or a scenario file (or --keys)");
        }
        if (!Files.exists(input)) {
            return fail("RUN_DIR|SCENARIO: '" + input + "' does not exist");
        }
        boolean scenario = !Files.isDirectory(input) && input.getFileName().toString().endsWith(".toml");
        if (!scenario && (!sets.isEmpty() || outDir != null)) {
            return fail((outDir != null ? "--out" : "--set") + ": only for a scenario, and '" + input
                    + "' is a run folder");
        }
        FrameSource opened = null;
        try (FrameSource source = opener.open(input, sets, outDir)) {
            opened = source;
            ViewState start;
            try {
                start = startView(source, cam);
            } catch (BadOption e) {
                return fail(source, e.getMessage());
            }
            if (!GlWindow.displayNamed()) {
                return fail(source, GlWindow.NO_DISPLAY + "; use holdfast render to make pictures without a window");
            }
            if (scenario && source.growing()) {
                out.println("evolving " + input + " as it plays, into "
                        + (outDir != null ? outDir : "a temporary run folder (removed on quitting)"));
                if (atGyr != null) {
                    out.println("waiting for the run to reach " + plain(atGyr) + " Gyr ...");
                }
                out.flush();
            }
            if (atGyr != null) {
                source.awaitGyr(atGyr);
                if (!(atGyr >= source.startGyr() && atGyr <= source.endGyr())) {
                    return fail(source, "--at-gyr: " + plain(atGyr) + " was not reached; " + source.status());
                }
            }
            Controls controls = new Controls(source, start);
            ViewLoop loop = new ViewLoop(source, controls, settings, input.getFileName().toString(), out);
            if (frames == null) {
                out.println("Press H in the window for the keys (or run holdfast view --keys).");
                out.flush();
            }
            ViewLoop.Outcome o = loop.run();
            if (screenshot != null && o.screenshot() != null && !o.closedEarly()) {
                out.println("saved " + o.screenshot());
            }
            if (scenario) {
                source.close(); // stops a run still going, so the line below says where it ended
                out.println(source.status() + (outDir != null ? "; run folder " + outDir : ""));
            }
            out.flush();
            return 0;
        } catch (CannotOpenException e) {
            return fail(e.getMessage());
        } catch (NoDisplayException e) {
            return fail(opened, e.getMessage() + "; use holdfast render to make pictures without a window");
        }
    }

    private ViewLoop.Settings settings() throws BadOption {
        FrameSize window = size("--size", size);
        if (frames != null && frames < 1) {
            throw new BadOption("--frames: must be at least 1, got " + frames);
        }
        FrameSize big = largeShot == null
                ? new FrameSize(Math.min(FrameSize.MAX_SIDE, 2 * window.width()),
                        Math.min(FrameSize.MAX_SIDE, 2 * window.height()))
                : size("--large-shot", largeShot);
        if (screenshot != null && !screenshot.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png")) {
            throw new BadOption("--screenshot: '" + screenshot + "' must end in .png");
        }
        if (screenshot != null && Files.isDirectory(screenshot)) {
            throw new BadOption("--screenshot: '" + screenshot + "' is a folder");
        }
        if (Files.exists(shotsDir) && !Files.isDirectory(shotsDir)) {
            throw new BadOption("--shots-dir: '" + shotsDir + "' is not a folder");
        }
        if (rateGyrPerS != null && !(rateGyrPerS >= Clock.MIN_RATE_GYR_PER_S && rateGyrPerS <= Clock.MAX_RATE_GYR_PER_S)) {
            throw new BadOption("--rate: " + rateGyrPerS + " Gyr/s outside " + Clock.MIN_RATE_GYR_PER_S
                    + " to " + Clock.MAX_RATE_GYR_PER_S);
        }
        if (frameGyr != null && !(frameGyr > 0 && Double.isFinite(frameGyr))) {
            throw new BadOption("--frame-gyr: must be a positive number of Gyr, got " + frameGyr);
        }
        return new ViewLoop.Settings(window, frames == null ? 0 : frames, screenshot, big, shotsDir, fpsReport,
                frameGyr == null ? 0.0 : frameGyr, wholeScreen);
    }

    private static FrameSize size(String option, String text) throws BadOption {
        try {
            return FrameSize.parse(text);
        } catch (IllegalArgumentException e) {
            throw new BadOption(option + ": " + e.getMessage());
        }
    }

    /**
     * The first view: the camera asked for (or an overview), the clock where asked. A run still
     * evolving starts at its beginning, running towards its end (the caller waits for a run to
     * reach --at-gyr).
     */
    private ViewState startView(FrameSource source, CameraSpec cam) throws BadOption {
        boolean growing = source.growing();
        double from = growing ? source.runStartGyr() : source.startGyr();
        double to = growing ? source.runEndGyr() : source.endGyr();
        double lo = Math.min(from, to);
        double hi = Math.max(from, to);
        double t = from;
        if (atGyr != null) {
            if (!(atGyr >= lo && atGyr <= hi)) {
                throw new BadOption("--at-gyr: " + plain(atGyr) + " lies outside this run, which spans "
                        + shown(lo, false) + " to " + shown(hi, true) + " Gyr");
            }
            t = atGyr;
        }
        double rate = rateGyrPerS != null ? rateGyrPerS
                : Math.max(Clock.MIN_RATE_GYR_PER_S, Math.min(Clock.MAX_RATE_GYR_PER_S, (hi - lo) / 30.0));
        ProjectionKind p = dome ? ProjectionKind.DOME : ProjectionKind.FLAT;
        Camera c = cam != null ? cam.camera(p)
                : new Camera(0, 0, 0, clampDistance(source.overviewDistanceKpc()), 30, 20, Camera.DEFAULT_FOV_DEG, p);
        return ViewState.of(c, new Clock(t, rate, !growing || to >= from, play));
    }

    private static String plain(double v) {
        return Double.isFinite(v) ? java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString() : Double.toString(v);
    }

    /** A span end for messages: six significant digits, rounded inwards so the span shown holds. */
    private static String shown(double v, boolean upper) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        java.math.RoundingMode inwards = upper ? java.math.RoundingMode.FLOOR : java.math.RoundingMode.CEILING;
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6, inwards)).stripTrailingZeros()
                .toPlainString();
    }

    private static double clampDistance(double d) {
        return Math.max(Camera.MIN_DISTANCE_KPC, Math.min(Camera.MAX_DISTANCE_KPC, d));
    }

    /**
     * As {@link #fail(String)}, once the source is open: a scenario's run is stopped and what it
     * wrote into --out removed first, so bad input leaves nothing behind.
     */
    private int fail(FrameSource source, String message) {
        if (source != null) {
            source.discard();
        }
        return fail(message);
    }

    private int fail(String message) {
        PrintWriter err = spec.commandLine().getErr();
        err.println("holdfast view: " + message);
        err.flush();
        return EXIT_BAD_INPUT;
    }

    /** A bad option value, reported as one line. */
    private static final class BadOption extends Exception {
        private static final long serialVersionUID = 1L;

        BadOption(String message) {
            super(message);
        }
    }
}
