package org.holdfast.halos;

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
