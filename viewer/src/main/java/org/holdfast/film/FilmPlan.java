package org.holdfast.film;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.holdfast.replay.RunArchive;
import org.holdfast.window.RunFrameSource;
import org.holdfast.schema.Node;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.render.CameraSpec;
import org.holdfast.render.ProjectionKind;

/**
 * Decides the film {@code holdfast render} makes. The {@code [film]} table comes from the film
 * file given with {@code --film}, else from the run's scenario; the command-line options
 * replace its keys; a scenario without a {@code [film]} table gets a default film: 20 s at 30
 * frames per second, flat 1920x1080, a quarter turn of an orbit around the group, and a clock
 * that runs over the whole run, linearly, or as a countdown when the run stopped before a rip.
 * Every option is checked here and reported under its own name.
 */
public final class FilmPlan {

    /** Longest film accepted, frames (the frame file names have six digits). */
    public static final int MAX_FRAMES = 999_999;

    /** Heap a frame needs per pixel, generously: linear light (12 bytes), the image (4), the splat lists. */
    static final long BYTES_PER_PIXEL = 40;

    private static final Pattern SIZE = Pattern.compile("\\s*(\\d{1,6})\\s*(?:[xX]\\s*(\\d{1,6})\\s*)?");

    /**
     * What the command line said about the film; null fields were not given.
     *
     * @param still whether one still is made (any frame size) rather than a film (even sizes)
     */
    public record Options(String projection, String size, Integer fps, Double seconds, Double fromGyr,
            Double toGyr, Path filmFile, String camera, boolean still) {
    }

    private FilmPlan() {
    }

    /**
     * The film for a run, with the options applied.
     *
     * @param scenarioCopy the run's scenario (its {@code [film]} table is used when there is no --film)
     * @throws ScenarioException naming the option, or the file, line and key, for anything wrong
     */
    public static FilmSpec resolve(Options o, RunArchive run, Path scenarioCopy) {
        Overrides overrides = Overrides.none();
        String view = o.projection();
        if (view != null) {
            if (!FilmReader.VIEWS.contains(view)) {
                throw new ScenarioException("--projection", null, "unknown projection '" + view
                        + "'; choose one of: " + String.join(", ", FilmReader.VIEWS));
            }
            overrides.put("film.view", view);
        }
        Node root = filmRoot(o, run, scenarioCopy, overrides);
        Node film = root.table("film");
        String effectiveView = view != null ? view : film.has("view") ? film.string("view") : "flat";
        if (o.size() != null) {
            int[] wh = size(o.size(), effectiveView, o.still());
            overrides.put("film.frame_px", "[" + wh[0] + ", " + wh[1] + "]");
        } else if (view != null && film.hasInFile("frame_px")) {
            int[] wh = defaultSize(view);
            overrides.put("film.frame_px", "[" + wh[0] + ", " + wh[1] + "]");
        }
        if (o.fps() != null) {
            if (o.fps() < 1 || o.fps() > 240) {
                throw new ScenarioException("--fps", null, "must be between 1 and 240 frames per second (got " + o.fps() + ")");
            }
            overrides.put("film.frame_rate", Integer.toString(o.fps()));
        }
        if (o.seconds() != null) {
            if (!(o.seconds() > 0) || !Double.isFinite(o.seconds())) {
                throw new ScenarioException("--seconds", null, "must be a positive number of seconds (got " + o.seconds() + ")");
            }
            overrides.put("film.length_s", plain(o.seconds()));
        } else if (!film.has("length_s")) {
            overrides.put("film.length_s", "20");
        }
        putTime(overrides, "film.from_gyr", time("--from-gyr", o.fromGyr(), run,
                film.has("from_gyr") ? Double.NaN : run.firstGyr()));
        putTime(overrides, "film.to_gyr", time("--to-gyr", o.toGyr(), run,
                film.has("to_gyr") ? Double.NaN : run.lastGyr()));
        FilmSpec spec = FilmReader.read(root, o.still(), run.initialNames(),
                new org.holdfast.replay.ReplayScene(run).overviewDistanceKpc());
        checkWithinRun(spec, run, film);
        if (spec.frameCount() > MAX_FRAMES) {
            String where = o.seconds() != null ? "--seconds" : o.fps() != null ? "--fps" : film.where("length_s");
            throw new ScenarioException(where, null, Math.round(spec.lengthS() * spec.frameRate()) + " frames is more than the " + MAX_FRAMES + " a film may have");
        }
        long needBytes = BYTES_PER_PIXEL * spec.widthPx() * (long) spec.heightPx();
        if (needBytes > 0.8 * Runtime.getRuntime().maxMemory()) {
            String where = o.size() != null ? "--size" : film.where("frame_px");
            throw new ScenarioException(where, null, String.format(java.util.Locale.ROOT,
                    "%dx%d frames need about %.1f GB, more than the %.1f GB the JVM may use; choose a smaller size"
                            + " or give java a larger -Xmx", spec.widthPx(), spec.heightPx(), needBytes / 1e9,
                    Runtime.getRuntime().maxMemory() / 1e9));
        }
        if (o.camera() != null) {
            CameraSpec cam;
            try {
                cam = CameraSpec.parse(o.camera());
            } catch (IllegalArgumentException e) {
                throw new ScenarioException("--camera", null, e.getMessage());
            }
            var c = cam.camera(ProjectionKind.FLAT);
            CameraTrack fixed = (s, dest) -> RunFrameSource.poseOf(c, dest);
            spec = spec.withCamera(fixed, null);
        }
        return spec;
    }

    /**
     * The checks that need neither the run nor the film table, so that a scenario is not evolved
     * only to hear that an option is malformed.
     */
    public static void precheck(Options o) {
        if (o.projection() != null && !FilmReader.VIEWS.contains(o.projection())) {
            throw new ScenarioException("--projection", null, "unknown projection '" + o.projection()
                    + "'; choose one of: " + String.join(", ", FilmReader.VIEWS));
        }
        if (o.size() != null) {
            size(o.size(), o.projection() != null ? o.projection() : "any", o.still());
        }
        if (o.fps() != null && (o.fps() < 1 || o.fps() > 240)) {
            throw new ScenarioException("--fps", null, "must be between 1 and 240 frames per second (got " + o.fps() + ")");
        }
        if (o.seconds() != null && !(o.seconds() > 0 && Double.isFinite(o.seconds()))) {
            throw new ScenarioException("--seconds", null, "must be a positive number of seconds (got " + o.seconds() + ")");
        }
        if (o.camera() != null) {
            try {
                CameraSpec.parse(o.camera());
            } catch (IllegalArgumentException e) {
                throw new ScenarioException("--camera", null, e.getMessage());
            }
        }
    }

    /** The TOML root holding the [film] table: the film file, the scenario, or the default film. */
    private static Node filmRoot(Options o, RunArchive run, Path scenarioCopy, Overrides overrides) {
        if (o.filmFile() != null) {
            if (!Files.isRegularFile(o.filmFile())) {
                throw new ScenarioException("--film", null, "no such film file: " + o.filmFile());
            }
            Node root = ScenarioFile.open(o.filmFile(), overrides);
            if (root.table("film") == null) {
                throw new ScenarioException(o.filmFile() + ":1", null, "no [film] table in this film file");
            }
            return root;
        }
        if (scenarioCopy != null && Files.isRegularFile(scenarioCopy)) {
            Node root = ScenarioFile.open(scenarioCopy, overrides);
            if (root.table("film") != null) {
                return root;
            }
        }
        return ScenarioFile.parse(Path.of("(default film)"), defaultFilm(run), overrides, NumberReader.PLAIN);
    }

    /** The film a run gets when nobody wrote one. */
    static String defaultFilm(RunArchive run) {
        double d = new org.holdfast.replay.ReplayScene(run).overviewDistanceKpc();
        double elevation = Math.toRadians(20);
        boolean countdown = run.stoppedBeforeRip() && Double.isFinite(run.ripGyr()) && run.ripGyr() > run.latestGyr();
        StringBuilder b = new StringBuilder();
        b.append("[film]\nlength_s = 20\nframe_rate = 30\nview = \"flat\"\ncamera = \"orbit\"\n");
        b.append("clock = \"").append(countdown ? "countdown" : "linear").append("\"\n");
        b.append("from_gyr = ").append(plain(run.firstGyr())).append('\n');
        b.append("to_gyr = ").append(plain(run.lastGyr())).append('\n');
        if (countdown) {
            b.append("final_gyr = ").append(plain(run.ripGyr())).append('\n');
            // near a rip the members fly far apart, the centre of mass among them: ride with the first
            if (!run.initialNames().isEmpty()) {
                String name = run.initialNames().get(0).replace("\\", "\\\\").replace("\"", "\\\"");
                b.append("follow = \"").append(name).append("\"\n");
            }
        }
        b.append("[film.orbit]\ncentre_kpc = [0, 0, 0]\nup = [0, 0, 1]\n");
        b.append("radius_kpc = ").append(plain(d * Math.cos(elevation))).append('\n');
        b.append("rise_kpc = ").append(plain(d * Math.sin(elevation))).append('\n');
        b.append("turns = 0.25\nfov_deg = 50\n");
        return b.toString();
    }

    /**
     * The size option: WxH, or one number for a square dome frame; view "any" skips the shape
     * checks, and a still may have odd sides.
     */
    static int[] size(String text, String view, boolean still) {
        Matcher m = SIZE.matcher(text);
        if (!m.matches()) {
            throw new ScenarioException("--size", null, "expected WIDTHxHEIGHT in pixels (a dome: one number), e.g. "
                    + "1920x1080 or 2048; got '" + text + "'");
        }
        int w = Integer.parseInt(m.group(1));
        int h = m.group(2) == null ? ("panorama".equals(view) ? w / 2 : w) : Integer.parseInt(m.group(2));
        if (m.group(2) == null && !"dome".equals(view) && !"panorama".equals(view) && !"any".equals(view)) {
            throw new ScenarioException("--size", null, "a " + view + " frame needs WIDTHxHEIGHT (got '" + text.trim() + "')");
        }
        if (w < 2 || h < 2 || w > 16384 || h > 16384) {
            throw new ScenarioException("--size", null, "each side must be 2 to 16384 pixels (got " + w + "x" + h + ")");
        }
        if (!still && (w % 2 != 0 || h % 2 != 0)) {
            throw new ScenarioException("--size", null, FilmReader.EVEN + " (got " + w + "x" + h + ")");
        }
        if ("dome".equals(view) && w != h) {
            throw new ScenarioException("--size", null, "a dome frame is square (got " + w + "x" + h + ")");
        }
        if ("panorama".equals(view) && w != 2 * h) {
            throw new ScenarioException("--size", null, "a panorama is twice as wide as high (got " + w + "x" + h + ")");
        }
        return new int[] {w, h};
    }

    private static int[] defaultSize(String view) {
        return switch (view) {
            case "dome" -> new int[] {2048, 2048};
            case "panorama" -> new int[] {4096, 2048};
            default -> new int[] {1920, 1080};
        };
    }

    /** An option's time checked against the run; the fallback (NaN: leave the file's) when not given. */
    private static double time(String option, Double given, RunArchive run, double fallback) {
        if (given == null) {
            return fallback;
        }
        checkTime(option, given, run);
        return given;
    }

    /** @throws ScenarioException naming {@code option} when t lies outside the run */
    public static void checkTime(String option, double t, RunArchive run) {
        if (!(t >= run.earliestGyr() && t <= run.latestGyr())) {
            throw new ScenarioException(option, null, shown(t) + " Gyr lies outside this run, which spans "
                    + shown(run.earliestGyr()) + " to " + shown(run.latestGyr()) + " Gyr");
        }
    }

    private static void checkWithinRun(FilmSpec spec, RunArchive run, Node film) {
        double slack = 1e-9 * Math.max(1, Math.abs(run.latestGyr() - run.earliestGyr()));
        String[] keys = {"from_gyr", "to_gyr"};
        double[] ends = {spec.clock().simGyr(0), spec.clock().simGyr(spec.clock().endS())};
        for (int k = 0; k < 2; k++) {
            double t = ends[k];
            if (t < run.earliestGyr() - slack || t > run.latestGyr() + slack) {
                throw film.error(keys[k], shown(t) + " Gyr lies outside the run, which spans " + shown(run.earliestGyr())
                        + " to " + shown(run.latestGyr()) + " Gyr");
            }
        }
    }

    private static void putTime(Overrides o, String key, double t) {
        if (!Double.isNaN(t)) {
            o.put(key, plain(t));
        }
    }

    /** A time for messages: six significant digits, no trailing zeros. */
    static String shown(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    static String plain(double v) {
        if (!Double.isFinite(v)) {
            return "NaN";
        }
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
