package org.holdfast.uncertain;

/**
 * One key of a scenario that was written as a distribution, and the value a read used.
 *
 * @param path dotted key path ({@code galaxy.NAME.mass_msun}; a vector component ends in
 *     {@code .0}, {@code .1}, ...)
 * @param distribution what the file gave
 * @param value the value used: the central value or the draw
 */
public record UncertainValue(String path, Distribution distribution, double value) {
}
