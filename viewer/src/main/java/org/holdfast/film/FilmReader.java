package org.holdfast.film;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.holdfast.render.Overlay;
import org.holdfast.render.Stretch;
import org.holdfast.render.projection.DomeProjection;
import org.holdfast.schema.Node;
import org.holdfast.schema.ScenarioException;
import org.joml.Vector3d;

/**
 * Reads the {@code [film]} table of a scenario file. Every problem is a
 * {@link ScenarioException} naming the file, line and key. The keys:
 *
 * <pre>
 * [film]
 * length_s = 40            # required, film length in seconds
 * frame_rate = 30          # frames per second, 1..240
 * view = "flat"            # flat | dome | panorama
 * frame_px = [1920, 1080]  # dome: square [n, n]; panorama: [2h, h]
 * dome_span_deg = 180      # dome only, up to 240
 * dome_tilt_deg = 0        # dome only: zenith above the view direction, -90..90
 * stretch = "asinh"        # asinh | linear
 * asinh_gain = 0.4         # alpha in asinh(alpha Q I)/Q
 * asinh_softening = 9      # Q
 * linear_gain = 1
 * clock = "linear"         # linear | countdown (log of the time left before final_gyr)
 * from_gyr = 0             # simulated time at the first frame
 * to_gyr = 40              # required, simulated time at the last frame
 * final_gyr = 41.5         # countdown only: the rip, or a horizon of your choice
 * camera = "orbit"        # orbit (the default) | keyframes | approach
 * follow = "Aldermere"     # optional: the camera's track is relative to this member's centre
 * text_deg = 3             # dome: height of the clock's first line, degrees of the dome
 * text_placement = "unidirectional"   # dome: unidirectional (front sweet spot) | concentric (zenith)
 * glow_deg = 0.0247        # sigma of a star's glow, degrees (galaxy centres 3.2 times it)
 * ladder = false           # the rip ladder's rungs as events
 * png_bits = 8             # 8 | 16 bits per channel
 * overlay_layer = false    # text and marks into overlay_NNNNNN.png (RGBA) beside each frame
 *
 * [film.show]              # overlays and trails, each true by default
 * clock = true, scale_factor = true, scale_bar = true, names = true, events = true, trails = true
 *
 * [film.orbit]             # camera = "orbit"; every key has a default
 * centre_kpc = [0, 0, 0], up = [0, 0, 1], radius_kpc = 800, rise_kpc = 200, turns = 0.25, fov_deg = 50
 *   (radius and rise default to the run's overview distance seen from 20 degrees up)
 *
 * [film.approach]          # camera = "approach"
 * start_kpc = [...], end_kpc = [...], look_at_kpc = [0, 0, 0], up = [0, 0, 1], fov_deg = 50
 *
 * [[film.keyframe]]        # camera = "keyframes", at least one
 * at_s = 0, eye_kpc = [...], look_at_kpc = [0, 0, 0], up = [0, 0, 1], fov_deg = 50
 * </pre>
 */
public final class FilmReader {

    static final List<String> VIEWS = List.of("flat", "dome", "panorama");
    static final List<String> STRETCHES = List.of("asinh", "linear");
    static final List<String> CLOCKS = List.of("linear", "countdown");
    static final List<String> CAMERAS = List.of("keyframes", "orbit", "approach");
    /** Why a film's frames have even sides: they are a video's input (yuv420p halves both sides). */
    static final String EVEN = "a film's frames need even sides for video encoders; a --still may be any size";

    private FilmReader() {
    }

    /**
     * Reads {@code [film]} from a scenario's root table.
     *
     * @throws ScenarioException if the table is missing or any key is wrong
     */
    public static FilmSpec read(Node root) {
        return read(root, false, null, DEFAULT_OVERVIEW_KPC);
    }

    /** The overview distance of an orbit when no run says how large the group is, kpc. */
    static final double DEFAULT_OVERVIEW_KPC = 1000;

    /**
     * As {@link #read(Node)}; {@code still} lifts the even sizes a video needs, for one PNG, and
     * {@code members} (or null) are the names {@code follow} may take.
     *
     * @throws ScenarioException if the table is missing or any key is wrong
     */
    static FilmSpec read(Node root, boolean still, List<String> members, double overviewKpc) {
        Node film = root.requireTable("film");
        film.allowOnly("length_s", "frame_rate", "view", "frame_px", "dome_span_deg", "dome_tilt_deg", "stretch",
                "asinh_gain", "asinh_softening", "linear_gain", "clock", "from_gyr", "to_gyr", "final_gyr", "camera",
                "show", "orbit", "approach", "keyframe", "follow", "text_deg", "text_placement", "glow_deg", "ladder",
                "png_bits", "overlay_layer");
        double lengthS = film.positive("length_s");
        int rate = (int) film.integer("frame_rate", 1, 240, 30);
        String view = film.choice("view", VIEWS, "flat");
        int[] size = frameSize(film, view, still);
        double span = film.number("dome_span_deg", 180);
        if (!(span > 0 && span <= DomeProjection.MAX_SPAN_DEG)) {
            throw film.error("dome_span_deg", "must be in (0, 240] degrees (got " + span + ")");
        }
        double tilt = film.number("dome_tilt_deg", 0);
        if (!(tilt >= -90 && tilt <= 90)) {
            throw film.error("dome_tilt_deg", "must be in [-90, 90] degrees (got " + tilt + ")");
        }
        Stretch stretch = "linear".equals(film.choice("stretch", STRETCHES, "asinh"))
                ? Stretch.linear(film.positive("linear_gain", 1))
                : Stretch.asinh(film.positive("asinh_gain", 0.4), film.positive("asinh_softening", 9));
        FilmClock clock = clock(film, FilmSpec.lastFrameS(lengthS, rate));
        CameraTrack camera = camera(film, lengthS, overviewKpc);
        String follow = film.has("follow") ? film.string("follow") : null;
        if (follow != null && members != null && !members.contains(follow)) {
            throw film.error("follow", "no member named '" + follow + "' in this run; its members: "
                    + String.join(", ", members));
        }
        return new FilmSpec(lengthS, rate, view, size[0], size[1], span, tilt, stretch, clock, camera, overlays(film),
                follow, look(film));
    }

    private static FilmLook look(Node film) {
        FilmLook d = FilmLook.standard();
        double text = film.number("text_deg", d.textDeg());
        if (!(text >= 0.5 && text <= 20)) {
            throw film.error("text_deg", "must be 0.5 to 20 degrees of the dome (got " + fmt(text) + ")");
        }
        String placement = film.choice("text_placement", FilmLook.PLACEMENTS, d.placement());
        double glow = film.number("glow_deg", d.glowDeg());
        if (!(glow > 0 && glow <= 5)) {
            throw film.error("glow_deg", "must be above 0 and at most 5 degrees (got " + fmt(glow) + ")");
        }
        long bits = film.integer("png_bits", 8, 16, 8);
        if (bits != 8 && bits != 16) {
            throw film.error("png_bits", "must be 8 or 16 (got " + bits + ")");
        }
        Node show = film.table("show");
        boolean trails = show == null || show.bool("trails", true);
        return new FilmLook(text, placement, glow, trails, film.bool("ladder", false), bits == 16,
                film.bool("overlay_layer", false));
    }

    private static int[] frameSize(Node film, String view, boolean still) {
        int[] def = switch (view) {
            case "dome" -> new int[] {2048, 2048};
            case "panorama" -> new int[] {4096, 2048};
            default -> new int[] {1920, 1080};
        };
        if (!film.has("frame_px")) {
            return def;
        }
        double[] v = film.vector("frame_px", 2);
        int w = (int) v[0];
        int h = (int) v[1];
        if (w != v[0] || h != v[1] || w < 2 || h < 2 || w > 16384 || h > 16384) {
            throw film.error("frame_px", "expected two whole numbers in [2, 16384] (got " + fmt(v[0]) + ", " + fmt(v[1]) + ")");
        }
        if (!still && (w % 2 != 0 || h % 2 != 0)) {
            throw film.error("frame_px", EVEN + " (got " + w + " x " + h + ")");
        }
        if ("dome".equals(view) && w != h) {
            throw film.error("frame_px", "a dome frame is square (got " + w + " x " + h + ")");
        }
        if ("panorama".equals(view) && w != 2 * h) {
            throw film.error("frame_px", "a panorama frame is twice as wide as high (got " + w + " x " + h + ")");
        }
        return new int[] {w, h};
    }

    /** The clock, from from_gyr on the first frame to to_gyr on the last, {@code endS} later. */
    private static FilmClock clock(Node film, double endS) {
        String kind = film.choice("clock", CLOCKS, "linear");
        double from = film.number("from_gyr", 0);
        double to = film.number("to_gyr");
        if (to == from) {
            throw film.error("to_gyr", "must differ from from_gyr (" + fmt(from) + ")");
        }
        if ("linear".equals(kind)) {
            if (film.hasInFile("final_gyr")) {
                throw film.error("final_gyr", "only used with clock = \"countdown\"");
            }
            return FilmClock.linear(endS, from, to);
        }
        double fin = film.number("final_gyr");
        if (!(fin > Math.max(from, to))) {
            throw film.error("final_gyr", "must come after from_gyr and to_gyr (got " + fmt(fin) + ")");
        }
        return FilmClock.countdown(endS, from, to, fin);
    }

    private static CameraTrack camera(Node film, double lengthS, double overviewKpc) {
        // without camera: whatever camera table is there, else the default orbit
        String implied = film.hasInFile("keyframe") ? "keyframes" : film.hasInFile("approach") ? "approach" : "orbit";
        String kind = film.choice("camera", CAMERAS, implied);
        for (String other : List.of("orbit", "approach", "keyframe")) {
            boolean mine = other.equals(kind) || ("keyframe".equals(other) && "keyframes".equals(kind));
            if (!mine && film.hasInFile(other)) {
                throw film.error(other, "not used with camera = \"" + kind + "\"");
            }
        }
        return switch (kind) {
            case "orbit" -> orbit(film.table("orbit"), lengthS, overviewKpc);
            case "approach" -> approach(film.requireTable("approach"), lengthS);
            default -> keyframes(film);
        };
    }

    /** An orbit; a missing table or key takes the default film's: 20 degrees up, a quarter turn. */
    private static CameraTrack orbit(Node n, double lengthS, double overviewKpc) {
        double elevation = Math.toRadians(20);
        double radius0 = overviewKpc * Math.cos(elevation);
        double rise0 = overviewKpc * Math.sin(elevation);
        if (n == null) {
            return new OrbitTrack(new Vector3d(), new Vector3d(0, 0, 1), radius0, rise0, 0.25, lengthS, 50);
        }
        n.allowOnly("centre_kpc", "up", "radius_kpc", "rise_kpc", "turns", "fov_deg");
        Vector3d centre = vec(n, "centre_kpc", new Vector3d());
        Vector3d up = direction(n, "up");
        double radius = n.positive("radius_kpc", radius0);
        double rise = n.number("rise_kpc", n.has("radius_kpc") ? 0 : rise0);
        double turns = n.number("turns", 0.25);
        return new OrbitTrack(centre, up, radius, rise, turns, lengthS, fov(n));
    }

    private static CameraTrack approach(Node n, double lengthS) {
        n.allowOnly("start_kpc", "end_kpc", "look_at_kpc", "up", "fov_deg");
        Vector3d start = vec(n, "start_kpc", null);
        Vector3d end = vec(n, "end_kpc", null);
        Vector3d target = vec(n, "look_at_kpc", new Vector3d());
        Vector3d up = direction(n, "up");
        double fov = fov(n);
        checkView(n, "start_kpc", start, target, up);
        checkView(n, "end_kpc", end, target, up);
        return new ApproachTrack(start, end, target, up, lengthS, fov);
    }

    private static CameraTrack keyframes(Node film) {
        List<Node> nodes = film.tables("keyframe", null);
        if (nodes.isEmpty()) {
            throw film.error(null, "camera = \"keyframes\" needs at least one [[film.keyframe]]");
        }
        List<Keyframe> keys = new ArrayList<>();
        List<Double> seen = new ArrayList<>();
        for (Node k : nodes) {
            k.allowOnly("at_s", "eye_kpc", "look_at_kpc", "up", "fov_deg");
            double at = k.number("at_s");
            if (!(at >= 0)) {
                throw k.error("at_s", "must be >= 0 (got " + fmt(at) + ")");
            }
            if (seen.contains(at)) {
                throw k.error("at_s", "another keyframe is already at " + fmt(at) + " s");
            }
            seen.add(at);
            Vector3d eye = vec(k, "eye_kpc", null);
            Vector3d target = vec(k, "look_at_kpc", new Vector3d());
            Vector3d up = direction(k, "up");
            checkView(k, "eye_kpc", eye, target, up);
            keys.add(new Keyframe(at, eye, target, up, fov(k)));
        }
        return new KeyframeTrack(keys);
    }

    private static Set<Overlay> overlays(Node film) {
        EnumSet<Overlay> on = EnumSet.allOf(Overlay.class);
        Node show = film.table("show");
        if (show == null) {
            return on;
        }
        List<String> keys = new ArrayList<>();
        for (Overlay o : Overlay.values()) {
            keys.add(o.name().toLowerCase(Locale.ROOT));
        }
        keys.add("trails");
        show.allowOnly(keys.toArray(String[]::new));
        for (Overlay o : Overlay.values()) {
            if (!show.bool(o.name().toLowerCase(Locale.ROOT), true)) {
                on.remove(o);
            }
        }
        return on;
    }

    private static Vector3d vec(Node n, String key, Vector3d fallback) {
        if (fallback != null && !n.has(key)) {
            return fallback;
        }
        double[] v = n.vector(key, 3);
        return new Vector3d(v[0], v[1], v[2]);
    }

    private static Vector3d direction(Node n, String key) {
        Vector3d v = vec(n, key, new Vector3d(0, 0, 1));
        if (!(v.length() > 0)) {
            throw n.error(key, "must not be the zero vector");
        }
        return v;
    }

    private static double fov(Node n) {
        double f = n.number("fov_deg", 50);
        if (!(f > 0 && f <= 179)) {
            throw n.error("fov_deg", "must be in (0, 179] degrees (got " + fmt(f) + ")");
        }
        return f;
    }

    private static void checkView(Node n, String key, Vector3d eye, Vector3d target, Vector3d up) {
        Vector3d forward = new Vector3d(target).sub(eye);
        if (!(forward.length() > 0)) {
            throw n.error(key, "the camera sits on the point it looks at");
        }
        if (!(new Vector3d(forward).normalize().cross(new Vector3d(up).normalize()).length() > 1e-6)) {
            throw n.error("up", "is parallel to the view direction from " + key);
        }
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
