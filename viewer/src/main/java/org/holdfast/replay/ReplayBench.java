package org.holdfast.replay;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.holdfast.bench.BenchSuite;
import org.holdfast.output.SnapshotWriter;
import org.holdfast.render.CameraPose;
import org.holdfast.render.FrameRenderer;
import org.holdfast.render.RenderSettings;
import org.holdfast.render.projection.FlatProjection;
import org.joml.Vector3d;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.WritableGroup;

/**
 * Suite "replay": how fast {@code holdfast render} turns a run folder into frames. A synthetic
 * run folder (invented galaxies and tracers on circles, written in the snapshot layout) is
 * replayed film-fashion, each frame a little later than the last so that a new pair of
 * snapshots is read every few frames. Target: a 30 s film at 30 frames per second, 1920x1080,
 * renders in under five minutes on this machine, i.e. at least 3 frames per second.
 */
public final class ReplayBench implements BenchSuite {

    static final double TARGET_FPS = 3;
    private static final int SNAPSHOTS = 12;
    private static final int GALAXIES = 15;

    @Override
    public String name() {
        return "replay";
    }

    @Override
    public void run(boolean quick, Map<String, Object> results) {
        int tracers = quick ? 20_000 : 200_000;
        Path root;
        try {
            root = Files.createTempDirectory("holdfast-replay-bench-");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try {
            write(root, tracers);
            RunArchive run = RunArchive.open(root);
            ReplayScene scene = new ReplayScene(run);
            int frames = quick ? 12 : 60;
            double span = run.latestGyr() - run.earliestGyr();
            long sceneNs = 0;
            long frameNs = 0;
            CameraPose pose = new CameraPose().lookAt(new Vector3d(0, -1500, 600), new Vector3d(), new Vector3d(0, 0, 1), 50);
            try (FrameRenderer r = new FrameRenderer(new FlatProjection(1920, 1080, 50),
                    new RenderSettings().referenceDistanceKpc(1500))) {
                for (int i = 0; i < frames; i++) {
                    double t = run.earliestGyr() + span * i / frames;
                    long t0 = System.nanoTime();
                    var s = scene.at(t);
                    long t1 = System.nanoTime();
                    r.render(s, pose);
                    long t2 = System.nanoTime();
                    sceneNs += t1 - t0;
                    frameNs += t2 - t0;
                }
            }
            results.put("replay_tracers", tracers);
            long bytes = steadyBytesPer100Frames(scene, run.timeOf(5), run.timeOf(6) - run.timeOf(5));
            results.put("replay_scene_bytes_per_100_frames", String.format(Locale.ROOT,
                    "%d within one snapshot interval, trails included (target 0: %s)", bytes, bytes == 0 ? "met" : "missed"));
            results.put("replay_scene_ms_per_frame", String.format(Locale.ROOT,
                    "%.1f (snapshot reads and interpolation, a new pair every %.1f frames)",
                    sceneNs * 1e-6 / frames, frames / (double) (SNAPSHOTS - 1)));
            double fps = frames / (frameNs * 1e-9);
            boolean met = fps >= TARGET_FPS;
            results.put("replay_fps_flat_1080p", String.format(Locale.ROOT, "%.2f frames/s (target >= %.0f: %s)", fps,
                    TARGET_FPS, met ? "met" : String.format(Locale.ROOT, "missed by %.0f%%", 100 * (1 - fps / TARGET_FPS))));
        } finally {
            delete(root);
        }
    }

    /**
     * Bytes a warmed scene allocates over 100 frames inside one snapshot interval (from t0, h
     * long): the least of a few rounds, because the JIT may rebuild an optimised-away object once
     * while it recompiles; an allocation per frame shows in every round. Its arrays have grown and
     * its two snapshots are loaded, so the target is none.
     */
    static long steadyBytesPer100Frames(ReplayScene scene, double t0, double h) {
        for (int i = 0; i < 2000; i++) {
            scene.at(t0 + h * (i % 100) / 100.0);
        }
        com.sun.management.ThreadMXBean threads =
                (com.sun.management.ThreadMXBean) java.lang.management.ManagementFactory.getThreadMXBean();
        long id = Thread.currentThread().getId();
        long least = Long.MAX_VALUE;
        for (int k = 0; k < 5 && least > 0; k++) {
            long before = threads.getThreadAllocatedBytes(id);
            for (int i = 0; i < 100; i++) {
                scene.at(t0 + h * i / 100.0);
            }
            least = Math.min(least, threads.getThreadAllocatedBytes(id) - before);
        }
        return least;
    }

    /** A run folder of invented members on circular paths, written as SnapshotWriter lays it out. */
    /** Writes a synthetic run folder: invented galaxies and tracers on circles, in the snapshot layout. */
    public static void write(Path root, int tracers) {
        Path snaps = root.resolve(SnapshotWriter.FOLDER);
        SplittableRandom rng = new SplittableRandom(20261201L);
        double[] radius = new double[GALAXIES + tracers];
        double[] phase = new double[radius.length];
        double[] height = new double[radius.length];
        for (int i = 0; i < radius.length; i++) {
            radius[i] = 50 + 900 * rng.nextDouble();
            phase[i] = 2 * Math.PI * rng.nextDouble();
            height[i] = 100 * (rng.nextDouble() - 0.5);
        }
        int[] host = new int[tracers];
        for (int j = 0; j < tracers; j++) {
            host[j] = j % (GALAXIES + 1) - 1;
        }
        String[] names = new String[GALAXIES];
        for (int g = 0; g < GALAXIES; g++) {
            names[g] = "Member-" + (char) ('A' + g);
        }
        try {
            Files.createDirectories(snaps);
            for (int k = 0; k < SNAPSHOTS; k++) {
                double t = 0.25 * k;
                try (WritableHdfFile f = HdfFile.write(snaps.resolve(SnapshotWriter.fileName(k)))) {
                    f.putAttribute("t_gyr", t);
                    f.putAttribute("scale_factor", 1 + 0.07 * t);
                    WritableGroup g = f.putGroup("galaxies");
                    double[][] p = new double[3][GALAXIES];
                    double[][] v = new double[3][GALAXIES];
                    circle(radius, phase, height, 0, GALAXIES, t, p, v);
                    g.putDataset("name", names);
                    g.putDataset("mass_msun", new double[GALAXIES]);
                    g.putDataset("position_kpc", p);
                    g.putDataset("velocity_kms", v);
                    double[][] tp = new double[3][tracers];
                    double[][] tv = new double[3][tracers];
                    circle(radius, phase, height, GALAXIES, tracers, t, tp, tv);
                    WritableGroup tr = f.putGroup("tracers");
                    tr.putDataset("position_kpc", toFloat(tp));
                    tr.putDataset("velocity_kms", toFloat(tv));
                    tr.putDataset("host", host);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Positions (kpc) and velocities (km/s) on circles turning once per 4 Gyr. */
    private static void circle(double[] r, double[] phase, double[] z, int from, int n, double t, double[][] p,
            double[][] v) {
        double omega = 2 * Math.PI / 4.0;
        double kms = 1 / org.holdfast.units.Units.KMS_TO_KPC_PER_GYR;
        for (int i = 0; i < n; i++) {
            double a = phase[from + i] + omega * t;
            p[0][i] = r[from + i] * Math.cos(a);
            p[1][i] = r[from + i] * Math.sin(a);
            p[2][i] = z[from + i];
            v[0][i] = -omega * r[from + i] * Math.sin(a) * kms;
            v[1][i] = omega * r[from + i] * Math.cos(a) * kms;
        }
    }

    private static float[][] toFloat(double[][] a) {
        float[][] out = new float[3][a[0].length];
        for (int c = 0; c < 3; c++) {
            for (int i = 0; i < a[0].length; i++) {
                out[c][i] = (float) a[c][i];
            }
        }
        return out;
    }

    /** Deletes a folder written by {@link #write}. */
    public static void delete(Path root) {
        try (Stream<Path> s = Files.walk(root)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }
}
