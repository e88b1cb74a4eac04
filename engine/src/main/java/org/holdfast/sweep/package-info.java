/**
 * Sweeps and ensembles: many headless runs of one scenario over a grid of parameter values and
 * over random realisations of its uncertain numbers, and what they say together.
 *
 * <p>A {@link org.holdfast.sweep.SweepPlan} names the grid ({@link org.holdfast.sweep.Axis}),
 * the samples per grid point, the master seed and the shard. Every run has an index
 * {@code run = point * samples + sample}; its uncertain numbers take draw {@code sample} of the
 * master seed at every point (paired draws, the default), or draw 0 of a seed of its own from
 * {@link org.holdfast.sweep.SeedPlan} (independent draws).
 * Runs are executed by a {@link org.holdfast.sweep.SweepEngine} (threads here, Spark in
 * {@code org.holdfast.sweep.spark}) through a {@link org.holdfast.sweep.RunFunction}, the one
 * seam to the physics; each finished run is appended to a {@link org.holdfast.sweep.Journal},
 * so a killed sweep resumes where it stopped. When all runs are in, the journal is turned into
 * {@code results.csv}, {@code fractions.csv} and plots.
 */
package org.holdfast.sweep;
