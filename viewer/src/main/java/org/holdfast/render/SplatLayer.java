package org.holdfast.render;

import java.util.Arrays;
import java.util.concurrent.ForkJoinPool;
import java.util.function.IntConsumer;
import java.util.stream.IntStream;

import org.holdfast.render.projection.Projection;

/**
 * Draws every tracer of a scene as an additive Gaussian splat, in parallel but
 * deterministically. Two stages, each over a fixed partition that does not depend on the
 * number of threads:
 * <ol>
 * <li>per chunk of tracers: camera transform, projection, inverse-square brightness and colour;
 *     each visible splat is appended to the chunk's own list for every band of rows it touches,
 *     so each list is in tracer order;</li>
 * <li>per band: the lists of that band are drawn chunk by chunk, in chunk order, touching only
 *     the band's rows.</li>
 * </ol>
 * The caller runs stage 2 inside its own task per band ({@link FrameRenderer} clears the band
 * first and draws trails, centres and the stretch after it), so a band is finished while its rows
 * are still in cache.
 * Every pixel thus receives its splats in tracer order on any thread count, and the float sums
 * come out bit for bit the same. The lists grow when a frame needs more room and are kept for
 * the next frame, so a film allocates only while its busiest bands are still growing.
 */
final class SplatLayer {

    /** Rows per band. */
    static final int BAND_ROWS = 16;
    /** Chunks of tracers in stage 1 (fixed, so the result ignores the thread count). */
    static final int CHUNKS = 64;
    /** Floats per listed splat: x, y, red, green, blue. */
    private static final int STRIDE = 5;
    private static final int FIRST_CAPACITY = 64 * STRIDE;

    private final SplatKernel kernel;
    private final int width;
    private final int height;
    private final int bands;
    /** lists[chunk * bands + band]: the splats of one chunk that one band draws. */
    private final float[][] lists;
    /** Floats used in each list. */
    private final int[] used;
    private final double[][] scratch = new double[CHUNKS][2];

    SplatLayer(SplatKernel kernel, int width, int height) {
        this.kernel = kernel;
        this.width = width;
        this.height = height;
        this.bands = bands(height);
        this.lists = new float[CHUNKS * bands][];
        this.used = new int[CHUNKS * bands];
        for (int i = 0; i < lists.length; i++) {
            lists[i] = new float[FIRST_CAPACITY];
        }
    }

    /**
     * Stage 1: projects the scene's tracers into this layer's band lists, on all threads. Then
     * {@link #drawBand} draws them, one band at a time, into rows its caller has cleared.
     *
     * @param view world-to-camera rotation, row-major
     * @param minD2 squared distance below which a splat brightens no further (kpc^2)
     * @param colours per colour index: red, green, blue of a star (3 floats each), then the flow
     *        tracer colour in the last three slots
     */
    void project(SceneFrame scene, double[] view, double ex, double ey, double ez, Projection projection,
            double starScale, double flowScale, double minD2, float[] colours, ForkJoinPool pool) {
        int n = scene.tracerCount();
        run(pool, CHUNKS, c -> project(c, n, scene, view, ex, ey, ez, projection, starScale, flowScale, minD2,
                colours));
    }

    /** Number of bands of {@link #BAND_ROWS} rows in a frame {@code height} rows tall. */
    static int bands(int height) {
        return (height + BAND_ROWS - 1) / BAND_ROWS;
    }

    /** Runs tasks 0..tasks-1 on the pool, or inline on the caller's thread when it has one thread. */
    static void run(ForkJoinPool pool, int tasks, IntConsumer body) {
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
        int base = chunk * bands;
        Arrays.fill(used, base, base + bands, 0);
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
                continue;
            }
            double px = out[0];
            double py = out[1];
            if (px < -r - 1 || px > width + r + 1 || py < -r - 1 || py > height + r + 1) {
                continue;
            }
            int h = host[i];
            int slot = h < 0 ? flowSlot : 3 * (h < palette ? h : h % palette);
            double flux = (h < 0 ? flowScale : starScale) / Math.max(d2, minD2);
            float fr = (float) (flux * colours[slot]);
            float fg = (float) (flux * colours[slot + 1]);
            float fb = (float) (flux * colours[slot + 2]);
            int row = (int) Math.floor(py);
            int b0 = Math.max(0, (row - r) / BAND_ROWS);
            int b1 = Math.min(bands - 1, Math.max(0, row + r) / BAND_ROWS);
            for (int b = b0; b <= b1; b++) {
                append(base + b, (float) px, (float) py, fr, fg, fb);
            }
        }
    }

    private void append(int list, float px, float py, float r, float g, float b) {
        int k = used[list];
        float[] l = lists[list];
        if (k + STRIDE > l.length) {
            l = Arrays.copyOf(l, l.length + l.length / 2 + STRIDE);
            lists[list] = l;
        }
        l[k] = px;
        l[k + 1] = py;
        l[k + 2] = r;
        l[k + 3] = g;
        l[k + 4] = b;
        used[list] = k + STRIDE;
    }

    /** Stage 2 for one band: draws its splats, chunk by chunk, touching only the band's rows. */
    void drawBand(int band, LightBuffer light) {
        int rowFrom = band * BAND_ROWS;
        int rowTo = Math.min(height, rowFrom + BAND_ROWS);
        for (int c = 0; c < CHUNKS; c++) {
            int list = c * bands + band;
            float[] p = lists[list];
            for (int k = 0, end = used[list]; k < end; k += STRIDE) {
                kernel.draw(light, p[k], p[k + 1], p[k + 2], p[k + 3], p[k + 4], rowFrom, rowTo);
            }
        }
    }

    private static int start(int chunk, int n) {
        return (int) ((long) chunk * n / CHUNKS);
    }
}
