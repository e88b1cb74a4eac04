/**
 * Weighing a pair or a group from its motion in an expanding universe: the timing argument
 * with tangential motion (Li &amp; White 2008, MNRAS 384, 1459; van der Marel et al. 2012, ApJ
 * 753, 8) in three backgrounds (none, the dark-energy force alone, the whole expansion: matter
 * and dark energy), its Monte Carlo over uncertain inputs, a bound on dark energy from an
 * independent mass, and the mass from the velocity-distance relation of the galaxies around a
 * group (Lynden-Bell 1981; Sandage 1986; Penarrubia et al. 2014).
 *
 * <p>Everything is a planar relative orbit under central forces, r'' = -G M / r^2 + L^2 / r^3
 * + K(t) r with L = r v_t conserved, integrated with Commons Math's Dormand-Prince 8(5,3).
 */
package org.holdfast.weighing;
