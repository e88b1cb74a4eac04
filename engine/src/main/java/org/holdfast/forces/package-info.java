/**
 * What pushes and pulls the members of a group: the mutual gravity of pairs of extended halos
 * ({@link org.holdfast.forces.PairKernel}, tabulated once per pair of shapes), the cosmic
 * background (dark energy k(t) r and optionally the mean matter density), and the field the
 * massless tracers move in. State is kept in structure-of-arrays form
 * ({@link org.holdfast.forces.Bodies}, {@link org.holdfast.forces.Tracers}); each force is one
 * small class that adds into the acceleration arrays.
 */
package org.holdfast.forces;
