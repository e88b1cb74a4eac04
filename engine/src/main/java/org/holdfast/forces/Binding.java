package org.holdfast.forces;

import org.holdfast.units.Units;
import org.holdfast.fates.FateTracker;
import org.holdfast.fates.MemberFate;

/**
 * Whether two masses are bound to each other in a cosmic background field. Their relative
 * motion (reduced two-body problem, total mass M) sees the effective potential
 * <pre>
 *   U(r) = phi(r) - (1/2) k r^2 + L^2 / (2 r^2),   phi(r) = -G M / r for points,
 * </pre>
 * with k the background's acceleration coefficient (a = k r: the dark-energy term, plus the mean
 * matter term when the run includes it, Peebles 1993, Principles of Physical Cosmology, eq. 5.15)
 * and L the specific angular momentum (Nesseris &amp; Perivolaropoulos 2004, PRD 70, 123529 —
 * journal reference from memory). For k &gt; 0 U has a barrier (a local maximum) at the larger
 * root of {@code G M r - k r^4 - L^2 = 0}; without the L term it is the zero-gravity radius
 * (G M / k)^(1/3) (Chernin et al.). The pair is bound when it lies inside the barrier with
 * energy below its top.
 *
 * <p><b>No credit for attraction that fades.</b> k &lt; 0 (w &gt; -1/3, or the mean matter
 * density) would make U rise without end, a confinement that holds only while the term lasts:
 * a dark energy with w &gt; -1/3 and the mean matter density both thin out faster than a^-2, so
 * k(t) tends to zero from below and a pair with 0.5 v^2 - G M / r &gt; 0 ends up flying apart
 * (a pair 500 kpc apart receding at 400 km/s with an escape speed of 59 km/s reaches 11 Mpc).
 * The test therefore uses k clipped at zero, max(k, 0): a negative k counts as no field at all,
 * so binding falls back to Kepler's E &lt; 0 (common practice for an isolated pair). A positive
 * k is used as it is now; a member unbound later by a growing k is found by re-testing as the
 * run goes ({@link FateTracker}).
 *
 * <p>Radial orbits (L = 0, or L^2 at round-off) are exact: the barrier equation is solved in
 * the scaled form x - x^4 = lambda, x = r / r_0, lambda = L^2 / (G M r_0), whose bracket
 * [4^(-1/3), 1] holds by construction, and lambda = 0 gives r_0 itself.
 */
public final class Binding {

    /** 4^(-1/3): where x - x^4 peaks. */
    private static final double X_PEAK = Math.cbrt(0.25);
    /** The peak value of x - x^4: above it there is no barrier. */
    private static final double LAMBDA_MAX = 0.75 * X_PEAK;

    private Binding() {
    }

    /** The outcome of one binding test. */
    public record Result(boolean bound, double energy, double barrierEnergy, double barrierKpc, double scale) {

        /**
         * How deeply bound, as (U_barrier - E) / s: positive when bound, larger is deeper; s is
         * |U_barrier|, or G M / r where the top is 0 (no field).
         */
        public double depth() {
            if (Double.isInfinite(barrierEnergy)) {
                return bound ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            }
            return (barrierEnergy - energy) / Math.max(scale, Double.MIN_NORMAL);
        }
    }

    /** The coefficient the binding test credits: k clipped at zero (see the class comment). */
    public static double credited(double kPerGyr2) {
        return kPerGyr2 > 0 ? kPerGyr2 : 0.0;
    }

    /**
     * Tests a relative state of two point masses.
     *
     * @param massMsun total mass of the pair
     * @param kPerGyr2 background coefficient k(t) in 1/Gyr^2 (any sign)
     * @param dx relative position, kpc
     * @param dv relative velocity, kpc/Gyr
     */
    public static Result test(double massMsun, double kPerGyr2, double[] dx, double[] dv) {
        double r = norm(dx);
        return test(massMsun, kPerGyr2, dx, dv, -Units.G * massMsun / r);
    }

    /**
     * Tests a relative state with the pair's own interaction: phi is the potential of the
     * relative motion at the present separation, M w(d) for an interaction energy
     * W = m1 m2 w(d) (W divided by the reduced mass). Far outside the halos phi = -G M / r, so
     * the barrier (far out where binding is in doubt) is that of point masses.
     *
     * @param phi potential of the relative motion now, (kpc/Gyr)^2
     */
    public static Result test(double massMsun, double kPerGyr2, double[] dx, double[] dv, double phi) {
        double k = credited(kPerGyr2);
        double r = norm(dx);
        double l2 = angularMomentumSquared(dx, dv);
        double v2 = dx.length == 0 ? 0 : dv[0] * dv[0] + dv[1] * dv[1] + dv[2] * dv[2];
        double gm = Units.G * massMsun;
        double energy = 0.5 * v2 + phi - 0.5 * k * r * r;
        double pointScale = gm / r;
        if (k == 0) {
            return new Result(energy < 0, energy, 0.0, Double.POSITIVE_INFINITY, pointScale);
        }
        double barrier = barrierRadius(gm, k, l2);
        if (Double.isNaN(barrier)) {
            return new Result(false, energy, Double.NEGATIVE_INFINITY, Double.NaN, pointScale);
        }
        double top = effectivePotential(gm, k, l2, barrier);
        return new Result(r < barrier && energy < top, energy, top, barrier, Math.abs(top));
    }

    /**
     * Whether a member that is not bound has left for good: under the weakest repulsion kWeakest
     * that the rest of the expansion history holds (held fixed, the case most favourable to a
     * return), it never comes back inside the barrier. In a fixed field with k &ge; 0 the radial
     * motion obeys (1/2) v_r^2 = E - U(r) (energy conservation, common practice), so:
     * beyond the barrier it never returns if receding, nor if approaching with E below the
     * top (it turns round outside); inside, it leaves for good when E is above the top and it
     * recedes (v_r &gt; 0 never vanishes again). With k = 0 this is Kepler's hyperbola past
     * pericentre: E &ge; 0 and receding. A member falling back in is not gone.
     */
    public static boolean leftForGood(double massMsun, double kWeakest, double[] dx, double[] dv) {
        Result r = test(massMsun, kWeakest, dx, dv);
        if (r.bound()) {
            return false;
        }
        boolean receding = dx[0] * dv[0] + dx[1] * dv[1] + dx[2] * dv[2] > 0;
        double sep = norm(dx);
        if (Double.isNaN(r.barrierKpc()) || !(sep < r.barrierKpc())) {
            // beyond the barrier, or no barrier at all (U falls everywhere): only a member with
            // energy over the top could come back over it, and only when approaching
            return receding || !(r.energy() > r.barrierEnergy()) || Double.isNaN(r.barrierKpc());
        }
        return receding;
    }

    /** U(r) in (kpc/Gyr)^2 for G M in kpc^3/Gyr^2, k in 1/Gyr^2, L^2 in kpc^4/Gyr^2. */
    public static double effectivePotential(double gm, double k, double l2, double r) {
        return -gm / r - 0.5 * k * r * r + 0.5 * l2 / (r * r);
    }

    /** The zero-gravity radius (G M / k)^(1/3) (Chernin et al.), kpc; infinite for k &le; 0. */
    public static double zeroGravityRadius(double massMsun, double kPerGyr2) {
        return kPerGyr2 > 0 ? Math.cbrt(Units.G * massMsun / kPerGyr2) : Double.POSITIVE_INFINITY;
    }

    /**
     * Separation minus the zero-gravity radius, kpc: a switching function that crosses zero,
     * upward, when a member actually leaves (the leaving time of {@link MemberFate#leftGyr});
     * -infinity where k &le; 0 (no such radius).
     */
    public static double zeroGravityExcess(double massMsun, double kPerGyr2, double[] dx) {
        return norm(dx) - zeroGravityRadius(massMsun, kPerGyr2);
    }

    /** |r x v|^2, kpc^4/Gyr^2. */
    public static double angularMomentumSquared(double[] dx, double[] dv) {
        double lx = dx[1] * dv[2] - dx[2] * dv[1];
        double ly = dx[2] * dv[0] - dx[0] * dv[2];
        double lz = dx[0] * dv[1] - dx[1] * dv[0];
        return lx * lx + ly * ly + lz * lz;
    }

    /**
     * The barrier radius: the larger root of G M r - k r^4 - L^2 = 0 (k &gt; 0), or NaN when the
     * angular momentum is so large that U has no barrier at all (no bound orbit exists). With
     * r = r_0 x, r_0 = (G M / k)^(1/3), the equation is x - x^4 = lambda = L^2 / (G M r_0); the
     * larger root lies in [4^(-1/3), 1] and is found by safeguarded Newton steps from
     * x = 1 - lambda / 3 (its first-order value; h'(1) = -3), so lambda = 0 or any round-off
     * value is exact and nothing can fail to bracket.
     */
    public static double barrierRadius(double gm, double k, double l2) {
        double r0 = Math.cbrt(gm / k);
        double lambda = l2 / (gm * r0);
        if (!(lambda > 0)) {
            return r0;
        }
        if (lambda >= LAMBDA_MAX) {
            return Double.NaN;
        }
        double lo = X_PEAK;
        double hi = 1.0;
        double x = Math.max(lo, 1 - lambda / 3);
        for (int it = 0; it < 100; it++) {
            double h = x - x * x * x * x - lambda;
            // h decreases on [X_PEAK, 1]: h > 0 means the root lies above x
            if (h > 0) {
                lo = x;
            } else if (h < 0) {
                hi = x;
            } else {
                break;
            }
            double slope = 1 - 4 * x * x * x;
            double next = slope < 0 ? x - h / slope : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) <= 1e-15 * x) {
                x = next;
                break;
            }
            x = next;
        }
        return r0 * x;
    }

    private static double norm(double[] a) {
        return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
    }
}
