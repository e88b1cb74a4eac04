/**
 * A run: a simulation of one group stepped by an integrator, watched by observers (snapshots,
 * progress, fates, film frames) through a read-only view of its state.
 */
package org.holdfast.run;
