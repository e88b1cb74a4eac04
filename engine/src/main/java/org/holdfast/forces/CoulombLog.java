package org.holdfast.forces;

import java.util.List;

/**
 * The Coulomb logarithm ln Lambda of Chandrasekhar's dynamical friction: a constant, or the
 * prescription of Hashimoto, Funato &amp; Makino (2003, ApJ 582, 196 — from memory),
 * ln Lambda = ln(r / (1.4 eps)), with r the satellite's distance from the host's centre and eps
 * its softening (here its inner length: softening or scale radius). Where that prescription
 * falls below zero (r &lt; 1.4 eps) there is no friction.
 *
 * @param prescription {@link #CONSTANT} or one of {@link #PRESCRIPTIONS}
 * @param value the constant ln Lambda (NaN for a prescription)
 */
public record CoulombLog(String prescription, double value) {

    /** A fixed number. */
    public static final String CONSTANT = "constant";

    /** Hashimoto, Funato &amp; Makino 2003. */
    public static final String HASHIMOTO_2003 = "hashimoto2003";

    /** The named prescriptions a scenario may give instead of a number. */
    public static final List<String> PRESCRIPTIONS = List.of(HASHIMOTO_2003);

    /** The default, ln Lambda = 3 (a common choice for satellites of galaxies; common practice). */
    public static final CoulombLog DEFAULT = constant(3.0);

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
        return !CONSTANT.equals(prescription);
    }

    /**
     * ln Lambda for a satellite at distance r from its host's centre.
     *
     * @param rKpc distance from the host's centre
     * @param lengthKpc the satellite's softening or scale radius (used by the prescription)
     */
    public double at(double rKpc, double lengthKpc) {
        if (!needsLength()) {
            return value;
        }
        return Math.max(0.0, Math.log(rKpc / (1.4 * lengthKpc)));
    }

    /** As a scenario writes it: the number or the name. */
    @Override
    public String toString() {
        return needsLength() ? prescription : Double.toString(value);
    }
}
