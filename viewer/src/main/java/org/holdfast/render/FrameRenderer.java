package org.holdfast.render;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.concurrent.ForkJoinPool;
import java.util.function.IntConsumer;

import org.holdfast.render.projection.FlatProjection;
import org.holdfast.render.projection.Projection;

/**
 * Renders scene frames into images of one size and projection. Everything a frame needs (the
 * light buffer, splat lists, the image) is allocated once and reused, so keep one renderer per
 * film and call {@link #render} per frame; the returned image is overwritten by the next call.
 *
 * <p>A frame is drawn in one parallel pass over bands of {@value SplatLayer#BAND_ROWS} rows, after
 * two preparations: the tracers are projected into per-band splat lists (on all threads), and
 * the trail segments and galaxy centres into a {@link MarkerLayer} (on the caller's thread). Each
 * band task then clears its rows, draws its splats in tracer order, its trail segments and
 * its galaxy centres, each clipped to its rows, and (in {@link #render}) stretches its rows to
 * pixels while they are still in cache. Every pixel gets the same float additions in the same
 * order as splats, then trails, then centres drawn one after the other over the whole frame, so
 * a frame is bit for bit the same on any thread count.
 *
 * <p>A flat projection follows the field of view of each camera pose; dome and panorama frames
 * show their fixed spans. Not thread-safe: one frame at a time (each frame uses all threads).
 */
public final class FrameRenderer implements AutoCloseable {

    private static final float STAR_WHITE = 0.4f;
    private static final float[] FLOW_RGB = {0.72f, 0.80f, 0.92f};

    private final Projection baseProjection;
    private final int width;
    private final int height;
    private final RenderSettings settings;
    private final LightBuffer light;
    private final SplatLayer splats;
    private final MarkerLayer markers;
    private final int bands;
    /** The task run for each band, made once so that a frame allocates no lambda. */
    private final IntConsumer bandTask = this::drawBand;
    /** The stretch the band tasks of this frame apply, or null for light only. */
    private Stretch bandStretch;
    private final OverlayPainter overlays;
    private final ForkJoinPool pool;
    private final BufferedImage image;
    private final int[] pixels;
    private final float[] colours;
    private final double[] view = new double[9];
    private final double[] out = new double[2];
    private double[] galaxyPx = new double[0];
    private Projection projection;

    public FrameRenderer(Projection projection, RenderSettings settings) {
        this.baseProjection = projection;
        this.projection = projection;
        this.width = projection.width();
        this.height = projection.height();
        this.settings = settings;
        this.light = new LightBuffer(width, height);
        this.splats = new SplatLayer(new SplatKernel(settings.splatSigmaPx()), width, height);
        this.markers = new MarkerLayer(new SplatKernel(settings.galaxySigmaPx()), height);
        this.bands = SplatLayer.bands(height);
        this.overlays = new OverlayPainter(settings.overlays(), "dome".equals(projection.name()), height,
                settings.domeTextPx(), settings.concentric());
        this.pool = new ForkJoinPool(settings.threads());
        this.image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        this.pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        this.colours = new float[3 * Palette.size() + 3];
        for (int c = 0; c < Palette.size(); c++) {
            colours[3 * c] = (1 - STAR_WHITE) * Palette.red(c) + STAR_WHITE;
            colours[3 * c + 1] = (1 - STAR_WHITE) * Palette.green(c) + STAR_WHITE;
            colours[3 * c + 2] = (1 - STAR_WHITE) * Palette.blue(c) + STAR_WHITE;
        }
        System.arraycopy(FLOW_RGB, 0, colours, 3 * Palette.size(), 3);
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** The linear light of the last frame drawn. */
    public LightBuffer light() {
        return light;
    }

    /** Renders one frame: light, stretch, overlays. The image is reused by the next call. */
    public BufferedImage render(SceneFrame scene, CameraPose pose) {
        draw(scene, pose, settings.stretch());
        if (overlays.any()) {
            overlays.paint(image, scene, galaxyPx, kpcPerPixel(scene, pose));
        }
        return image;
    }

    /**
     * Renders one frame at 16 bits per channel (a 48-bit RGB PNG when written): light, stretch
     * and, when {@code withOverlays}, the overlays drawn on it. The image is reused by the next call.
     */
    public BufferedImage renderDeep(SceneFrame scene, CameraPose pose, boolean withOverlays) {
        draw(scene, pose, null);
        if (deep == null) {
            java.awt.color.ColorSpace cs = java.awt.color.ColorSpace.getInstance(java.awt.color.ColorSpace.CS_sRGB);
            java.awt.image.ComponentColorModel cm = new java.awt.image.ComponentColorModel(cs, new int[] {16, 16, 16},
                    false, false, java.awt.Transparency.OPAQUE, java.awt.image.DataBuffer.TYPE_USHORT);
            deep = new BufferedImage(cm, cm.createCompatibleWritableRaster(width, height), false, null);
            deepPixels = ((java.awt.image.DataBufferUShort) deep.getRaster().getDataBuffer()).getData();
        }
        settings.stretch().toDeepPixels(light, deepPixels, 0, height);
        if (withOverlays && overlays.any()) {
            overlays.paint(deep, scene, galaxyPx, kpcPerPixel(scene, pose));
        }
        return deep;
    }

    /** Renders the picture alone, without the overlays (8 bits per channel). */
    public BufferedImage renderPicture(SceneFrame scene, CameraPose pose) {
        draw(scene, pose, settings.stretch());
        return image;
    }

    /**
     * The overlays of the frame drawn last (by {@link #renderPicture} or {@link #renderDeep}) on
     * a transparent RGBA image of the frame's size, for compositing over the picture in an
     * editor. The image is reused by the next call.
     */
    public BufferedImage overlayLayer(SceneFrame scene, CameraPose pose) {
        if (layer == null) {
            layer = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        }
        java.util.Arrays.fill(((DataBufferInt) layer.getRaster().getDataBuffer()).getData(), 0);
        if (overlays.any()) {
            overlays.paint(layer, scene, galaxyPx, kpcPerPixel(scene, pose));
        }
        return layer;
    }

    private BufferedImage deep;
    private short[] deepPixels;
    private BufferedImage layer;

    /**
     * Draws the linear light of a frame (tracers, trails, galaxy centres) into {@link #light()},
     * without the stretch; the light is the same as {@link #render} leaves there.
     */
    public LightBuffer renderLight(SceneFrame scene, CameraPose pose) {
        draw(scene, pose, null);
        return light;
    }

    /** Projects everything the frame shows, then runs the band tasks with {@code stretch} (or none). */
    private void draw(SceneFrame scene, CameraPose pose, Stretch stretch) {
        projection = projectionFor(pose);
        pose.worldToCamera(view);
        double ex = pose.eyeKpc().x();
        double ey = pose.eyeKpc().y();
        double ez = pose.eyeKpc().z();
        double ref2 = settings.referenceDistanceKpc() * settings.referenceDistanceKpc();
        double minD2 = 1e-4 * ref2;
        markers.clear();
        projectTrails(scene, ex, ey, ez);
        projectGalaxies(scene, ex, ey, ez, ref2, minD2);
        splats.project(scene, view, ex, ey, ez, projection, settings.starBrightness() * ref2,
                settings.flowBrightness() * ref2, minD2, colours, pool);
        bandStretch = stretch;
        SplatLayer.run(pool, bands, bandTask);
    }

    /**
     * One band, on whichever thread takes it: clear its rows, draw splats, trail segments and
     * galaxy centres into them (in that order, as the float sums require), then stretch them to
     * pixels unless this frame has no {@link #bandStretch}.
     */
    private void drawBand(int band) {
        Stretch stretch = bandStretch;
        int rowFrom = band * SplatLayer.BAND_ROWS;
        int rowTo = Math.min(height, rowFrom + SplatLayer.BAND_ROWS);
        light.clearRows(rowFrom, rowTo);
        splats.drawBand(band, light);
        markers.drawBand(band, light);
        if (stretch != null) {
            stretch.toPixels(light, pixels, rowFrom, rowTo);
        }
    }

    private Projection projectionFor(CameraPose pose) {
        if (!(baseProjection instanceof FlatProjection)) {
            return baseProjection;
        }
        if (projection instanceof FlatProjection current && current.fovDeg() == pose.fovDeg()) {
            return current;
        }
        return new FlatProjection(width, height, pose.fovDeg());
    }

    /** Projects a world point; returns false if it is not in view. Result in {@link #out}. */
    private boolean projectWorld(double x, double y, double z, double ex, double ey, double ez) {
        double wx = x - ex;
        double wy = y - ey;
        double wz = z - ez;
        double cx = view[0] * wx + view[1] * wy + view[2] * wz;
        double cy = view[3] * wx + view[4] * wy + view[5] * wz;
        double cz = view[6] * wx + view[7] * wy + view[8] * wz;
        return projection.project(cx, cy, cz, out);
    }

    /** Lists the visible trail segments, galaxy by galaxy and oldest first, in {@link #markers}. */
    private void projectTrails(SceneFrame scene, double ex, double ey, double ez) {
        double now = scene.tGyr();
        double span = settings.trailSpanGyr();
        float base = (float) settings.trailBrightness();
        boolean panorama = "panorama".equals(projection.name());
        for (int g = 0; g < scene.galaxyCount(); g++) {
            int c = scene.colourIndex(g);
            double px = Double.NaN;
            double py = Double.NaN;
            int first = 0;
            while (first + 1 < scene.trailCount(g) && Math.abs(now - scene.trailTGyr(g, first + 1)) >= span) {
                first++; // segments wholly older than the span are not drawn
            }
            for (int k = first; k < scene.trailCount(g); k++) {
                double t = scene.trailTGyr(g, k);
                boolean seen = projectWorld(scene.trailX(g, k), scene.trailY(g, k), scene.trailZ(g, k), ex, ey, ez);
                double qx = seen ? out[0] : Double.NaN;
                double qy = seen ? out[1] : Double.NaN;
                if (k > 0 && seen && !Double.isNaN(px) && !(panorama && Math.abs(qx - px) > 0.5 * width)) {
                    // the samples lie behind the clock in the run's direction: into the past, a backward run's
                    double age = Math.abs(now - 0.5 * (t + scene.trailTGyr(g, k - 1)));
                    double fade = Math.max(0, 1 - age / span);
                    if (fade > 0) {
                        float f = (float) fade * base;
                        markers.addSegment(px, py, qx, qy, f * Palette.red(c), f * Palette.green(c),
                                f * Palette.blue(c));
                    }
                }
                px = qx;
                py = qy;
            }
        }
    }

    /** Lists the visible galaxy centres in {@link #markers} and keeps their pixels for the overlays. */
    private void projectGalaxies(SceneFrame scene, double ex, double ey, double ez, double ref2, double minD2) {
        int n = scene.galaxyCount();
        if (galaxyPx.length < 2 * n) {
            galaxyPx = new double[2 * n];
        }
        double scale = settings.galaxyBrightness() * ref2;
        for (int g = 0; g < n; g++) {
            double x = scene.galaxyX(g);
            double y = scene.galaxyY(g);
            double z = scene.galaxyZ(g);
            if (!projectWorld(x, y, z, ex, ey, ez)) {
                galaxyPx[2 * g] = Double.NaN;
                galaxyPx[2 * g + 1] = Double.NaN;
                continue;
            }
            galaxyPx[2 * g] = out[0];
            galaxyPx[2 * g + 1] = out[1];
            double d2 = (x - ex) * (x - ex) + (y - ey) * (y - ey) + (z - ez) * (z - ez);
            float flux = (float) (scale / Math.max(d2, minD2));
            int c = scene.colourIndex(g);
            markers.addCentre(out[0], out[1], flux * Palette.red(c), flux * Palette.green(c),
                    flux * Palette.blue(c));
        }
    }

    /**
     * Size of a pixel at the distance of the point the camera looks at (flat projection only):
     * the camera's own geometry, so the bar stays true when members fly far apart. A pose with no
     * such point falls back to the depth of the nearest galaxy in front of the camera.
     */
    private double kpcPerPixel(SceneFrame scene, CameraPose pose) {
        if (!(projection instanceof FlatProjection flat)) {
            return Double.NaN;
        }
        double focus = pose.focusKpc();
        if (focus > 0 && Double.isFinite(focus)) {
            return focus / flat.focalPx();
        }
        double depth = Double.POSITIVE_INFINITY;
        for (int g = 0; g < scene.galaxyCount(); g++) {
            double wx = scene.galaxyX(g) - pose.eyeKpc().x();
            double wy = scene.galaxyY(g) - pose.eyeKpc().y();
            double wz = scene.galaxyZ(g) - pose.eyeKpc().z();
            double d = -(view[6] * wx + view[7] * wy + view[8] * wz);
            if (d > 0) {
                depth = Math.min(depth, d);
            }
        }
        return Double.isFinite(depth) ? depth / flat.focalPx() : Double.NaN;
    }

    @Override
    public void close() {
        pool.shutdown();
    }
}
