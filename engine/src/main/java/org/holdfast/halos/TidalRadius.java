package org.holdfast.halos;

/**
 * The tidal (Jacobi) radius of a satellite in the potential of a spherical host, and the mass
 * the satellite keeps inside it.
 *
 * <p>A satellite at distance D from the host's centre, orbiting at the host's circular
 * frequency, loses what lies beyond r_t = [G m(&lt;r_t) / (Omega^2 - d^2Phi/dD^2)]^(1/3)
 * (King 1962, AJ 67, 471; Binney &amp; Tremaine 2008, Galactic Dynamics, 2nd ed., section 8.3,
 * eq. 8.108 for the point host). For a spherical host Omega^2 - Phi'' = (G M(D) / D^3)(3 - gamma),
 * gamma = d ln M / d ln D = 4 pi D^3 rho(D) / M(D), so
 * <pre>
 *   m(&lt;r_t) / r_t^3 = (3 - gamma) M(D) / D^3,
 * </pre>
 * which is (m / (3 M))^(1/3) D for a point host (gamma = 0). The left side, (3 / 4 pi) times the
 * satellite's mean density inside r, falls with r for any density that does not rise outward,
 * so the root is unique; it is found by bisection in ln r. Where gamma &ge; 3 (inside a
 * constant-density core) the tide compresses and there is no tidal radius. The satellite keeps
 * its own profile inside r_t (the inner profile is unchanged by stripping; common practice in
 * semi-analytic models of satellites).
 */
public final class TidalRadius {

    private TidalRadius() {
    }

    /**
     * The tidal radius, kpc: +infinity when there is none (no tide, or the whole satellite fits
     * inside), 0 when even the satellite's centre is less dense than the tide allows.
     *
     * @param satellite the satellite's own (unstripped) profile
     * @param host the host's profile
     * @param hostScale the host's mass now over its profile's mass (mass it gained or lost)
     * @param dKpc distance between the centres
     */
    public static double of(HaloProfile satellite, HaloProfile host, double hostScale, double dKpc) {
        double mHost = hostScale * host.enclosedMass(dKpc);
        if (!(mHost > 0) || !(dKpc > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double rho = host.density(dKpc);
        double gamma = Double.isFinite(rho) ? 4 * Math.PI * dKpc * dKpc * dKpc * hostScale * rho / mHost : 0;
        double factor = 3 - gamma;
        if (!(factor > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double target = factor * mHost / (dKpc * dKpc * dKpc);
        double length = satellite.lengthKpc() > 0 ? satellite.lengthKpc() : dKpc;
        double lo = 1e-6 * length;
        if (meanDensityTerm(satellite, lo) <= target) {
            return 0;
        }
        double hi = Math.max(lo * 2, dKpc);
        while (meanDensityTerm(satellite, hi) > target) {
            if (satellite.enclosedMass(hi) >= satellite.mass() || hi > 1e12) {
                return Double.POSITIVE_INFINITY;
            }
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
            double mid = Math.sqrt(lo * hi);
            if (meanDensityTerm(satellite, mid) > target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double rt = Math.sqrt(lo * hi);
        return rt >= satellite.extentKpc() ? Double.POSITIVE_INFINITY : rt;
    }

    /**
     * Whether the host's tide at distance D could strip the satellite inside {@code rKpc}, the
     * radius it is already cut to: whether m(&lt;r)/r^3 falls below (3 - gamma) M(D)/D^3 there.
     * A cheap test before {@link #of}; false when there is no tide.
     */
    public static boolean reaches(HaloProfile satellite, HaloProfile host, double hostScale, double dKpc, double rKpc) {
        double mHost = hostScale * host.enclosedMass(dKpc);
        if (!(mHost > 0) || !(dKpc > 0)) {
            return false;
        }
        double rho = host.density(dKpc);
        double gamma = Double.isFinite(rho) ? 4 * Math.PI * dKpc * dKpc * dKpc * hostScale * rho / mHost : 0;
        if (!(gamma < 3)) {
            return false;
        }
        if (!(rKpc < Double.POSITIVE_INFINITY)) {
            return true;
        }
        return meanDensityTerm(satellite, rKpc) < (3 - gamma) * mHost / (dKpc * dKpc * dKpc);
    }

    /** The mass a satellite keeps at a tidal radius: its own profile's mass inside it. */
    public static double boundMass(HaloProfile satellite, double rtKpc) {
        if (!(rtKpc < Double.POSITIVE_INFINITY)) {
            return satellite.mass();
        }
        return satellite.enclosedMass(rtKpc);
    }

    private static double meanDensityTerm(HaloProfile s, double r) {
        return s.enclosedMass(r) / (r * r * r);
    }
}
