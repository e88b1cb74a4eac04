package org.holdfast.fates;

import java.util.Locale;

/**
 * What became of one member: the one fate type of the engine, the run folders and the sweeps.
 * {@link #key()} is the lower-case word written in files.
 */
public enum Fate {
    /** Bound to the main group when the run ends. */
    BOUND,
    /** Merged into another member. */
    MERGED,
    /** Left the main group by its own motion and will not come back. */
    ESCAPED,
    /** Left the main group because the growing dark-energy term moved the barrier inside its orbit. */
    RIPPED,
    /** Not bound to the main group from the start of the run and never bound to it since. */
    UNBOUND,
    /**
     * Outside the main group when the run ends, but not for good: falling back toward it, or
     * bound under the weakest repulsion the rest of the expansion history holds. The run ends
     * before its fate is settled.
     */
    RETURNING;

    /** The lower-case word used in files. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The fate of a file word, or null. */
    public static Fate of(String key) {
        for (Fate f : values()) {
            if (f.key().equals(key)) {
                return f;
            }
        }
        return null;
    }
}
