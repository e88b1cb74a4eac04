package org.holdfast.fates;

/**
 * What became of one member.
 *
 * @param name the member
 * @param fate one of {@link Fate}
 * @param atGyr when it happened, Gyr from today: the merger; for escaped and ripped the first
 *     analysis from which the member stayed outside the main group (for ripped: when the barrier
 *     moved inside its orbit); for unbound the start of the run; NaN for bound and returning
 * @param leftGyr when a ripped or escaped member actually left: its separation from the main
 *     group's centre of mass passing the zero-gravity radius (G M / k)^(1/3) of the pair
 *     (Chernin et al.; M the member's and the group's mass, k the dark-energy coefficient then),
 *     interpolated between analyses; NaN when it did not pass it before the run ended, or where
 *     k &le; 0 (no such radius)
 * @param with for a merger, the member it merged into; otherwise null
 */
public record MemberFate(String name, Fate fate, double atGyr, double leftGyr, String with) {

    /** A fate without a leaving time. */
    public MemberFate(String name, Fate fate, double atGyr, String with) {
        this(name, fate, atGyr, Double.NaN, with);
    }
}
