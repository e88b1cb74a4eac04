package org.holdfast.scenario.generate;

/**
 * What {@code holdfast new} is asked for.
 *
 * @param giants number of large members
 * @param dwarfs number of small members
 * @param massMsun total mass of all members
 * @param radiusKpc members are placed uniformly inside a sphere of this radius
 * @param virialRatio 2T/|W| of the members as point masses (1 = virial equilibrium, 0 = at rest)
 * @param seed for every random choice
 * @param untilGyr end time written to [run]
 * @param starsPerGiant star tracers of a giant (a disk)
 * @param starsPerDwarf star tracers of a dwarf (a sphere)
 */
public record GroupRecipe(int giants, int dwarfs, double massMsun, double radiusKpc, double virialRatio, long seed,
        double untilGyr, int starsPerGiant, int starsPerDwarf) {

    /** Members in all. */
    public int members() {
        return giants + dwarfs;
    }
}
