package org.holdfast.run;

import java.util.List;
import java.util.Locale;

/**
 * Something that happened to members during a run, at a time.
 *
 * @param tGyr when, Gyr from today
 * @param type what happened
 * @param members the members involved; for a merger the survivor's name first
 */
public record RunEvent(double tGyr, Kind type, List<String> members) {

    /** The kinds of event; {@link #key()} is the word written in files. */
    public enum Kind {
        /** Two members merged (survivor first). */
        MERGED,
        /** A member left the main group for good by its own motion. */
        ESCAPED,
        /** The barrier moved inside a member's orbit. */
        RIPPED,
        /** A member was not bound to the main group at the start. */
        UNBOUND,
        /** The main group lost its last bound pair: the group dissolved. */
        DISSOLVED;

        /** The lower-case word used in files. */
        public String key() {
            return name().toLowerCase(Locale.ROOT);
        }

        /** The kind of a file word, or null. */
        public static Kind of(String key) {
            for (Kind k : values()) {
                if (k.key().equals(key)) {
                    return k;
                }
            }
            return null;
        }
    }

    public RunEvent {
        members = List.copyOf(members);
    }

    /**
     * The file word of the kind. Kept so that code reading kinds as words keeps compiling while
     * it moves to {@link #type()}.
     */
    public String kind() {
        return type.key();
    }
}
