/**
 * Uncertain numbers: any numeric value of a scenario may be written as a distribution, an
 * inline table such as {@code { mean = 770, sigma = 40 }} (normal),
 * {@code { median = 1.5e12, sigma_dex = 0.2 }} (log-normal) or {@code { min = -1.3, max = -0.7 }}
 * (uniform). {@link org.holdfast.uncertain.UncertainNumbers} is the
 * {@link org.holdfast.schema.NumberReader} that understands them: it returns either each
 * distribution's central value or a reproducible random draw, and records which keys were
 * uncertain and what value was used.
 *
 * <p>Reproducibility: draw {@code i} of a scenario with seed {@code s} depends only on
 * {@code (s, i, dotted key path)}, never on the order in which keys are read or on threads.
 * Each key gets its own generator (commons-rng XoRoShiRo128++) seeded from those three, and
 * the transforms from uniform to normal use commons-math3's pure-Java {@code FastMath} and
 * {@code Erf}, so the same seed gives the same bits on any machine.
 */
package org.holdfast.uncertain;
