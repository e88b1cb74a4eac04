package org.holdfast.halos;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.group.HaloSpec;

/** Builds a {@link HaloProfile} from a scenario's {@link HaloSpec}. */
public final class Halos {

    private Halos() {
    }

    /**
     * The profile a spec describes.
     *
     * @param spec the halo as written
     * @param massMsun the galaxy's mass_msun: the whole mass, for NFW the mass inside r_200
     * @param criticalDensityToday 3 H0^2 / (8 pi G) of the scenario's cosmology, Msun/kpc^3
     *     (sets r_200 of NFW halos)
     * @throws IllegalArgumentException naming the key at fault, for a missing or unphysical value
     */
    public static HaloProfile build(HaloSpec spec, double massMsun, double criticalDensityToday) {
        switch (spec.profile()) {
            case "point":
                return new PointHalo(massMsun, Double.isNaN(spec.softeningKpc()) ? 0 : spec.softeningKpc());
            case "plummer":
                return new PlummerHalo(massMsun, need(spec.scaleKpc(), "scale_kpc", "plummer"));
            case "hernquist":
                return new HernquistHalo(massMsun, need(spec.scaleKpc(), "scale_kpc", "hernquist"));
            case "isothermal":
                return new IsothermalHalo(massMsun, need(spec.truncationKpc(), "truncation_kpc", "isothermal"));
            case "nfw":
                return nfw(spec, massMsun, criticalDensityToday);
            default:
                throw new IllegalArgumentException("profile: unknown halo profile '" + spec.profile()
                        + "' (one of " + HaloSpec.PROFILES + ")");
        }
    }

    /**
     * r_200: the radius inside which the mean density of mass M is 200 times the critical
     * density, M = (4 pi / 3) 200 rho_crit r_200^3 (Navarro, Frenk &amp; White 1996, ApJ 462, 563).
     */
    public static double r200(double massMsun, double criticalDensityToday) {
        return Math.cbrt(3 * massMsun / (800 * Math.PI * positive(criticalDensityToday, "critical density")));
    }

    /**
     * The halo of a merger remnant: the survivor's profile holding both masses, every length
     * scaled by (M_total / M_survivor)^(1/3) so that the mean density inside each length is
     * kept (for NFW this keeps the concentration, as r_200 grows as M^(1/3); Navarro, Frenk &amp;
     * White 1996). A documented simplification, not a model of the remnant's relaxation.
     */
    public static HaloProfile remnant(HaloProfile survivor, double totalMassMsun) {
        double s = Math.cbrt(totalMassMsun / survivor.mass());
        if (survivor instanceof PointHalo p) {
            return new PointHalo(totalMassMsun, p.softeningKpc() * s);
        }
        if (survivor instanceof PlummerHalo) {
            return new PlummerHalo(totalMassMsun, survivor.lengthKpc() * s);
        }
        if (survivor instanceof HernquistHalo) {
            return new HernquistHalo(totalMassMsun, survivor.lengthKpc() * s);
        }
        if (survivor instanceof IsothermalHalo) {
            return new IsothermalHalo(totalMassMsun, survivor.extentKpc() * s);
        }
        if (survivor instanceof NfwHalo n) {
            return new NfwHalo(totalMassMsun, n.scaleKpc() * s, n.extentKpc() * s);
        }
        throw new IllegalArgumentException("no merger rule for a " + survivor.kind() + " halo");
    }

    /**
     * The radius holding a tenth of a halo's mass (0 for a bare point): the root of M(&lt;r) = M / 10.
     * Used for the default merge distance.
     */
    public static double tenthMassRadius(HaloProfile h) {
        double target = 0.1 * h.mass();
        if (h.enclosedMass(0) >= target || h.lengthKpc() == 0) {
            return 0;
        }
        double lo = 0;
        double hi = Math.max(h.lengthKpc(), 1e-9);
        while (h.enclosedMass(hi) < target) {
            hi *= 2;
        }
        // Brent's method (Brent 1973, Algorithms for Minimization without Derivatives, ch. 4) to
        // the tolerance the bisection it replaces used: 1e-12 of the bracket.
        return new BrentSolver(1e-15, 1e-12 * hi).solve(200, r -> h.enclosedMass(r) - target, lo, hi);
    }

    private static HaloProfile nfw(HaloSpec spec, double m200, double rhoCrit) {
        boolean hasScale = !Double.isNaN(spec.scaleKpc());
        boolean hasConc = !Double.isNaN(spec.concentration());
        if (hasScale == hasConc) {
            throw new IllegalArgumentException(hasScale
                    ? "concentration: give either scale_kpc or concentration for an nfw halo, not both"
                    : "scale_kpc: an nfw halo needs scale_kpc or concentration");
        }
        double r200 = r200(m200, rhoCrit);
        double rs = hasScale ? positive(spec.scaleKpc(), "scale_kpc") : r200 / positive(spec.concentration(), "concentration");
        double rt = Double.isNaN(spec.truncationKpc()) ? r200 : positive(spec.truncationKpc(), "truncation_kpc");
        // mass_msun is the mass inside r_200; a truncation elsewhere changes the whole mass
        double whole = m200 * NfwHalo.mu(rt / rs) / NfwHalo.mu(r200 / rs);
        return new NfwHalo(whole, rs, rt);
    }

    private static double need(double value, String key, String profile) {
        if (Double.isNaN(value)) {
            throw new IllegalArgumentException(key + ": a " + profile + " halo needs " + key);
        }
        return positive(value, key);
    }

    static double positive(double value, String key) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(key + " must be positive and finite, got " + value);
        }
        return value;
    }
}
