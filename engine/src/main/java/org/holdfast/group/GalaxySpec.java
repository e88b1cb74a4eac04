package org.holdfast.group;

/**
 * One member of a group as the user described it, in the user's own inertial frame: the run
 * moves everything to the centre-of-mass frame.
 *
 * @param name unique name
 * @param massMsun whole (truncated) halo mass; for NFW the mass inside r_200
 * @param positionKpc position, 3 components
 * @param velocityKms velocity, 3 components
 * @param halo the mass profile
 * @param stars star tracers that make the galaxy visible; null for none
 * @param coulombLog this member's own Coulomb logarithm for dynamical friction; null for the run's
 */
public record GalaxySpec(String name, double massMsun, double[] positionKpc, double[] velocityKms,
        HaloSpec halo, StarsSpec stars, org.holdfast.group.CoulombLog coulombLog) {

    /** A member that uses the run's Coulomb logarithm. */
    public GalaxySpec(String name, double massMsun, double[] positionKpc, double[] velocityKms, HaloSpec halo,
            StarsSpec stars) {
        this(name, massMsun, positionKpc, velocityKms, halo, stars, null);
    }
}
