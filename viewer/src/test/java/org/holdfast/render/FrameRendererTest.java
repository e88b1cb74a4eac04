package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.List;
import java.util.SplittableRandom;

import org.holdfast.render.projection.DomeProjection;
import org.holdfast.render.projection.FlatProjection;
import org.holdfast.render.projection.PanoramaProjection;
import org.holdfast.run.RunEvent;
import org.holdfast.render.projection.Projection;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/** Whole-frame pixel checks on small frames. */
class FrameRendererTest {

    static final String[] NAMES = {"Tessaly", "Brin", "Orrin"};
    static final double REF_KPC = 200;

    /** Camera on the +z axis at 200 kpc looking at the origin, y up. */
    static CameraPose front() {
        return new CameraPose().lookAt(new Vector3d(0, 0, REF_KPC), new Vector3d(), new Vector3d(0, 1, 0), 40);
    }

    static RenderSettings plain(int threads) {
        return new RenderSettings().noOverlays().threads(threads).referenceDistanceKpc(REF_KPC)
                .galaxyBrightness(0).trailBrightness(0);
    }

    static SceneFrame cloud(int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        float[] x = new float[n];
        float[] y = new float[n];
        float[] z = new float[n];
        int[] host = new int[n];
        for (int i = 0; i < n; i++) {
            x[i] = (float) (rng.nextGaussian() * 40);
            y[i] = (float) (rng.nextGaussian() * 30);
            z[i] = (float) (rng.nextGaussian() * 40);
            host[i] = rng.nextInt(4) - 1;
        }
        return new SceneFrame().setClock(3.2, 1.4)
                .setGalaxies(3, NAMES, new int[] {0, 1, 2}, new double[] {-30, 0, 30}, new double[] {0, 10, 0},
                        new double[] {0, 0, 5})
                .setTracers(n, x, y, z, host);
    }

    static SceneFrame oneTracer(float x, float y, float z, int host) {
        return new SceneFrame().setGalaxies(1, NAMES, new int[] {1}, new double[] {0}, new double[] {0},
                new double[] {0}).setTracers(1, new float[] {x}, new float[] {y}, new float[] {z}, new int[] {host});
    }

    static int[] pixels(BufferedImage im) {
        return ((DataBufferInt) im.getRaster().getDataBuffer()).getData().clone();
    }

    @Test
    void sameInputGivesIdenticalFramesOnAnyThreadCount() {
        SceneFrame scene = cloud(40_000, 11);
        RenderSettings look = new RenderSettings().threads(1);
        for (Projection p : new Projection[] {new FlatProjection(96, 64, 50), new DomeProjection(80, 200, 20),
            new PanoramaProjection(40)}) {
            int[] reference;
            float[] referenceLight;
            try (FrameRenderer r = new FrameRenderer(p, look)) {
                reference = pixels(r.render(scene, front()));
                referenceLight = r.light().copyRgb();
            }
            for (int threads : new int[] {2, 3, 8}) {
                try (FrameRenderer r = new FrameRenderer(p, new RenderSettings().threads(threads))) {
                    int[] got = pixels(r.render(scene, front()));
                    assertArrayEquals(referenceLight, r.light().copyRgb(), p.name() + ": light on " + threads + " threads");
                    assertArrayEquals(reference, got, p.name() + ": pixels on " + threads + " threads");
                }
            }
        }
    }

    /**
     * The fused band pass (each band draws its splats, then its share of every trail segment
     * and galaxy centre, then stretches its rows) must give what drawing everything over the
     * whole frame in order gives: the splats, then each segment with {@link TrailPainter#line},
     * then each centre with {@link SplatKernel#draw}, then one stretch. The trails zigzag across
     * every band and the centres sit on band edges, so a wrong clip leaves a seam or a gap.
     */
    @Test
    void bandByBandFrameEqualsTheWholeFrameDrawnInOrder() {
        FlatProjection p = new FlatProjection(150, 100, front().fovDeg());
        CameraPose pose = front();
        // centres on and beside band edges (bands of 16 rows; the last band is partial), and two
        // whose footprint (radius 5 rows at sigma 2.5) ends on the last or the first row of a band
        double[] rows = {16.0, 31.999, 32.0, 47.5, 64.01, 99.2, 20.5, 43.2};
        double[] cols = {20.3, 40, 60.7, 80, 100.2, 130, 115, 50};
        int n = rows.length;
        double[] gx = new double[n];
        double[] gy = new double[n];
        for (int g = 0; g < n; g++) {
            gx[g] = (cols[g] - 0.5 * p.width()) * REF_KPC / p.focalPx();
            gy[g] = (0.5 * p.height() - rows[g]) * REF_KPC / p.focalPx();
        }
        String[] names = {"Tessaly", "Brin", "Orrin", "Vell", "Quasso", "Ildra", "Morrow", "Keth"};
        SceneFrame scene = cloud(5000, 21).setClock(6, 1.2)
                .setGalaxies(n, names, new int[] {0, 1, 2, 3, 4, 5, 6, 7}, gx, gy, new double[n]);
        SplittableRandom rng = new SplittableRandom(8);
        for (int g = 0; g < n; g++) {
            int m = 12;
            double[] t = new double[m];
            double[] x = new double[m];
            double[] y = new double[m];
            double[] z = new double[m];
            for (int k = 0; k < m; k++) {
                t[k] = 6.0 * k / (m - 1);
                // alternate top and bottom of the frame, some steep, some shallow
                x[k] = g % 2 == 0 ? (rng.nextDouble() - 0.5) * 90 : (k % 2 == 0 ? -70 : 70);
                y[k] = g % 2 == 0 ? (k % 2 == 0 ? 45 : -45) : (rng.nextDouble() - 0.5) * 60;
                // one sample behind the eye breaks the trail there
                z[k] = k == 5 && g == 1 ? 2 * REF_KPC : rng.nextDouble() * 20 - 10;
            }
            x[m - 1] = gx[g];
            y[m - 1] = gy[g];
            z[m - 1] = 0;
            scene.setTrail(g, m, t, x, y, z);
        }
        for (Stretch stretch : new Stretch[] {Stretch.asinh(0.4, 9.0), Stretch.linear(4)}) {
            RenderSettings look = new RenderSettings().noOverlays().threads(1).stretch(stretch)
                    .trailBrightness(2).trailSpanGyr(5).galaxyBrightness(40).galaxySigmaPx(2.5);
            int[] splatsOnly;
            LightBuffer whole = new LightBuffer(p.width(), p.height());
            try (FrameRenderer r = new FrameRenderer(p, new RenderSettings().noOverlays().threads(1)
                    .stretch(stretch).trailBrightness(0).galaxyBrightness(0))) {
                splatsOnly = pixels(r.render(scene, pose));
                System.arraycopy(r.light().copyRgb(), 0, whole.rgb, 0, whole.rgb.length);
            }
            int segments = drawTrailsAndCentresWhole(whole, scene, pose, p, look);
            assertTrue(segments > 40, "segments drawn: " + segments);
            int[] want = new int[p.width() * p.height()];
            stretch.toPixels(whole, want, 0, p.height());
            int changed = 0;
            for (int k = 0; k < want.length; k++) {
                changed += want[k] != splatsOnly[k] ? 1 : 0;
            }
            assertTrue(changed > 1000, "trails and centres light " + changed + " pixels");
            for (int threads : new int[] {1, 2, 3}) {
                try (FrameRenderer r = new FrameRenderer(p, look.threads(threads))) {
                    int[] got = pixels(r.render(scene, pose));
                    assertArrayEquals(whole.copyRgb(), r.light().copyRgb(), "light on " + threads + " threads");
                    assertArrayEquals(want, got, "pixels on " + threads + " threads");
                }
            }
        }
    }

    /**
     * Adds the scene's trails and galaxy centres to {@code buf} over the whole frame, in the
     * renderer's order and arithmetic; returns the number of trail segments drawn.
     */
    private static int drawTrailsAndCentresWhole(LightBuffer buf, SceneFrame scene, CameraPose pose,
            Projection p, RenderSettings look) {
        double[] m = pose.worldToCamera(new double[9]);
        double ex = pose.eyeKpc().x();
        double ey = pose.eyeKpc().y();
        double ez = pose.eyeKpc().z();
        double[] out = new double[2];
        int segments = 0;
        float base = (float) look.trailBrightness();
        for (int g = 0; g < scene.galaxyCount(); g++) {
            int c = scene.colourIndex(g);
            double px = Double.NaN;
            double py = Double.NaN;
            for (int k = 0; k < scene.trailCount(g); k++) {
                boolean seen = project(m, scene.trailX(g, k) - ex, scene.trailY(g, k) - ey,
                        scene.trailZ(g, k) - ez, p, out);
                double qx = seen ? out[0] : Double.NaN;
                double qy = seen ? out[1] : Double.NaN;
                if (k > 0 && seen && !Double.isNaN(px)) {
                    double age = Math.abs(scene.tGyr() - 0.5 * (scene.trailTGyr(g, k) + scene.trailTGyr(g, k - 1)));
                    double fade = Math.max(0, 1 - age / look.trailSpanGyr());
                    if (fade > 0) {
                        float f = (float) fade * base;
                        TrailPainter.line(buf, px, py, qx, qy, f * Palette.red(c), f * Palette.green(c),
                                f * Palette.blue(c));
                        segments++;
                    }
                }
                px = qx;
                py = qy;
            }
        }
        SplatKernel centre = new SplatKernel(look.galaxySigmaPx());
        double ref2 = look.referenceDistanceKpc() * look.referenceDistanceKpc();
        for (int g = 0; g < scene.galaxyCount(); g++) {
            double wx = scene.galaxyX(g) - ex;
            double wy = scene.galaxyY(g) - ey;
            double wz = scene.galaxyZ(g) - ez;
            if (project(m, wx, wy, wz, p, out)) {
                double d2 = wx * wx + wy * wy + wz * wz;
                float flux = (float) (look.galaxyBrightness() * ref2 / Math.max(d2, 1e-4 * ref2));
                int c = scene.colourIndex(g);
                centre.draw(buf, out[0], out[1], flux * Palette.red(c), flux * Palette.green(c),
                        flux * Palette.blue(c));
            }
        }
        return segments;
    }

    private static boolean project(double[] m, double wx, double wy, double wz, Projection p, double[] out) {
        double cx = m[0] * wx + m[1] * wy + m[2] * wz;
        double cy = m[3] * wx + m[4] * wy + m[5] * wz;
        double cz = m[6] * wx + m[7] * wy + m[8] * wz;
        return p.project(cx, cy, cz, out);
    }

    @Test
    void additiveBlendingCommutes() {
        SceneFrame a = cloud(3000, 5);
        int n = a.tracerCount();
        float[] x = new float[n];
        float[] y = new float[n];
        float[] z = new float[n];
        int[] h = new int[n];
        float[] p = new float[3];
        for (int i = 0; i < n; i++) {
            a.tracerPosition(n - 1 - i, p);
            x[i] = p[0];
            y[i] = p[1];
            z[i] = p[2];
            h[i] = a.tracerHost(n - 1 - i);
        }
        SceneFrame reversed = cloud(0, 5).setTracers(n, x, y, z, h);
        try (FrameRenderer r1 = new FrameRenderer(new FlatProjection(64, 48, 50), plain(2));
                FrameRenderer r2 = new FrameRenderer(new FlatProjection(64, 48, 50), plain(2))) {
            LightBuffer forward = r1.renderLight(a, front());
            LightBuffer backward = r2.renderLight(reversed, front());
            double total = forward.total(0);
            assertTrue(total > 1, "the cloud is in view");
            float[] f = forward.copyRgb();
            float[] b = backward.copyRgb();
            for (int k = 0; k < f.length; k++) {
                // float sums in another order agree to rounding, relative to the frame's light
                assertEquals(f[k], b[k], 1e-6 * total, "value " + k);
            }
        }
    }

    @Test
    void oneStarAtTheReferenceDistanceDepositsItsBrightnessAtTheCentre() {
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(33, 33, 30), plain(2).starBrightness(2.5))) {
            LightBuffer light = r.renderLight(oneTracer(0, 0, 0, 0), front());
            // the star colour is the palette colour mixed 60:40 with white
            double wantRed = 2.5 * (0.6 * Palette.red(0) + 0.4);
            assertEquals(wantRed, light.total(0), 1e-5 * wantRed);
            assertEquals(light.red(16, 16), maxOf(light, 0), 0, "brightest at the centre pixel");
        }
    }

    @Test
    void brightnessFallsWithTheSquareOfDistance() {
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(33, 33, 30), plain(1))) {
            double near = r.renderLight(oneTracer(0, 0, 0, 0), front()).total(1);
            double far = r.renderLight(oneTracer(0, 0, (float) -REF_KPC, 0), front()).total(1);
            assertEquals(0.25, far / near, 1e-6, "twice as far, a quarter of the light");
        }
    }

    @Test
    void flowTracersAreDimmerThanStars() {
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(33, 33, 30), plain(1))) {
            double star = r.renderLight(oneTracer(0, 0, 0, 0), front()).total(1);
            double flow = r.renderLight(oneTracer(0, 0, 0, -1), front()).total(1);
            assertTrue(flow < 0.5 * star, "flow " + flow + " vs star " + star);
            assertTrue(flow > 0);
        }
    }

    @Test
    void trailsFadeWithAgeAndVanishPastTheirSpan() {
        double[] t = {0, 1, 2, 3, 4, 5};
        double[] x = {-50, -30, -10, 10, 30, 50};
        double[] zero = new double[6];
        SceneFrame scene = new SceneFrame().setClock(5, 1.3)
                .setGalaxies(1, NAMES, new int[] {2}, new double[] {50}, new double[] {0}, new double[] {0})
                .setTrail(0, 6, t, x, zero, zero);
        RenderSettings look = plain(1).trailBrightness(1).trailSpanGyr(3);
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(200, 40, front().fovDeg()), look)) {
            LightBuffer light = r.renderLight(scene, front());
            double[] column = new double[200];
            for (int px = 0; px < 200; px++) {
                for (int py = 0; py < 40; py++) {
                    column[px] += light.red(px, py);
                }
            }
            double[] seg = new double[5];
            double[] out = new double[2];
            FlatProjection p = new FlatProjection(200, 40, front().fovDeg());
            for (int s = 0; s < 5; s++) {
                p.project(0.5 * (x[s] + x[s + 1]), 0, -REF_KPC, out);
                seg[s] = column[(int) out[0]];
            }
            assertEquals(0, seg[0], 0, "ages 4.5 Gyr: past the 3 Gyr span");
            assertEquals(0, seg[1], 0, "age 3.5 Gyr");
            assertTrue(seg[2] > 0 && seg[2] < seg[3] && seg[3] < seg[4], "newer segments are brighter");
            // linear fade: ages 2.5, 1.5, 0.5 of 3 -> 1/6, 3/6, 5/6
            assertEquals(3.0, seg[3] / seg[2], 1e-4);
            assertEquals(5.0 / 3, seg[4] / seg[3], 1e-4);
        }
    }

    @Test
    void galaxyMarkerSitsOnItsCentre() {
        SceneFrame scene = oneTracer(0, 0, 0, 0).setTracers(0, new float[0], new float[0], new float[0], new int[0]);
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(41, 31, 30),
                new RenderSettings().noOverlays().threads(1).galaxyBrightness(10))) {
            LightBuffer light = r.renderLight(scene, front());
            assertEquals(light.green(20, 15), maxOf(light, 1), 0);
            assertTrue(light.green(20, 15) > 0);
        }
    }

    @Test
    void flatFramesFollowTheFieldOfViewOfEachPose() {
        SceneFrame scene = new SceneFrame().setGalaxies(1, NAMES, new int[] {0}, new double[] {30},
                new double[] {0}, new double[] {0});
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(101, 61, 40),
                new RenderSettings().noOverlays().threads(1).galaxyBrightness(10))) {
            for (double fov : new double[] {20, 40, 70, 40}) {
                CameraPose pose = new CameraPose().lookAt(new Vector3d(0, 0, REF_KPC), new Vector3d(),
                        new Vector3d(0, 1, 0), fov);
                LightBuffer light = r.renderLight(scene, pose);
                double[] at = new double[2];
                new FlatProjection(101, 61, fov).project(30, 0, -REF_KPC, at);
                int x = (int) Math.floor(at[0]);
                assertEquals(light.red(x, 30), maxOf(light, 0), 0, "marker at x = " + x + " for " + fov + " degrees");
            }
        }
    }

    @Test
    void settingGalaxiesForgetsOldTrails() {
        double[] two = {0, 1};
        SceneFrame scene = cloud(0, 1).setTrail(0, 2, two, two, two, two);
        assertEquals(2, scene.trailCount(0));
        scene.setGalaxies(1, NAMES, new int[] {0}, new double[1], new double[1], new double[1]);
        assertEquals(0, scene.trailCount(0));
    }

    @Test
    void overlaysDrawOnlyWhenSwitchedOn() {
        SceneFrame scene = cloud(2000, 3).setEvents(List.of(
                new FateEvent(1.1, RunEvent.Kind.MERGED, List.of("Brin", "Orrin")),
                new FateEvent(2.0, RunEvent.Kind.ESCAPED, List.of("Tessaly")),
                new FateEvent(9.0, RunEvent.Kind.RIPPED, List.of("Brin"))));
        int[] bare;
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(320, 200, 50), new RenderSettings().noOverlays())) {
            bare = pixels(r.render(scene, front()));
        }
        for (Overlay o : Overlay.values()) {
            try (FrameRenderer r = new FrameRenderer(new FlatProjection(320, 200, 50),
                    new RenderSettings().noOverlays().overlay(o, true))) {
                int[] with = pixels(r.render(scene, front()));
                assertFalse(java.util.Arrays.equals(bare, with), o + " changes the frame");
            }
        }
    }

    @Test
    void eventsAfterTheClockAreNotShownYet() {
        SceneFrame before = cloud(100, 3);
        SceneFrame withFuture = cloud(100, 3).setEvents(List.of(new FateEvent(9.0, RunEvent.Kind.RIPPED, List.of("Brin"))));
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(320, 200, 50),
                new RenderSettings().noOverlays().overlay(Overlay.EVENTS, true))) {
            int[] a = pixels(r.render(before, front()));
            int[] b = pixels(r.render(withFuture, front()));
            assertArrayEquals(a, b);
        }
    }

    @Test
    void eventWordsNameTheMembers() {
        assertEquals("Brin merged with Orrin", new FateEvent(1, RunEvent.Kind.MERGED, List.of("Brin", "Orrin")).describe());
        assertEquals("Tessaly escaped the group", new FateEvent(1, RunEvent.Kind.ESCAPED, List.of("Tessaly")).describe());
        assertEquals("Vell ripped away by dark energy", new FateEvent(1, RunEvent.Kind.RIPPED, List.of("Vell")).describe());
        assertEquals("Vell was unbound from the start",
                new FateEvent(0, RunEvent.Kind.UNBOUND, List.of("Vell")).describe());
        assertEquals("the group dissolved (Brin and Orrin)",
                new FateEvent(3, RunEvent.Kind.DISSOLVED, List.of("Brin", "Orrin")).describe());
    }

    private static float maxOf(LightBuffer light, int channel) {
        float[] a = light.copyRgb();
        float m = Float.NEGATIVE_INFINITY;
        for (int i = channel; i < a.length; i += 3) {
            m = Math.max(m, a[i]);
        }
        return m;
    }

    /**
     * A run into the past leaves its trail behind the clock too: the trail of a backward run, with
     * every time negated, is lit exactly like the same path run forward (fading with |age|).
     */
    @Test
    void aBackwardRunsTrailFadesLikeTheSamePathRunForward() {
        FlatProjection p = new FlatProjection(96, 64, 40);
        double[] x = {-60, -20, 10, 30};
        double[] y = {-20, 15, -10, 5};
        double[] z = {0, 0, 0, 0};
        RenderSettings look = plain(1).trailBrightness(2).trailSpanGyr(5);
        float[][] lights = new float[2][];
        for (int sign = 0; sign < 2; sign++) {
            double k = sign == 0 ? 1 : -1;
            double[] t = {0, k * 1.0, k * 2.0, k * 3.0};
            SceneFrame scene = new SceneFrame().setClock(k * 3.0, 1)
                    .setGalaxies(1, NAMES, new int[] {0}, new double[] {30}, new double[] {5}, new double[] {0})
                    .setTracers(0, new float[0], new float[0], new float[0], new int[0]);
            scene.setTrail(0, 4, t, x, y, z);
            try (FrameRenderer r = new FrameRenderer(p, look)) {
                lights[sign] = r.renderLight(scene, front()).copyRgb();
            }
        }
        double total = 0;
        for (float v : lights[0]) {
            total += v;
        }
        assertTrue(total > 0, "the forward trail is drawn");
        assertArrayEquals(lights[0], lights[1], "the backward trail is drawn the same");
    }
}
