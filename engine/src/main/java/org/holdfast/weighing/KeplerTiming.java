package org.holdfast.weighing;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.units.Units;

/**
 * The classical timing argument with tangential motion in closed form: a bound Kepler orbit
 * whose pericentre passage was the Big Bang, r = a (1 - e cos eta), t = sqrt(a^3 / G M)
 * (eta - e sin eta), v_r = sqrt(G M / a) e sin eta / (1 - e cos eta), v_t = sqrt(G M / a)
 * sqrt(1 - e^2) / (1 - e cos eta) (van der Marel et al. 2012, ApJ 753, 8, section 4.1, after Li
 * &amp; White 2008, MNRAS 384, 1459 — equations as recalled, from memory). With v_t = 0 it is
 * the radial solution of Kahn &amp; Woltjer 1959 (e = 1). Used as the independent check of the
 * integrated solution without background, and as its starting guess.
 */
public final class KeplerTiming {

    /**
     * @param massMsun the mass
     * @param eccentricity e
     * @param semiMajorKpc a
     * @param etaRad the eccentric anomaly today (pi to 2 pi: approaching)
     */
    public record Orbit(double massMsun, double eccentricity, double semiMajorKpc, double etaRad) {
        /** Pericentre a (1 - e), kpc. */
        public double pericentreKpc() {
            return semiMajorKpc * (1 - eccentricity);
        }

        /** Apocentre a (1 + e), kpc. */
        public double apocentreKpc() {
            return semiMajorKpc * (1 + eccentricity);
        }

        /** Period 2 pi sqrt(a^3 / G M), Gyr. */
        public double periodGyr() {
            return 2 * Math.PI * Math.sqrt(Math.pow(semiMajorKpc, 3) / (Units.G * massMsun));
        }
    }

    private KeplerTiming() {
    }

    /**
     * The bound first-orbit solution, or null when there is none (a receding pair too fast
     * for a bound orbit from the Big Bang).
     */
    public static Orbit solve(PairMotion p) {
        double vr = Units.kmsToKpcPerGyr(p.radialKms());
        double vt = Units.kmsToKpcPerGyr(p.tangentialKms());
        double target = vr * p.ageGyr() / p.separationKpc();
        double rho = vt == 0 ? Double.POSITIVE_INFINITY : vr / vt;
        // v_r t / r = e sin eta (eta - e sin eta) / (1 - e cos eta)^2, with e fixed by v_r / v_t
        java.util.function.DoubleUnaryOperator f = eta -> {
            double e = eccentricity(eta, rho);
            double c = 1 - e * Math.cos(eta);
            return e * Math.sin(eta) * (eta - e * Math.sin(eta)) / (c * c) - target;
        };
        double lo = vr < 0 ? Math.PI + 1e-12 : 1e-9;
        double hi = vr < 0 ? 2 * Math.PI - 1e-9 : Math.PI;
        if (vr == 0) {
            lo = Math.PI - 1e-6;
            hi = Math.PI + 1e-6;
        }
        // scan for the first sign change, then refine
        int n = 2000;
        double a = lo;
        double fa = f.applyAsDouble(a);
        for (int i = 1; i <= n; i++) {
            double b = lo + (hi - lo) * i / n;
            double fb = f.applyAsDouble(b);
            if (fa == 0 || fa * fb < 0) {
                double eta = fa == 0 ? a : new BrentSolver(1e-15, 1e-15).solve(500, f::applyAsDouble, a, b);
                return orbit(p, eta, eccentricity(eta, rho));
            }
            a = b;
            fa = fb;
        }
        return null;
    }

    private static double eccentricity(double eta, double rho) {
        if (Double.isInfinite(rho)) {
            return 1;
        }
        double s = Math.sin(eta);
        return Math.abs(rho) / Math.sqrt(s * s + rho * rho);
    }

    private static Orbit orbit(PairMotion p, double eta, double e) {
        double a = p.separationKpc() / (1 - e * Math.cos(eta));
        double phase = eta - e * Math.sin(eta);
        double gm = Math.pow(a, 3) * phase * phase / (p.ageGyr() * p.ageGyr());
        return new Orbit(gm / Units.G, e, a, eta);
    }
}
