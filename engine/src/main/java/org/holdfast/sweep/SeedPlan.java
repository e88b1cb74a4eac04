package org.holdfast.sweep;

import org.apache.commons.rng.SplittableUniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The seed of every run, derived from the master seed, the grid point and the sample index with
 * a splittable generator (L64X128Mix, Steele &amp; Vigna 2021, "LXM: better splittable
 * pseudorandom number generators", Proc. ACM Program. Lang. 5, OOPSLA, article 148; commons-rng
 * {@code RandomSource.L64_X128_MIX}).
 *
 * <p>The master generator is seeded with the master seed; grid point {@code p} owns the
 * {@code p}-th generator split off it, and sample {@code s} of that point takes the
 * {@code s}-th long drawn from the point's generator. A run's seed therefore depends only on
 * (seed, point, sample): not on the number of workers, the shard, or the order runs finish in.
 * Walking the points in order costs one split per point, so {@link #forPoint} is meant to be
 * called with increasing points.
 */
public final class SeedPlan {

    private final SplittableUniformRandomProvider master;
    private int nextPoint;

    /** A plan for the given master seed. */
    public SeedPlan(long masterSeed) {
        master = (SplittableUniformRandomProvider) RandomSource.L64_X128_MIX.create(masterSeed);
    }

    /**
     * The seeds of all samples of one point.
     *
     * @param point at least the point of the previous call
     * @param samples how many samples the point has
     */
    public long[] forPoint(int point, int samples) {
        if (point < nextPoint) {
            throw new IllegalArgumentException("points must be visited in order: " + point + " after " + (nextPoint - 1));
        }
        SplittableUniformRandomProvider gen = master.split();
        while (nextPoint < point) {
            gen = master.split();
            nextPoint++;
        }
        nextPoint = point + 1;
        long[] seeds = new long[samples];
        for (int s = 0; s < samples; s++) {
            seeds[s] = gen.nextLong();
        }
        return seeds;
    }

    /** The seed of one run (walks the points from the start: for checks, not for loops). */
    public static long seedOf(long masterSeed, int point, int sample) {
        return new SeedPlan(masterSeed).forPoint(point, sample + 1)[sample];
    }
}
