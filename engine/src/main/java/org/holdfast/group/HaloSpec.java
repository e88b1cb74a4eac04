package org.holdfast.group;

/**
 * A halo's mass profile as written in a scenario. Unset lengths are NaN.
 *
 * @param profile one of {@link #PROFILES}
 * @param softeningKpc Plummer softening of a point mass ("point")
 * @param scaleKpc scale radius ("plummer", "hernquist", "nfw")
 * @param concentration r_200 / r_s ("nfw", when scaleKpc is not given)
 * @param truncationKpc outer radius ("isothermal"; optional for "nfw", default r_200)
 */
public record HaloSpec(String profile, double softeningKpc, double scaleKpc, double concentration,
        double truncationKpc) {

    /** The profile names a scenario may use. */
    public static final java.util.List<String> PROFILES =
            java.util.List.of("point", "plummer", "hernquist", "nfw", "isothermal");

    /** A point mass with the given softening. */
    public static HaloSpec point(double softeningKpc) {
        return new HaloSpec("point", softeningKpc, Double.NaN, Double.NaN, Double.NaN);
    }
}
