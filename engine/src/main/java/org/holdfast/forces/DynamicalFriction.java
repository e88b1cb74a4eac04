package org.holdfast.forces;

import java.util.HashMap;
import java.util.Map;

import org.apache.commons.math3.special.Erf;
import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.JeansDispersion;
import org.holdfast.units.Units;
import org.holdfast.group.CoulombLog;

/**
 * Chandrasekhar's dynamical friction for a Maxwellian background (Binney &amp; Tremaine 2008,
 * Galactic Dynamics, 2nd ed., eq. 8.7):
 * <pre>
 *   dv/dt = -(4 pi G^2 M rho ln Lambda / v^3) [erf X - (2X / sqrt(pi)) exp(-X^2)] v,
 *   X = v / (sqrt(2) sigma),
 * </pre>
 * once for every pair: the lighter body i (the satellite; on a tie, the one listed later) inside
 * the halo of the heavier j (the host), with v its velocity relative to j, rho and sigma those of
 * j's halo at i's place (isotropic Jeans dispersion, {@link JeansDispersion}) and M the bound
 * mass of i. Host j takes the equal and opposite reaction, so total momentum and the centre of
 * mass are kept. Counting each pair once keeps the drag continuous in the mass ratio q: at
 * q = 1 either choice of satellite gives the same force for identical halos, where braking both
 * ways would double it (and jump at q = 1). The Coulomb logarithm is
 * mass-ratio aware by default ({@link CoulombLog#DEFAULT}).
 *
 * <p>The work the drag does is handed to the energy budget by {@link #work}, counted in each
 * kick, so the budget E = K + W + ... - work stays constant to integration error.
 */
public final class DynamicalFriction {

    private static final double TWO_OVER_SQRT_PI = 2 / Math.sqrt(Math.PI);

    private final Map<Object, JeansDispersion> dispersions = new HashMap<>();
    private final Map<String, CoulombLog> logs;
    private final CoulombLog runWide;
    private JeansDispersion[] sigmaOf = new JeansDispersion[0];
    private CoulombLog[] logOf = new CoulombLog[0];
    private double[] fx = new double[0];
    private double[] fy = new double[0];
    private double[] fz = new double[0];
    private double shortestTime = Double.POSITIVE_INFINITY;

    /**
     * @param runWide the run's Coulomb logarithm
     * @param perBody members' own Coulomb logarithms, by name (others use the run's)
     */
    public DynamicalFriction(CoulombLog runWide, Map<String, CoulombLog> perBody) {
        this.runWide = runWide;
        this.logs = Map.copyOf(perBody);
    }

    /**
     * Takes note of the bodies present (after building and after every merger).
     *
     * @throws IllegalArgumentException when a prescription needs a length a member lacks
     */
    public void refresh(Bodies b) {
        int cap = b.x.length;
        if (fx.length != cap) {
            fx = new double[cap];
            fy = new double[cap];
            fz = new double[cap];
            sigmaOf = new JeansDispersion[cap];
            logOf = new CoulombLog[cap];
        }
        for (int i = 0; i < b.count(); i++) {
            HaloProfile h = b.halo[i];
            sigmaOf[i] = dispersions.computeIfAbsent(h.shapeKey(), k -> JeansDispersion.of(h));
            logOf[i] = logs.getOrDefault(b.name[i], runWide);
            if (logOf[i].needsLength() && !(h.lengthKpc() > 0)) {
                throw new IllegalArgumentException("coulomb_log: '" + logOf[i] + "' needs a member with a softening or"
                        + " scale length, but '" + b.name[i] + "' is a bare point (give its halo softening_kpc)");
            }
        }
        for (int i = b.count(); i < cap; i++) {
            sigmaOf[i] = null;
            logOf[i] = null;
        }
    }

    /** Sets the drag on every body and adds it into ax, ay, az. */
    public void accelerate(Bodies b) {
        int n = b.count();
        java.util.Arrays.fill(fx, 0, n, 0);
        java.util.Arrays.fill(fy, 0, n, 0);
        java.util.Arrays.fill(fz, 0, n, 0);
        double shortest = Double.POSITIVE_INFINITY;
        for (int p = 0; p < n; p++) {
            for (int q = p + 1; q < n; q++) {
                // one satellite per pair: the lighter, or the later on a tie
                int i = b.mass[p] < b.mass[q] ? p : q;
                int j = i == p ? q : p;
                double rate = dragRate(b, i, j);
                if (rate > 0) {
                    double dvx = b.vx[i] - b.vx[j];
                    double dvy = b.vy[i] - b.vy[j];
                    double dvz = b.vz[i] - b.vz[j];
                    double back = b.mass[i] / b.mass[j];
                    fx[i] -= rate * dvx;
                    fy[i] -= rate * dvy;
                    fz[i] -= rate * dvz;
                    fx[j] += back * rate * dvx;
                    fy[j] += back * rate * dvy;
                    fz[j] += back * rate * dvz;
                    shortest = Math.min(shortest, 1 / rate);
                }
            }
        }
        for (int i = 0; i < n; i++) {
            b.ax[i] += fx[i];
            b.ay[i] += fy[i];
            b.az[i] += fz[i];
        }
        shortestTime = shortest;
    }

    /** The drag coefficient on i in j's halo, 1/Gyr (acceleration = -rate * relative velocity). */
    double dragRate(Bodies b, int i, int j) {
        double dx = b.x[i] - b.x[j];
        double dy = b.y[i] - b.y[j];
        double dz = b.z[i] - b.z[j];
        double r = Math.sqrt(dx * dx + dy * dy + dz * dz);
        HaloProfile host = b.halo[j];
        if (!(r > 0) || r >= host.extentKpc()) {
            return 0;
        }
        double rho = host.density(r);
        if (!(rho > 0)) {
            return 0;
        }
        double lnLambda = logOf[i].at(r, b.halo[i].lengthKpc(), b.mass[j], b.mass[i]);
        if (!(lnLambda > 0)) {
            return 0;
        }
        double dvx = b.vx[i] - b.vx[j];
        double dvy = b.vy[i] - b.vy[j];
        double dvz = b.vz[i] - b.vz[j];
        double v = Math.sqrt(dvx * dvx + dvy * dvy + dvz * dvz);
        double sigma = sigmaOf[j].sigma(r);
        double g = Units.G;
        double front = 4 * Math.PI * g * g * b.mass[i] * rho * lnLambda;
        if (!(sigma > 0)) {
            return v > 0 ? front / (v * v * v) : 0;
        }
        double s = Math.sqrt(2) * sigma;
        double x = v / s;
        return front * shapeOverCube(x) / (s * s * s);
    }

    /**
     * [erf X - (2X/sqrt(pi)) exp(-X^2)] / X^3, by its series 4/(3 sqrt(pi)) (1 - 3X^2/5 + ...)
     * near 0 where the difference cancels.
     */
    static double shapeOverCube(double x) {
        if (x < 1e-2) {
            double x2 = x * x;
            return 2 * TWO_OVER_SQRT_PI / 3 * (1 - 0.6 * x2 + 3.0 / 14 * x2 * x2);
        }
        return (Erf.erf(x) - TWO_OVER_SQRT_PI * x * Math.exp(-x * x)) / (x * x * x);
    }

    /** The shortest braking time 1/rate of any pair at the last evaluation, Gyr. */
    public double timescale() {
        return shortestTime;
    }

    /**
     * Work the drag does in a kick v += h a (a including the drag), Msun kpc^2/Gyr^2: the
     * drag's share h m f . (v + h a / 2) of each body's change of kinetic energy.
     */
    public double work(Bodies b, double h) {
        double w = 0;
        for (int i = 0; i < b.count(); i++) {
            double mx = b.vx[i] + 0.5 * h * b.ax[i];
            double my = b.vy[i] + 0.5 * h * b.ay[i];
            double mz = b.vz[i] + 0.5 * h * b.az[i];
            w += h * b.mass[i] * (fx[i] * mx + fy[i] * my + fz[i] * mz);
        }
        return w;
    }

    /** The drag accelerations last set (the first count entries are live). */
    public double[][] accelerations() {
        return new double[][] {fx, fy, fz};
    }

    /** Copies the drag accelerations of n bodies into dest (3n long). */
    public void save(double[] dest, int n) {
        System.arraycopy(fx, 0, dest, 0, n);
        System.arraycopy(fy, 0, dest, n, n);
        System.arraycopy(fz, 0, dest, 2 * n, n);
    }

    /** Restores what {@link #save} copied. */
    public void restore(double[] src, int n) {
        System.arraycopy(src, 0, fx, 0, n);
        System.arraycopy(src, n, fy, 0, n);
        System.arraycopy(src, 2 * n, fz, 0, n);
    }
}
