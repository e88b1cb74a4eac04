package org.holdfast.forces;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.atomic.AtomicInteger;

import org.holdfast.halos.HaloProfile;

/**
 * Moves the massless tracers in the field of all bodies' halos plus the background term c r,
 * in parallel over fixed chunks of tracers. Every tracer is computed on its own from the same
 * inputs, so the results do not depend on the number of threads.
 */
public final class TracerField implements AutoCloseable {

    private static final int CHUNK = 4096;

    private final ForkJoinPool pool;
    private final int threads;
    private double[] bx = new double[0];
    private double[] by = new double[0];
    private double[] bz = new double[0];
    private HaloProfile[] halos = new HaloProfile[0];
    private int[] firstBad = new int[0];

    /** @param threads worker threads; 0 for all cores */
    public TracerField(int threads) {
        this.threads = threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
        this.pool = this.threads == 1 ? null : new ForkJoinPool(this.threads - 1);
    }

    /** Threads in use. */
    public int threads() {
        return threads;
    }

    /** Sets every tracer's acceleration: c r plus the pull of every body's halo. */
    public void accelerate(Tracers t, Bodies b, double c) {
        int n = b.count();
        if (bx.length < n) {
            bx = new double[b.x.length];
            by = new double[b.x.length];
            bz = new double[b.x.length];
            halos = new HaloProfile[b.x.length];
        }
        System.arraycopy(b.x, 0, bx, 0, n);
        System.arraycopy(b.y, 0, by, 0, n);
        System.arraycopy(b.z, 0, bz, 0, n);
        System.arraycopy(b.halo, 0, halos, 0, n);
        forChunks(t.count, (from, to) -> accelerateRange(t, n, c, from, to));
    }

    private void accelerateRange(Tracers t, int n, double c, int from, int to) {
        double[] x = t.x;
        double[] y = t.y;
        double[] z = t.z;
        for (int j = from; j < to; j++) {
            double xj = x[j];
            double yj = y[j];
            double zj = z[j];
            double ax = c * xj;
            double ay = c * yj;
            double az = c * zj;
            for (int i = 0; i < n; i++) {
                double dx = bx[i] - xj;
                double dy = by[i] - yj;
                double dz = bz[i] - zj;
                double r2 = dx * dx + dy * dy + dz * dz;
                if (r2 > 0) {
                    double f = halos[i].pullOverR(Math.sqrt(r2));
                    ax += f * dx;
                    ay += f * dy;
                    az += f * dz;
                }
            }
            t.ax[j] = ax;
            t.ay[j] = ay;
            t.az[j] = az;
        }
    }

    /** v += a h. */
    public void kick(Tracers t, double h) {
        forChunks(t.count, (from, to) -> {
            for (int j = from; j < to; j++) {
                t.vx[j] += h * t.ax[j];
                t.vy[j] += h * t.ay[j];
                t.vz[j] += h * t.az[j];
            }
        });
    }

    /** x += v h. */
    public void drift(Tracers t, double h) {
        forChunks(t.count, (from, to) -> {
            for (int j = from; j < to; j++) {
                t.x[j] += h * t.vx[j];
                t.y[j] += h * t.vy[j];
                t.z[j] += h * t.vz[j];
            }
        });
    }

    /** Index of the first tracer with a non-finite position or velocity, or -1; on all threads. */
    public int firstNonFinite(Tracers t) {
        int chunks = (t.count + CHUNK - 1) / CHUNK;
        if (firstBad.length < chunks) {
            firstBad = new int[chunks];
        }
        int[] bad = firstBad;
        forChunks(t.count, (from, to) -> bad[from / CHUNK] = firstNonFinite(t, from, to));
        if (pool == null || chunks <= 1) {
            return bad[0];
        }
        for (int k = 0; k < chunks; k++) {
            if (bad[k] >= 0) {
                return bad[k];
            }
        }
        return -1;
    }

    private static int firstNonFinite(Tracers t, int from, int to) {
        for (int j = from; j < to; j++) {
            if (!Double.isFinite(t.x[j] + t.y[j] + t.z[j] + t.vx[j] + t.vy[j] + t.vz[j])) {
                return j;
            }
        }
        return -1;
    }

    /** A piece of work on tracers [from, to). */
    @FunctionalInterface
    interface Range {
        void run(int from, int to);
    }

    private void forChunks(int count, Range work) {
        int chunks = (count + CHUNK - 1) / CHUNK;
        if (pool == null || chunks <= 1) {
            work.run(0, count);
            return;
        }
        // each thread takes the next free chunk until none is left; the caller works too
        AtomicInteger next = new AtomicInteger();
        Runnable worker = () -> {
            for (int k = next.getAndIncrement(); k < chunks; k = next.getAndIncrement()) {
                work.run(k * CHUNK, Math.min(count, (k + 1) * CHUNK));
            }
        };
        int helpers = Math.min(threads, chunks) - 1;
        ForkJoinTask<?>[] running = new ForkJoinTask<?>[helpers];
        for (int i = 0; i < helpers; i++) {
            running[i] = pool.submit(worker);
        }
        worker.run();
        for (ForkJoinTask<?> task : running) {
            task.join();
        }
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.shutdown();
        }
    }
}
