package org.holdfast.render.bench;

import java.awt.AlphaComposite;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.Locale;
import java.util.Map;

import org.holdfast.bench.BenchSuite;
import org.holdfast.render.CameraPose;
import org.holdfast.render.FrameRenderer;
import org.holdfast.render.Palette;
import org.holdfast.render.RenderSettings;
import org.holdfast.render.SceneFrame;
import org.holdfast.render.projection.DomeProjection;
import org.holdfast.render.projection.FlatProjection;
import org.holdfast.render.projection.Projection;
import org.joml.Vector3d;

/**
 * Suite "render": frames per second of the CPU renderer on all cores, and its speed against
 * the same splats drawn with plain Java2D calls (one alpha-composited {@code fillOval} each).
 */
public final class RenderBench implements BenchSuite {

    static final double TARGET_FLAT_FPS = 20;
    static final double TARGET_DOME_FPS = 3;
    static final double TARGET_SPEEDUP = 10;

    @Override
    public String name() {
        return "render";
    }

    @Override
    public void run(boolean quick, Map<String, Object> results) {
        int splats = quick ? 100_000 : 1_000_000;
        SceneFrame scene = BenchScene.build(splats, 20261201L);
        RenderSettings look = new RenderSettings().noOverlays();
        CameraPose far = new CameraPose().lookAt(new Vector3d(0, -420, 160), new Vector3d(), new Vector3d(0, 0, 1), 50);
        CameraPose inside = new CameraPose().lookAt(new Vector3d(0, -60, 0), new Vector3d(), new Vector3d(0, 0, 1), 50);
        results.put("render_splats", splats);
        results.put("render_threads", look.threads());
        // other work on the machine slows every figure below; say how busy it was
        results.put("render_load_average_at_start", String.format(Locale.ROOT, "%.2f",
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage()));

        double flatS = secondsPerFrame(new FlatProjection(1920, 1080, 50), look, scene, far, quick ? 5 : 30);
        results.put("render_fps_flat_1080p", verdict(1 / flatS, TARGET_FLAT_FPS, "frames/s"));
        double domeS = secondsPerFrame(new DomeProjection(4096, 180, 0), look, scene, inside, quick ? 2 : 8);
        results.put("render_fps_dome_4k", verdict(1 / domeS, TARGET_DOME_FPS, "frames/s"));

        // CPU time of one frame drawn on one thread: little affected by other work on the machine
        double flatCpuMs = cpuMsPerFrame(new FlatProjection(1920, 1080, 50), scene, far, quick ? 3 : 10);
        results.put("render_cpu_ms_per_frame_flat_1080p", String.format(Locale.ROOT,
                "%.1f (on %d idle cores at best %.1f frames/s)", flatCpuMs, look.threads(),
                1000 * look.threads() / flatCpuMs));
        double domeCpuMs = cpuMsPerFrame(new DomeProjection(4096, 180, 0), scene, inside, quick ? 1 : 4);
        results.put("render_cpu_ms_per_frame_dome_4k", String.format(Locale.ROOT,
                "%.1f (on %d idle cores at best %.1f frames/s)", domeCpuMs, look.threads(),
                1000 * look.threads() / domeCpuMs));

        double java2dS = java2dSecondsPerFrame(scene, far, quick ? 1 : 2);
        results.put("render_java2d_s_per_frame_1080p", String.format(Locale.ROOT, "%.3f", java2dS));
        results.put("render_speedup_vs_java2d", verdict(java2dS / flatS, TARGET_SPEEDUP, "x"));
    }

    private static double secondsPerFrame(Projection p, RenderSettings look, SceneFrame scene, CameraPose pose,
            int frames) {
        try (FrameRenderer r = new FrameRenderer(p, look)) {
            for (int i = 0; i < 3; i++) {
                r.render(scene, pose);
            }
            long t0 = System.nanoTime();
            for (int i = 0; i < frames; i++) {
                r.render(scene, pose);
            }
            return (System.nanoTime() - t0) * 1e-9 / frames;
        }
    }

    private static double cpuMsPerFrame(Projection p, SceneFrame scene, CameraPose pose, int frames) {
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        try (FrameRenderer r = new FrameRenderer(p, new RenderSettings().noOverlays().threads(1))) {
            for (int i = 0; i < 2; i++) {
                r.render(scene, pose);
            }
            long t0 = threads.getCurrentThreadCpuTime();
            for (int i = 0; i < frames; i++) {
                r.render(scene, pose);
            }
            return (threads.getCurrentThreadCpuTime() - t0) * 1e-6 / frames;
        }
    }

    /**
     * The same splats, projected the same way (projection not timed, in Java2D's favour), drawn as
     * 3-pixel ovals with their brightness as alpha into a 1080p image.
     */
    private static double java2dSecondsPerFrame(SceneFrame scene, CameraPose pose, int frames) {
        FlatProjection p = new FlatProjection(1920, 1080, 50);
        int n = scene.tracerCount();
        int[] px = new int[n];
        int[] py = new int[n];
        Color[] colour = new Color[n];
        Color[][] shades = new Color[Palette.size() + 1][16];
        for (int c = 0; c <= Palette.size(); c++) {
            int rgb = c < Palette.size() ? Palette.rgb(c) : 0xB8CCEB;
            for (int a = 0; a < 16; a++) {
                shades[c][a] = new Color((rgb >> 16) & 0xFF, (rgb >> 8) & 0xFF, rgb & 0xFF, 16 * a + 15);
            }
        }
        Java2dProjector.project(scene, pose, p, px, py, colour, shades);
        BufferedImage image = new BufferedImage(1920, 1080, BufferedImage.TYPE_INT_RGB);
        draw(image, n, px, py, colour);
        long t0 = System.nanoTime();
        for (int f = 0; f < frames; f++) {
            draw(image, n, px, py, colour);
        }
        return (System.nanoTime() - t0) * 1e-9 / frames;
    }

    private static void draw(BufferedImage image, int n, int[] px, int[] py, Color[] colour) {
        Graphics2D g = image.createGraphics();
        try {
            g.setComposite(AlphaComposite.SrcOver);
            g.setColor(Color.BLACK);
            g.fillRect(0, 0, image.getWidth(), image.getHeight());
            for (int i = 0; i < n; i++) {
                if (colour[i] != null) {
                    g.setColor(colour[i]);
                    g.fillOval(px[i] - 1, py[i] - 1, 3, 3);
                }
            }
        } finally {
            g.dispose();
        }
    }

    private static String verdict(double value, double target, String unit) {
        boolean met = value >= target;
        String miss = met ? "met" : String.format(Locale.ROOT, "missed by %.0f%%", 100 * (1 - value / target));
        return String.format(Locale.ROOT, "%.2f %s (target >= %.0f: %s)", value, unit, target, miss);
    }
}
