package org.holdfast.group;

/**
 * Massless star tracers that make a galaxy visible.
 *
 * @param count number of tracers
 * @param shape "disk" (exponential disk on circular orbits of the host halo) or "sphere"
 *     (isotropic)
 * @param radiusKpc the disk's scale length, or the sphere's scale radius
 * @param normal the disk's spin axis (any length; ignored for a sphere)
 * @param dispersionKms random velocity added to each tracer (per component)
 */
public record StarsSpec(int count, String shape, double radiusKpc, double[] normal, double dispersionKms) {

    /** The shapes a scenario may use. */
    public static final java.util.List<String> SHAPES = java.util.List.of("disk", "sphere");
}
