package org.holdfast.forces;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.atomic.AtomicInteger;

import org.holdfast.halos.HaloProfile;
import org.holdfast.integrators.DenseOutput;

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
            double fmax = TIDE_WEIGHT * Math.abs(c);
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
                    fmax = Math.max(fmax, f);
                }
            }
            t.ax[j] = ax;
            t.ay[j] = ay;
            t.az[j] = az;
            t.tau[j] = 1 / Math.sqrt(fmax);
        }
    }

    /**
     * Moves every tracer from tA to tB on its own steps against the bodies' dense output: a
     * tracer takes 2^k steps (leapfrog for stars, Nystr&ouml;m's fourth order for flow tracers), the least number whose step is
     * at most eta times its dynamical time (at most 2^{@value #MAX_LEVEL}), so stars deep in a halo step
     * often and flow tracers far out rarely. The bodies' positions and the background
     * coefficient are tabulated once on the finest grid any tracer uses. The accelerations
     * stored with the tracers must be those at tA (they are at tB afterwards). Each tracer is
     * computed on its own, so the result does not depend on the thread count.
     *
     * @param path the bodies' interpolant over [tA, tB], coordinates x..., y..., z...
     * @param n the number of bodies
     * @param halo the bodies' halos
     */
    public void advance(Tracers t, DenseOutput path, int n, HaloProfile[] halo, BackgroundTide tide, double tA,
            double tB, double eta) {
        double span = tB - tA;
        if (t.count == 0 || span == 0) {
            return;
        }
        double limit = Math.abs(span) / eta;
        forChunks(t.count, (from, to) -> {
            for (int j = from; j < to; j++) {
                double ratio = limit / t.tau[j];
                int k = 0;
                while (k < MAX_LEVEL && ratio > 1) {
                    ratio *= 0.5;
                    k++;
                }
                t.level[j] = k;
            }
        });
        int top = 0;
        for (int j = 0; j < t.count; j++) {
            top = Math.max(top, t.level[j]);
        }
        // the finest level's half steps are grid points too (the midpoint stage of the method)
        tabulate(path, n, halo, tide, tA, span, top + 1);
        int finest = top + 1;
        int chunks = (t.count + CHUNK - 1) / CHUNK;
        if (scratch.length < 4 * chunks) {
            scratch = new double[4 * chunks];
        }
        forChunks(t.count, (from, to) -> advanceRange(t, n, span, finest, from, to));
    }

    /**
     * The background's rate |c| counts four times over in a tracer's dynamical time (its time
     * scale halved): flow tracers far out, where it rules, are cheap, and their expansion with
     * a(t) is checked to 1e-8 (common practice: a tighter step where the error is measured).
     */
    static final double TIDE_WEIGHT = 4;

    /** The deepest step level of a tracer: 2^14 steps per step of the bodies. */
    public static final int MAX_LEVEL = 14;

    private double[] grid = new double[0];
    private double[] gridC = new double[0];
    private double[] sampleX = new double[0];
    private double[] sampleV = new double[0];

    private void tabulate(DenseOutput path, int n, HaloProfile[] halo, BackgroundTide tide, double tA, double span,
            int top) {
        int points = (1 << top) + 1;
        int width = 3 * n;
        if (grid.length < points * width) {
            grid = new double[points * width];
        }
        if (gridC.length < points) {
            gridC = new double[points];
        }
        if (sampleX.length < width) {
            sampleX = new double[width];
            sampleV = new double[width];
        }
        if (halos.length < n) {
            halos = new HaloProfile[n];
        }
        System.arraycopy(halo, 0, halos, 0, n);
        for (int m = 0; m < points; m++) {
            double time = m == points - 1 ? tA + span : tA + span * m / (points - 1);
            path.sample(time, sampleX, sampleV);
            System.arraycopy(sampleX, 0, grid, m * width, width);
            gridC[m] = tide.active() ? tide.coefficient(time) : 0;
        }
    }

    private double[] scratch = new double[0];

    /**
     * Stars (tracers with a host) take kick-drift-kick leapfrog steps; flow tracers, which ride
     * the smooth expansion, take steps of Nystr&ouml;m's fourth-order Runge-Kutta method for x'' = f(t, x) with nodes 0, 1/2, 1 and
     * Simpson's weights (Hairer, N&oslash;rsett &amp; Wanner 1993, Solving ODEs I, sec. II.14):
     * x1 = x + h v + h^2 (k1 + 2 k2) / 6, v1 = v + h (k1 + 4 k2 + k3) / 6, with
     * k2 = f(x + h v / 2 + h^2 k1 / 8) and k3 = f(x + h v + h^2 k2 / 2); k1 of the next step is
     * evaluated at x1 (three forces per step).
     */
    private void advanceRange(Tracers t, int n, double span, int top, int from, int to) {
        double[] k = scratch;
        int at0 = 4 * (from / CHUNK);
        for (int j = from; j < to; j++) {
            int level = t.level[j];
            int steps = 1 << level;
            int stride = 1 << (top - level);
            int half = stride >> 1;
            double h = span / steps;
            double h2 = h * h;
            double x = t.x[j];
            double y = t.y[j];
            double z = t.z[j];
            double vx = t.vx[j];
            double vy = t.vy[j];
            double vz = t.vz[j];
            double k1x = t.ax[j];
            double k1y = t.ay[j];
            double k1z = t.az[j];
            double fmax = 0;
            if (t.host[j] >= 0) {
                // a star: kick-drift-kick leapfrog, symplectic, so its orbit neither gains nor loses
                // energy over hundreds of orbits (Hairer, Lubich & Wanner 2006, sec. IX.3)
                for (int m = 1; m <= steps; m++) {
                    vx += 0.5 * h * k1x;
                    vy += 0.5 * h * k1y;
                    vz += 0.5 * h * k1z;
                    x += h * vx;
                    y += h * vy;
                    z += h * vz;
                    pull(n, m * stride, x, y, z, k, at0);
                    k1x = k[at0];
                    k1y = k[at0 + 1];
                    k1z = k[at0 + 2];
                    fmax = k[at0 + 3];
                    vx += 0.5 * h * k1x;
                    vy += 0.5 * h * k1y;
                    vz += 0.5 * h * k1z;
                }
                steps = 0;
            }
            for (int m = 0; m < steps; m++) {
                int base = m * stride;
                pull(n, base + half, x + 0.5 * h * vx + 0.125 * h2 * k1x, y + 0.5 * h * vy + 0.125 * h2 * k1y,
                        z + 0.5 * h * vz + 0.125 * h2 * k1z, k, at0);
                double k2x = k[at0];
                double k2y = k[at0 + 1];
                double k2z = k[at0 + 2];
                pull(n, base + stride, x + h * vx + 0.5 * h2 * k2x, y + h * vy + 0.5 * h2 * k2y,
                        z + h * vz + 0.5 * h2 * k2z, k, at0);
                double k3x = k[at0];
                double k3y = k[at0 + 1];
                double k3z = k[at0 + 2];
                x += h * vx + h2 * (k1x + 2 * k2x) / 6;
                y += h * vy + h2 * (k1y + 2 * k2y) / 6;
                z += h * vz + h2 * (k1z + 2 * k2z) / 6;
                vx += h * (k1x + 4 * k2x + k3x) / 6;
                vy += h * (k1y + 4 * k2y + k3y) / 6;
                vz += h * (k1z + 4 * k2z + k3z) / 6;
                pull(n, base + stride, x, y, z, k, at0);
                k1x = k[at0];
                k1y = k[at0 + 1];
                k1z = k[at0 + 2];
                fmax = k[at0 + 3];
            }
            t.x[j] = x;
            t.y[j] = y;
            t.z[j] = z;
            t.vx[j] = vx;
            t.vy[j] = vy;
            t.vz[j] = vz;
            t.ax[j] = k1x;
            t.ay[j] = k1y;
            t.az[j] = k1z;
            t.tau[j] = 1 / Math.sqrt(fmax);
        }
    }

    /** The acceleration at (x, y, z) at grid point m into out[at..at+2], the largest G M / r^3 into out[at+3]. */
    private void pull(int n, int m, double x, double y, double z, double[] out, int at) {
        double[] g = grid;
        int base = m * 3 * n;
        double c = gridC[m];
        double ax = c * x;
        double ay = c * y;
        double az = c * z;
        double fmax = TIDE_WEIGHT * Math.abs(c);
        for (int i = 0; i < n; i++) {
            double dx = g[base + i] - x;
            double dy = g[base + n + i] - y;
            double dz = g[base + 2 * n + i] - z;
            double r2 = dx * dx + dy * dy + dz * dz;
            if (r2 > 0) {
                double f = halos[i].pullOverR(Math.sqrt(r2));
                ax += f * dx;
                ay += f * dy;
                az += f * dz;
                fmax = Math.max(fmax, f);
            }
        }
        out[at] = ax;
        out[at + 1] = ay;
        out[at + 2] = az;
        out[at + 3] = fmax;
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
