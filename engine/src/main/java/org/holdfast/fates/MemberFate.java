package org.holdfast.fates;

/**
 * What became of one member.
 *
 * @param name the member
 * @param fate one of {@link Fate}
 * @param atGyr when it happened (merged, escaped, ripped), Gyr from today; NaN for bound
 * @param with for a merger, the member it merged into; otherwise null
 */
public record MemberFate(String name, Fate fate, double atGyr, String with) {

    /** The four fates. */
    public enum Fate {
        /** Bound to the main group at the end. */
        BOUND,
        /** Merged into another member. */
        MERGED,
        /** Left the group for good by its own motion. */
        ESCAPED,
        /** Unbound because the growing dark-energy term moved the barrier inside its orbit. */
        RIPPED;

        /** The lower-case word used in files. */
        public String key() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
