/**
 * Spherical mass profiles of galaxy halos: enclosed mass, density, potential and the radial
 * moment of the potential that the pair interactions of two extended halos are built from.
 * All values include G and the halo's mass; lengths in kpc, masses in Msun, potentials in
 * kpc^2/Gyr^2.
 */
package org.holdfast.halos;
