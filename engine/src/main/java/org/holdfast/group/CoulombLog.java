package org.holdfast.group;

import java.util.List;

/**
 * The Coulomb logarithm ln Lambda of Chandrasekhar's dynamical friction: a constant; the
 * mass-ratio form ln Lambda = ln(1 + M_host / M_sat) (Binney &amp; Tremaine 2008, Galactic
 * Dynamics, 2nd ed., section 8.1, Lambda ~ b_max v^2 / (G (M + m)) with b_max the host's size;
 * the same form follows the mass dependence of measured merger times, Jiang et al. 2008,
 * ApJ 675, 1095), the default, which stays positive, tends to ln(M_host/M_sat) for small
 * satellites and falls to ln 2 for equal masses, where a "satellite" no longer sinks through a
 * sea of much lighter particles; or the prescription of Hashimoto, Funato &amp; Makino (2003,
 * ApJ 582, 196 — from memory), ln Lambda = ln(r / (1.4 eps)), with r the satellite's distance
 * from the host's centre and eps its softening (here its inner length: softening or scale
 * radius). Where that prescription falls below zero (r &lt; 1.4 eps) there is no friction.
 *
 * @param prescription {@link #CONSTANT} or one of {@link #PRESCRIPTIONS}
 * @param value the constant ln Lambda (NaN for a prescription)
 */
public record CoulombLog(String prescription, double value) {

    /** A fixed number. */
    public static final String CONSTANT = "constant";

    /** Hashimoto, Funato &amp; Makino 2003. */
    public static final String HASHIMOTO_2003 = "hashimoto2003";

    /** ln(1 + M_host / M_sat). */
    public static final String MASS_RATIO = "mass-ratio";

    /** The named prescriptions a scenario may give instead of a number. */
    public static final List<String> PRESCRIPTIONS = List.of(MASS_RATIO, HASHIMOTO_2003);

    /** The default: ln(1 + M_host / M_sat). */
    public static final CoulombLog DEFAULT = new CoulombLog(MASS_RATIO, Double.NaN);

    /** A constant ln Lambda. */
    public static CoulombLog constant(double lnLambda) {
        if (!(lnLambda > 0) || Double.isInfinite(lnLambda)) {
            throw new IllegalArgumentException("coulomb_log must be positive and finite, got " + lnLambda);
        }
        return new CoulombLog(CONSTANT, lnLambda);
    }

    /** A named prescription. */
    public static CoulombLog named(String name) {
        if (!PRESCRIPTIONS.contains(name)) {
            throw new IllegalArgumentException("coulomb_log: unknown prescription '" + name + "' (a number or one of "
                    + PRESCRIPTIONS + ")");
        }
        return new CoulombLog(name, Double.NaN);
    }

    /** Whether this needs the satellite's inner length. */
    public boolean needsLength() {
        return HASHIMOTO_2003.equals(prescription);
    }

    /**
     * ln Lambda for a satellite at distance r from its host's centre.
     *
     * @param rKpc distance from the host's centre
     * @param lengthKpc the satellite's softening or scale radius (used by hashimoto2003)
     * @param hostMsun the host's mass (used by mass-ratio)
     * @param satelliteMsun the satellite's (bound) mass (used by mass-ratio)
     */
    public double at(double rKpc, double lengthKpc, double hostMsun, double satelliteMsun) {
        if (CONSTANT.equals(prescription)) {
            return value;
        }
        if (MASS_RATIO.equals(prescription)) {
            return Math.log1p(hostMsun / satelliteMsun);
        }
        return Math.max(0.0, Math.log(rKpc / (1.4 * lengthKpc)));
    }

    /** As a scenario writes it: the number or the name. */
    @Override
    public String toString() {
        return CONSTANT.equals(prescription) ? Double.toString(value) : prescription;
    }
}
