package org.holdfast.film;

import java.util.Set;

import org.holdfast.render.Overlay;
import org.holdfast.render.RenderSettings;
import org.holdfast.render.Stretch;
import org.holdfast.render.projection.DomeProjection;
import org.holdfast.render.projection.FlatProjection;
import org.holdfast.render.projection.PanoramaProjection;
import org.holdfast.render.projection.Projection;

/**
 * Everything a {@code [film]} table sets: length and frame rate, the view and frame size, the
 * stretch, the clock mapping, the camera and the overlays shown.
 *
 * @param view flat, dome or panorama
 * @param follow the member the camera rides with (its track is then relative to that member's
 *        centre), or null for a camera fixed to the run's frame
 */
public record FilmSpec(double lengthS, int frameRate, String view, int widthPx, int heightPx, double domeSpanDeg,
        double domeTiltDeg, Stretch stretch, FilmClock clock, CameraTrack camera, Set<Overlay> overlays,
        String follow, FilmLook look) {

    public FilmSpec {
        overlays = Set.copyOf(overlays);
    }

    /** A film with the standard look. */
    public FilmSpec(double lengthS, int frameRate, String view, int widthPx, int heightPx, double domeSpanDeg,
            double domeTiltDeg, Stretch stretch, FilmClock clock, CameraTrack camera, Set<Overlay> overlays,
            String follow) {
        this(lengthS, frameRate, view, widthPx, heightPx, domeSpanDeg, domeTiltDeg, stretch, clock, camera, overlays,
                follow, FilmLook.standard());
    }

    /** The same film with another camera and follow. */
    FilmSpec withCamera(CameraTrack track, String followName) {
        return new FilmSpec(lengthS, frameRate, view, widthPx, heightPx, domeSpanDeg, domeTiltDeg, stretch, clock,
                track, overlays, followName, look);
    }

    /**
     * The camera track's second for frame {@code index}: the film's length spread over the
     * frames, so that the first frame shows the camera at 0 s and the last exactly at
     * {@code length_s} (the last keyframe, the orbit's last turn), however the frames fall.
     */
    public double cameraSecondOf(int index) {
        int n = frameCount();
        return n > 1 ? lengthS * (index - 1) / (n - 1) : 0;
    }

    /** The camera track's second at film second {@code filmS} (a still between frames). */
    public double cameraSecondAt(double filmS) {
        int n = frameCount();
        return n > 1 ? filmS * lengthS / ((n - 1) / (double) frameRate) : 0;
    }

    /** Pixels per degree at the centre of this film's frames. */
    public double pxPerDeg() {
        return switch (view) {
            case "dome" -> widthPx / domeSpanDeg;
            case "panorama" -> heightPx / 180.0;
            default -> RenderSettings.pxPerDegFlat(heightPx);
        };
    }

    /** Whether the rip ladder's rungs are events of this film. */
    public boolean ladder() {
        return look.ladder();
    }

    /** Number of frames: length x frame rate, rounded. */
    public int frameCount() {
        return frameCount(lengthS, frameRate);
    }

    /** Number of frames of a film {@code lengthS} long at {@code frameRate}: at least one. */
    static int frameCount(double lengthS, int frameRate) {
        // saturates rather than wrapping round: a film too long for an int is refused by its frame count
        long n = Math.round(lengthS * frameRate);
        return (int) Math.max(1, Math.min(Integer.MAX_VALUE, n));
    }

    /** Film second shown by frame {@code index} (1-based, as in the frame file names). */
    public double filmSecondOf(int index) {
        return (index - 1) / (double) frameRate;
    }

    /**
     * The film second of the last frame, where the clock shows its end time: (frames - 1) /
     * rate. A film of one frame shows only its start, and its clock ends at {@code lengthS}.
     */
    static double lastFrameS(double lengthS, int frameRate) {
        int n = frameCount(lengthS, frameRate);
        return n > 1 ? (n - 1) / (double) frameRate : lengthS;
    }

    /** The projection for this film's frames (a flat one follows each pose's field of view). */
    public Projection projection() {
        return switch (view) {
            case "dome" -> new DomeProjection(widthPx, domeSpanDeg, domeTiltDeg);
            case "panorama" -> new PanoramaProjection(heightPx);
            default -> new FlatProjection(widthPx, heightPx, 50);
        };
    }

    /** Render settings with this film's stretch and overlays (other looks at their defaults). */
    public RenderSettings renderSettings() {
        RenderSettings s = new RenderSettings().stretch(stretch).noOverlays();
        for (Overlay o : overlays) {
            s.overlay(o, true);
        }
        s.angularGlow(look.glowDeg(), pxPerDeg());
        if (!look.trails()) {
            s.trailBrightness(0);
        }
        if ("dome".equals(view)) {
            // never below 8 px, however small a preview
            s.domeText(Math.max(8, Math.min(2000, look.textDeg() * pxPerDeg())), "concentric".equals(look.placement()));
        }
        return s;
    }
}
