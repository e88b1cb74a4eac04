package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * A spherical halo of a given mass. Subclasses give the closed forms; everything here includes
 * Newton's constant ({@link Units#G}) and the halo's mass.
 *
 * <p>Besides the usual density, enclosed mass and potential, a profile supplies the radial
 * moment of its potential, Psi(s) = integral from 0 to s of Phi(s') s' ds'. The mean of a
 * spherical potential over a sphere of radius r whose centre lies at distance d is
 * (Psi(d + r) - Psi(|d - r|)) / (2 r d), which reduces the interaction of two halos to a
 * one-dimensional integral (see {@code org.holdfast.forces.InteractionIntegral}).
 */
public abstract class HaloProfile {

    /** Whole (truncated) mass in Msun. */
    protected final double massMsun;

    protected HaloProfile(double massMsun) {
        if (!(massMsun > 0) || Double.isInfinite(massMsun)) {
            throw new IllegalArgumentException("mass_msun must be positive and finite, got " + massMsun);
        }
        this.massMsun = massMsun;
    }

    /** The profile's name as scenarios write it. */
    public abstract String kind();

    /** Whole mass, Msun. */
    public final double mass() {
        return massMsun;
    }

    /** Density at r, Msun/kpc^3. */
    public abstract double density(double r);

    /** Mass inside radius r, Msun. */
    public abstract double enclosedMass(double r);

    /** Potential Phi(r), kpc^2/Gyr^2, zero at infinity. */
    public abstract double potential(double r);

    /** Psi(s) = integral_0^s Phi(s') s' ds', kpc^4/Gyr^2. */
    public abstract double potentialMoment(double s);

    /** Radius outside which there is no mass; infinite for untruncated profiles, 0 for a bare point. */
    public abstract double extentKpc();

    /** The inner length that sets the shape (scale radius, softening), kpc. */
    public abstract double lengthKpc();

    /**
     * The pull toward the centre divided by r, G M(<r)/r^3, in 1/Gyr^2: a tracer at offset
     * (dx, dy, dz) from the centre accelerates by minus this times the offset.
     */
    public double pullOverR(double r) {
        return Units.G * enclosedMass(r) / (r * r * r);
    }

    /** Circular speed sqrt(G M(<r)/r), kpc/Gyr. */
    public double circularSpeed(double r) {
        return Math.sqrt(pullOverR(r)) * r;
    }

    /**
     * A key that is equal for profiles of the same shape and mass, used to share tabulated
     * interactions between identical members.
     */
    public abstract Object shapeKey();

    @Override
    public String toString() {
        return kind() + "(M=" + massMsun + " Msun, length=" + lengthKpc() + " kpc, extent=" + extentKpc() + " kpc)";
    }
}
