package org.holdfast.fates;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.units.Units;

/**
 * Whether two masses are bound to each other in a dark-energy field. Their relative motion
 * (reduced two-body problem, total mass M) sees the effective potential
 * <pre>
 *   U(r) = -G M / r - (1/2) k r^2 + L^2 / (2 r^2)
 * </pre>
 * with k the dark-energy acceleration coefficient of the expansion and L the specific angular
 * momentum (Nesseris &amp; Perivolaropoulos 2004, PRD 70, 123529 — journal reference from memory).
 * For k &gt; 0 U has a barrier (a local maximum) at the larger root of
 * {@code G M r - k r^4 - L^2 = 0}; without the L term it is the zero-gravity radius
 * (G M / k)^(1/3). The pair is bound when it lies inside the barrier with energy below its top.
 * For k &le; 0 there is no barrier and the usual criterion E &lt; sup U applies.
 *
 * <p>Point masses are used for the total mass (common practice for binding estimates at the
 * separations where binding is in doubt, far outside the halos' cores).
 */
public final class Binding {

    private Binding() {
    }

    /** The outcome of one binding test. */
    public record Result(boolean bound, double energy, double barrierEnergy, double barrierKpc) {

        /**
         * How deeply bound, as (U_barrier - E) / |U_barrier|: positive when bound, larger is
         * deeper; +infinity when there is no barrier and the pair is bound.
         */
        public double depth() {
            if (Double.isInfinite(barrierEnergy)) {
                return bound ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            }
            return (barrierEnergy - energy) / Math.max(Math.abs(barrierEnergy), Double.MIN_NORMAL);
        }
    }

    /**
     * Tests a relative state.
     *
     * @param massMsun total mass of the pair
     * @param kPerGyr2 dark-energy coefficient k(t) in 1/Gyr^2
     * @param dx relative position, kpc
     * @param dv relative velocity, kpc/Gyr
     */
    public static Result test(double massMsun, double kPerGyr2, double[] dx, double[] dv) {
        double r = Math.sqrt(dx[0] * dx[0] + dx[1] * dx[1] + dx[2] * dx[2]);
        double lx = dx[1] * dv[2] - dx[2] * dv[1];
        double ly = dx[2] * dv[0] - dx[0] * dv[2];
        double lz = dx[0] * dv[1] - dx[1] * dv[0];
        double l2 = lx * lx + ly * ly + lz * lz;
        double v2 = dv[0] * dv[0] + dv[1] * dv[1] + dv[2] * dv[2];
        double gm = Units.G * massMsun;
        double energy = 0.5 * v2 - gm / r - 0.5 * kPerGyr2 * r * r;
        if (kPerGyr2 <= 0) {
            // No barrier: U rises to 0 (k = 0) or to +infinity (k < 0) at large r.
            boolean bound = kPerGyr2 < 0 || energy < 0;
            double top = kPerGyr2 < 0 ? Double.POSITIVE_INFINITY : 0.0;
            return new Result(bound, energy, top, Double.POSITIVE_INFINITY);
        }
        double barrier = barrierRadius(gm, kPerGyr2, l2);
        if (Double.isNaN(barrier)) {
            return new Result(false, energy, Double.NEGATIVE_INFINITY, Double.NaN);
        }
        double top = effectivePotential(gm, kPerGyr2, l2, barrier);
        return new Result(r < barrier && energy < top, energy, top, barrier);
    }

    /** U(r) in (kpc/Gyr)^2 for G M in kpc^3/Gyr^2, k in 1/Gyr^2, L^2 in kpc^4/Gyr^2. */
    public static double effectivePotential(double gm, double k, double l2, double r) {
        return -gm / r - 0.5 * k * r * r + 0.5 * l2 / (r * r);
    }

    /**
     * The barrier radius: the larger root of G M r - k r^4 - L^2 = 0 (k &gt; 0), or NaN when the
     * angular momentum is so large that U has no barrier at all (no bound orbit exists).
     */
    public static double barrierRadius(double gm, double k, double l2) {
        double zeroGravity = Math.cbrt(gm / k);
        if (l2 == 0) {
            return zeroGravity;
        }
        // f(r) = G M r - k r^4 - L^2 peaks at r* = (G M / (4 k))^(1/3).
        double rStar = Math.cbrt(gm / (4 * k));
        double fStar = gm * rStar - k * Math.pow(rStar, 4) - l2;
        if (fStar <= 0) {
            return Double.NaN;
        }
        // f(zeroGravity) = -L^2 < 0, so the larger root lies in (r*, zeroGravity).
        // A solver per call: Commons Math solvers keep the function and the bracket in fields, so
        // one shared by a sweep's worker threads mixes their problems up.
        return new BrentSolver(1e-12, 1e-14).solve(200, r -> gm * r - k * r * r * r * r - l2, rStar, zeroGravity);
    }
}
