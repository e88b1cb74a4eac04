/**
 * Symplectic splitting integrators for a system whose Hamiltonian splits into kinetic and
 * potential parts: the kick-drift-kick leapfrog and Yoshida's fourth-order composition, both
 * one list of weights on a shared stepping routine ({@link org.holdfast.integrators.Composition}),
 * and the time-symmetric adaptive step size ({@link org.holdfast.integrators.SymmetricStepSize}).
 * The system ({@link org.holdfast.integrators.SplitSystem}) knows nothing of the scheme.
 */
package org.holdfast.integrators;
