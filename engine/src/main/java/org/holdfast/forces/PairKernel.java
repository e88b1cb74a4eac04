package org.holdfast.forces;

/**
 * The mutual gravity of two halos as a function of the distance d between their centres, per
 * unit product of their masses: an interaction energy w(d) (kpc^2 Gyr^-2 Msun^-1) and the pull
 * w'(d)/d that it implies. Body i accelerates by m_j pullOverD(d) (x_j - x_i) and body j by the
 * opposite, so momentum is conserved and, because the pull is the derivative of w, so is
 * energy.
 */
public interface PairKernel {

    /** Interaction energy w(d) per unit product of the masses. */
    double energy(double d);

    /** w'(d) / d, 1/(Gyr^2 Msun); positive for attraction (w rises with d). */
    double pullOverD(double d);

    /** The pair's inner length (softening, scale radii), kpc; keeps step sizes finite at d = 0. */
    double lengthKpc();
}
