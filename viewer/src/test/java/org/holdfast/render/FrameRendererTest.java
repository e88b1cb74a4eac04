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
                new FateEvent(1.1, FateKind.MERGED, List.of("Brin", "Orrin")),
                new FateEvent(2.0, FateKind.ESCAPED, List.of("Tessaly")),
                new FateEvent(9.0, FateKind.RIPPED, List.of("Brin"))));
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
        SceneFrame withFuture = cloud(100, 3).setEvents(List.of(new FateEvent(9.0, FateKind.RIPPED, List.of("Brin"))));
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(320, 200, 50),
                new RenderSettings().noOverlays().overlay(Overlay.EVENTS, true))) {
            int[] a = pixels(r.render(before, front()));
            int[] b = pixels(r.render(withFuture, front()));
            assertArrayEquals(a, b);
        }
    }

    @Test
    void eventWordsNameTheMembers() {
        assertEquals("Brin merged with Orrin", new FateEvent(1, FateKind.MERGED, List.of("Brin", "Orrin")).describe());
        assertEquals("Tessaly broke free", new FateEvent(1, FateKind.ESCAPED, List.of("Tessaly")).describe());
        assertEquals("Vell torn apart", new FateEvent(1, FateKind.RIPPED, List.of("Vell")).describe());
    }

    private static float maxOf(LightBuffer light, int channel) {
        float[] a = light.copyRgb();
        float m = Float.NEGATIVE_INFINITY;
        for (int i = channel; i < a.length; i += 3) {
            m = Math.max(m, a[i]);
        }
        return m;
    }
}
