/**
 * Random but plausible galaxy groups for {@code holdfast new}: masses from a power-law mass
 * function, places in a uniform sphere, velocities scaled to a chosen virial ratio, NFW halos
 * with a published mass–concentration relation, and invented names.
 */
package org.holdfast.scenario.generate;
