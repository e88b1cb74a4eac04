/**
 * The expansion history of a homogeneous universe: the Friedmann equation for matter,
 * radiation, curvature and a dark-energy model, solved once into a table that the dynamics
 * reads at every kick. {@link org.holdfast.expansion.Cosmology} holds the parameters,
 * {@link org.holdfast.expansion.DarkEnergyModel} is one small class per equation of state,
 * {@link org.holdfast.expansion.ExpansionTable} is the solved history with its landmarks (age,
 * big rip, turnaround and crunch, onset of acceleration), and
 * {@link org.holdfast.expansion.CosmologyReader} reads the {@code [cosmology]} table of a
 * scenario file.
 */
package org.holdfast.expansion;
