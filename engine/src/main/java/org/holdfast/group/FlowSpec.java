package org.holdfast.group;

/**
 * Massless tracers in a shell around the group's centre of mass, started on the local Hubble
 * flow v = H r plus an optional random peculiar velocity; they show the zero-velocity surface.
 *
 * @param count number of tracers
 * @param innerKpc inner radius of the shell
 * @param outerKpc outer radius of the shell
 * @param dispersionKms random peculiar velocity per component
 */
public record FlowSpec(int count, double innerKpc, double outerKpc, double dispersionKms) {
}
