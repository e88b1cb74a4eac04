package org.holdfast.render;

import java.util.EnumSet;
import java.util.Set;

/**
 * How a frame looks: splat size and brightness, trails, the stretch and the overlays, and how
 * many threads draw it. Fluent setters check their argument; the renderer copies what it needs
 * when it is built.
 */
public final class RenderSettings {

    private double splatSigmaPx = 0.5;
    private double starBrightness = 1.0;
    private double flowBrightness = 0.3;
    private double galaxyBrightness = 60.0;
    private double galaxySigmaPx = 1.6;
    private double referenceDistanceKpc = 200.0;
    private double trailBrightness = 3.0;
    private double trailSpanGyr = 4.0;
    private Stretch stretch = Stretch.asinh(0.4, 9.0);
    private final EnumSet<Overlay> overlays = EnumSet.allOf(Overlay.class);
    private int threads = Runtime.getRuntime().availableProcessors();
    private double domeTextPx = Double.NaN;
    private boolean concentric;

    /** Gaussian sigma of a star or flow-tracer splat, in pixels (default 0.5). */
    public RenderSettings splatSigmaPx(double v) {
        splatSigmaPx = checkRange("splat sigma (px)", v, 0.3, 8);
        return this;
    }

    /** Light of one star seen from the reference distance (default 1). */
    public RenderSettings starBrightness(double v) {
        starBrightness = checkRange("star brightness", v, 0, 1e9);
        return this;
    }

    /** Light of one flow tracer seen from the reference distance (default 0.3, dimmer than stars). */
    public RenderSettings flowBrightness(double v) {
        flowBrightness = checkRange("flow brightness", v, 0, 1e9);
        return this;
    }

    /** Light of a galaxy's centre marker seen from the reference distance (default 60). */
    public RenderSettings galaxyBrightness(double v) {
        galaxyBrightness = checkRange("galaxy brightness", v, 0, 1e12);
        return this;
    }

    /** Gaussian sigma of a galaxy's centre marker in pixels (default 1.6). */
    public RenderSettings galaxySigmaPx(double v) {
        galaxySigmaPx = checkRange("galaxy sigma (px)", v, 0.3, 8);
        return this;
    }

    /**
     * Distance at which a splat shows its nominal brightness; light falls as the inverse
     * square of the distance from the eye (default 200 kpc).
     */
    public RenderSettings referenceDistanceKpc(double v) {
        referenceDistanceKpc = checkRange("reference distance (kpc)", v, 1e-6, 1e12);
        return this;
    }

    /** Light per pixel of trail length at age zero (default 3). */
    public RenderSettings trailBrightness(double v) {
        trailBrightness = checkRange("trail brightness", v, 0, 1e9);
        return this;
    }

    /** Age at which a trail has faded out, linearly, in Gyr of simulated time (default 4). */
    public RenderSettings trailSpanGyr(double v) {
        trailSpanGyr = checkRange("trail span (Gyr)", v, 1e-9, 1e6);
        return this;
    }

    public RenderSettings stretch(Stretch v) {
        stretch = java.util.Objects.requireNonNull(v, "stretch");
        return this;
    }

    /** Switches one overlay on or off. */
    public RenderSettings overlay(Overlay o, boolean on) {
        if (on) {
            overlays.add(o);
        } else {
            overlays.remove(o);
        }
        return this;
    }

    /** Switches every overlay off (for scientific stills and pixel tests). */
    public RenderSettings noOverlays() {
        overlays.clear();
        return this;
    }

    /**
     * Text on a dome: the height of the clock's first line in pixels (from degrees of the dome),
     * and whether the dome is concentric (text round the zenith) rather than unidirectional (text
     * in the front sweet spot, low in the dome master). Unset: sizes follow the frame's height.
     */
    public RenderSettings domeText(double firstLinePx, boolean concentricDome) {
        domeTextPx = checkRange("dome text (px)", firstLinePx, 4, 2000);
        concentric = concentricDome;
        return this;
    }

    /** Height of the clock's first line on a dome in pixels, NaN when it follows the frame's height. */
    public double domeTextPx() {
        return domeTextPx;
    }

    /** Whether dome text is placed for a concentric dome. */
    public boolean concentric() {
        return concentric;
    }

    /**
     * Star glow (Gaussian sigma) in degrees of the look holdfast had at 1920x1080 with 50 degrees
     * of field: 0.5 px there.
     */
    public static final double DEFAULT_GLOW_DEG = 0.5 / pxPerDegFlat(1080);

    /** Pixels per degree at the centre of a flat frame {@code heightPx} high with 50 degrees of field. */
    public static double pxPerDegFlat(int heightPx) {
        return 0.5 * heightPx / Math.tan(Math.toRadians(25)) * Math.PI / 180;
    }

    /**
     * Glow sizes as angles: a star's sigma {@code glowDeg} and a galaxy centre's 3.2 times it,
     * at {@code pxPerDeg}, kept within the kernels' range of 0.3 to 8 px; a small preview then
     * looks like the large master.
     */
    public RenderSettings angularGlow(double glowDeg, double pxPerDeg) {
        double sigma = glowDeg * pxPerDeg;
        splatSigmaPx(Math.max(0.3, Math.min(8, sigma)));
        galaxySigmaPx(Math.max(0.3, Math.min(8, 3.2 * sigma)));
        return this;
    }

    /** Threads that draw a frame (default: all cores). */
    public RenderSettings threads(int v) {
        if (v < 1 || v > 1024) {
            throw new IllegalArgumentException("threads must be in [1, 1024]: " + v);
        }
        threads = v;
        return this;
    }

    public double splatSigmaPx() {
        return splatSigmaPx;
    }

    public double starBrightness() {
        return starBrightness;
    }

    public double flowBrightness() {
        return flowBrightness;
    }

    public double galaxyBrightness() {
        return galaxyBrightness;
    }

    public double galaxySigmaPx() {
        return galaxySigmaPx;
    }

    public double referenceDistanceKpc() {
        return referenceDistanceKpc;
    }

    public double trailBrightness() {
        return trailBrightness;
    }

    public double trailSpanGyr() {
        return trailSpanGyr;
    }

    public Stretch stretch() {
        return stretch;
    }

    public Set<Overlay> overlays() {
        return EnumSet.copyOf(overlays);
    }

    public int threads() {
        return threads;
    }

    private static double checkRange(String what, double v, double lo, double hi) {
        if (!(v >= lo && v <= hi)) {
            throw new IllegalArgumentException(what + " must be in [" + lo + ", " + hi + "]: " + v);
        }
        return v;
    }
}
