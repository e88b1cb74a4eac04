package org.holdfast.forces;

import org.holdfast.halos.PointHalo;
import org.holdfast.units.Units;

/**
 * Mutual gravity of all pairs of bodies by direct summation over the kernels of a
 * {@link KernelTable}. Each pair's pull is applied equal and opposite (momentum conserved to
 * round-off). When every body is a softened point the loop skips the kernel lookup.
 */
public final class PairGravity {

    private final KernelTable table;
    private double[] eps2 = new double[0];

    public PairGravity(KernelTable table) {
        this.table = table;
    }

    /** The kernels in use. */
    public KernelTable kernels() {
        return table;
    }

    /** Adds every body's acceleration from all the others into ax, ay, az. */
    public void accelerate(Bodies b) {
        int n = b.count();
        if (allPoints(b)) {
            softenedDirectSum(n, b.x, b.y, b.z, b.mass, eps2, b.ax, b.ay, b.az);
            return;
        }
        PairKernel[] k = table.matrix();
        int ns = table.shapeCount();
        double[] x = b.x;
        double[] y = b.y;
        double[] z = b.z;
        double[] m = b.mass;
        for (int i = 0; i < n; i++) {
            double xi = x[i];
            double yi = y[i];
            double zi = z[i];
            double axi = 0;
            double ayi = 0;
            double azi = 0;
            int row = b.shape[i] * ns;
            for (int j = i + 1; j < n; j++) {
                double dx = x[j] - xi;
                double dy = y[j] - yi;
                double dz = z[j] - zi;
                double f = k[row + b.shape[j]].pullOverD(Math.sqrt(dx * dx + dy * dy + dz * dz));
                double fj = f * m[j];
                double fi = f * m[i];
                axi += fj * dx;
                ayi += fj * dy;
                azi += fj * dz;
                b.ax[j] -= fi * dx;
                b.ay[j] -= fi * dy;
                b.az[j] -= fi * dz;
            }
            b.ax[i] += axi;
            b.ay[i] += ayi;
            b.az[i] += azi;
        }
    }

    /**
     * Direct sum of Plummer-softened point masses, eps_ij^2 = eps_i^2 + eps_j^2 (common
     * practice): the plain loop the benchmark measures. Adds into ax, ay, az.
     */
    public static void softenedDirectSum(int n, double[] x, double[] y, double[] z, double[] m, double[] eps2,
            double[] ax, double[] ay, double[] az) {
        final double g = Units.G;
        for (int i = 0; i < n; i++) {
            double xi = x[i];
            double yi = y[i];
            double zi = z[i];
            double ei = eps2[i];
            double mi = m[i];
            double axi = 0;
            double ayi = 0;
            double azi = 0;
            for (int j = i + 1; j < n; j++) {
                double dx = x[j] - xi;
                double dy = y[j] - yi;
                double dz = z[j] - zi;
                double s2 = dx * dx + dy * dy + dz * dz + ei + eps2[j];
                double f = g / (s2 * Math.sqrt(s2));
                double fj = f * m[j];
                double fi = f * mi;
                axi += fj * dx;
                ayi += fj * dy;
                azi += fj * dz;
                ax[j] -= fi * dx;
                ay[j] -= fi * dy;
                az[j] -= fi * dz;
            }
            ax[i] += axi;
            ay[i] += ayi;
            az[i] += azi;
        }
    }

    /** Total pair energy, sum over pairs of m_i m_j w(d_ij), compensated. */
    public double energy(Bodies b) {
        int n = b.count();
        CompensatedSum sum = new CompensatedSum();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                sum.add(b.mass[i] * b.mass[j] * table.kernel(b.shape[i], b.shape[j]).energy(distance(b, i, j)));
            }
        }
        return sum.value();
    }

    /**
     * The shortest dynamical time of any pair: min over pairs of sqrt(rho / |a_rel|) and
     * rho / |v_rel|, rho = sqrt(d^2 + l^2) with l the pair's inner length (common practice:
     * a free-fall and a crossing time, kept finite where halos overlap). Infinite for one body.
     */
    public double timescale(Bodies b) {
        int n = b.count();
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                PairKernel k = table.kernel(b.shape[i], b.shape[j]);
                double d = distance(b, i, j);
                double l = k.lengthKpc();
                double rho = Math.sqrt(d * d + l * l);
                double acc = (b.mass[i] + b.mass[j]) * k.pullOverD(d) * d;
                double dvx = b.vx[j] - b.vx[i];
                double dvy = b.vy[j] - b.vy[i];
                double dvz = b.vz[j] - b.vz[i];
                double v = Math.sqrt(dvx * dvx + dvy * dvy + dvz * dvz);
                // for a cusp the pull over d grows at small d; use the larger of d and the length there
                double accAtRho = Math.max(acc, (b.mass[i] + b.mass[j]) * k.pullOverD(rho) * rho);
                if (accAtRho > 0) {
                    best = Math.min(best, Math.sqrt(rho / accAtRho));
                }
                if (v > 0) {
                    best = Math.min(best, rho / v);
                }
            }
        }
        return best;
    }

    private static double distance(Bodies b, int i, int j) {
        double dx = b.x[j] - b.x[i];
        double dy = b.y[j] - b.y[i];
        double dz = b.z[j] - b.z[i];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    private boolean allPoints(Bodies b) {
        int n = b.count();
        if (eps2.length < n) {
            eps2 = new double[b.mass.length];
        }
        for (int i = 0; i < n; i++) {
            if (!(b.halo[i] instanceof PointHalo p)) {
                return false;
            }
            eps2[i] = p.softeningKpc() * p.softeningKpc();
        }
        return true;
    }
}
