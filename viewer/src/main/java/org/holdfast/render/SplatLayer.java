package org.holdfast.render;

import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

import org.holdfast.render.projection.Projection;

/**
 * Draws every tracer of a scene as an additive Gaussian splat, in parallel but
 * deterministically. Three stages, each over a fixed partition that does not depend on the
 * number of threads:
 * <ol>
 * <li>per chunk of tracers: camera transform, projection, inverse-square brightness and colour,
 *     each written to the tracer's own slot, and a count of tracers per band of rows;</li>
 * <li>per chunk: each splat is copied into the lists of the bands it touches, at offsets fixed
 *     by the counts, so every band's list is in tracer order and is read front to back;</li>
 * <li>per band: the band's splats are drawn in list order, touching only the band's rows.</li>
 * </ol>
 * Every pixel thus receives its splats in the same order on any thread count, and the float
 * sums come out bit for bit the same.
 */
final class SplatLayer {

    /** Rows per band. */
    static final int BAND_ROWS = 16;
    /** Chunks of tracers in stages 1 and 2 (fixed, so the result ignores the thread count). */
    static final int CHUNKS = 64;
    /** Floats per binned splat. */
    private static final int STRIDE = 5;

    private final SplatKernel kernel;
    private final int width;
    private final int height;
    private final int bands;
    private final int maxBandsPerSplat;
    private final int[] counts;
    private final int[] offsets;
    private final int[] bandStart;
    private final double[][] scratch = new double[CHUNKS][2];

    private int capacity;
    private float[] sx = new float[0];
    private float[] sy = new float[0];
    private float[] sr = new float[0];
    private float[] sg = new float[0];
    private float[] sb = new float[0];
    /** Per band, in band order: x, y, r, g, b of each splat the band draws. */
    private float[] binned = new float[0];

    SplatLayer(SplatKernel kernel, int width, int height) {
        this.kernel = kernel;
        this.width = width;
        this.height = height;
        this.bands = (height + BAND_ROWS - 1) / BAND_ROWS;
        this.maxBandsPerSplat = (2 * kernel.radius() + BAND_ROWS) / BAND_ROWS + 1;
        this.counts = new int[CHUNKS * bands];
        this.offsets = new int[CHUNKS * bands];
        this.bandStart = new int[bands + 1];
    }

    private void ensureCapacity(int n) {
        if (n > capacity) {
            capacity = Math.max(n, capacity + capacity / 2);
            sx = new float[capacity];
            sy = new float[capacity];
            sr = new float[capacity];
            sg = new float[capacity];
            sb = new float[capacity];
            binned = new float[STRIDE * capacity * maxBandsPerSplat];
        }
    }

    /**
     * Draws the scene's tracers into {@code light}.
     *
     * @param view world-to-camera rotation, row-major
     * @param minD2 squared distance below which a splat brightens no further (kpc^2)
     * @param colours per colour index: red, green, blue of a star (3 floats each), then the flow
     *        tracer colour in the last three slots
     */
    void draw(SceneFrame scene, double[] view, double ex, double ey, double ez, Projection projection,
            double starScale, double flowScale, double minD2, float[] colours, LightBuffer light,
            ForkJoinPool pool) {
        int n = scene.tracerCount();
        ensureCapacity(n);
        run(pool, CHUNKS, c -> project(c, n, scene, view, ex, ey, ez, projection, starScale, flowScale, minD2,
                colours));
        int total = 0;
        for (int b = 0; b < bands; b++) {
            bandStart[b] = total;
            for (int c = 0; c < CHUNKS; c++) {
                offsets[c * bands + b] = total;
                total += counts[c * bands + b];
            }
        }
        bandStart[bands] = total;
        run(pool, CHUNKS, c -> bin(c, n));
        run(pool, bands, b -> drawBand(b, light));
    }

    /** Runs tasks 0..tasks-1 on the pool, or inline on the caller's thread when it has one thread. */
    static void run(ForkJoinPool pool, int tasks, java.util.function.IntConsumer body) {
        if (pool.getParallelism() == 1) {
            for (int t = 0; t < tasks; t++) {
                body.accept(t);
            }
        } else {
            pool.submit(() -> IntStream.range(0, tasks).parallel().forEach(body)).join();
        }
    }

    private void project(int chunk, int n, SceneFrame scene, double[] m, double ex, double ey, double ez,
            Projection projection, double starScale, double flowScale, double minD2, float[] colours) {
        float[] x = scene.tracerXs();
        float[] y = scene.tracerYs();
        float[] z = scene.tracerZs();
        int[] host = scene.tracerHosts();
        double[] out = scratch[chunk];
        int[] count = counts;
        int base = chunk * bands;
        java.util.Arrays.fill(count, base, base + bands, 0);
        int r = kernel.radius();
        int flowSlot = colours.length - 3;
        int palette = flowSlot / 3;
        for (int i = start(chunk, n), end = start(chunk + 1, n); i < end; i++) {
            double wx = x[i] - ex;
            double wy = y[i] - ey;
            double wz = z[i] - ez;
            double cx = m[0] * wx + m[1] * wy + m[2] * wz;
            double cy = m[3] * wx + m[4] * wy + m[5] * wz;
            double cz = m[6] * wx + m[7] * wy + m[8] * wz;
            double d2 = cx * cx + cy * cy + cz * cz;
            if (!(d2 > 0) || !projection.project(cx, cy, cz, out)) {
                sy[i] = Float.NaN;
                continue;
            }
            double px = out[0];
            double py = out[1];
            if (px < -r - 1 || px > width + r + 1 || py < -r - 1 || py > height + r + 1) {
                sy[i] = Float.NaN;
                continue;
            }
            int h = host[i];
            int slot = h < 0 ? flowSlot : 3 * (h < palette ? h : h % palette);
            double flux = (h < 0 ? flowScale : starScale) / Math.max(d2, minD2);
            sx[i] = (float) px;
            sy[i] = (float) py;
            sr[i] = (float) (flux * colours[slot]);
            sg[i] = (float) (flux * colours[slot + 1]);
            sb[i] = (float) (flux * colours[slot + 2]);
            int row = (int) Math.floor(py);
            int b0 = Math.max(0, (row - r) / BAND_ROWS);
            int b1 = Math.min(bands - 1, Math.max(0, row + r) / BAND_ROWS);
            for (int b = b0; b <= b1; b++) {
                count[base + b]++;
            }
        }
    }

    private void bin(int chunk, int n) {
        int r = kernel.radius();
        int base = chunk * bands;
        for (int i = start(chunk, n), end = start(chunk + 1, n); i < end; i++) {
            float py = sy[i];
            if (Float.isNaN(py)) {
                continue;
            }
            int row = (int) Math.floor(py);
            int b0 = Math.max(0, (row - r) / BAND_ROWS);
            int b1 = Math.min(bands - 1, Math.max(0, row + r) / BAND_ROWS);
            float px = sx[i];
            float r0 = sr[i];
            float g0 = sg[i];
            float b0c = sb[i];
            for (int b = b0; b <= b1; b++) {
                int k = STRIDE * offsets[base + b]++;
                binned[k] = px;
                binned[k + 1] = py;
                binned[k + 2] = r0;
                binned[k + 3] = g0;
                binned[k + 4] = b0c;
            }
        }
    }

    private void drawBand(int band, LightBuffer light) {
        int rowFrom = band * BAND_ROWS;
        int rowTo = Math.min(height, rowFrom + BAND_ROWS);
        float[] p = binned;
        for (int k = STRIDE * bandStart[band], end = STRIDE * bandStart[band + 1]; k < end; k += STRIDE) {
            kernel.draw(light, p[k], p[k + 1], p[k + 2], p[k + 3], p[k + 4], rowFrom, rowTo);
        }
    }

    private static int start(int chunk, int n) {
        return (int) ((long) chunk * n / CHUNKS);
    }
}
