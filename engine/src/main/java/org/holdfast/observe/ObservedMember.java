package org.holdfast.observe;

import java.util.List;

/**
 * A member as observed from the home galaxy: heliocentric, in ICRS terms (a position given in
 * Galactic l, b is converted to RA, Dec on reading).
 *
 * @param path dotted key path of the {@code observed} table, for messages
 * @param raDeg ICRS right ascension
 * @param decDeg ICRS declination
 * @param distanceKpc distance from the observer
 * @param vLosKms heliocentric line-of-sight velocity (positive away from the observer)
 * @param pmRaMasYr proper motion mu_alpha* = mu_alpha cos(delta), mas/yr; NaN when not measured
 * @param pmDecMasYr proper motion mu_delta, mas/yr; NaN when not measured
 * @param warnings what the reader assumed, one line each, for the caller to show
 * @param assumedRaKms without proper motions: the transverse velocity assumed toward increasing
 *     RA, relative to the home galaxy's centre, km/s (0 in a central run, a draw in a sampled one)
 * @param assumedDecKms the same toward increasing Dec
 */
public record ObservedMember(String path, double raDeg, double decDeg, double distanceKpc,
        double vLosKms, double pmRaMasYr, double pmDecMasYr, List<String> warnings, double assumedRaKms,
        double assumedDecKms) {

    public ObservedMember {
        warnings = List.copyOf(warnings);
    }

    /** A member with no assumed transverse velocity. */
    public ObservedMember(String path, double raDeg, double decDeg, double distanceKpc,
            double vLosKms, double pmRaMasYr, double pmDecMasYr, List<String> warnings) {
        this(path, raDeg, decDeg, distanceKpc, vLosKms, pmRaMasYr, pmDecMasYr, warnings, 0, 0);
    }

    /** Whether both proper motions were given. */
    public boolean hasProperMotion() {
        return !Double.isNaN(pmRaMasYr) && !Double.isNaN(pmDecMasYr);
    }
}
