package org.holdfast.run;

/**
 * Why a run stopped.
 *
 * @param kind the category
 * @param message plain words for people, e.g. "stopped 0.5 Gyr before the big rip at 21.68 Gyr"
 */
public record StopReason(Kind kind, String message) {

    /** Categories of stop. */
    public enum Kind {
        /** Reached the requested end time. */
        REACHED_END,
        /** Stopped short of a big rip, which the integration cannot cross. */
        BEFORE_RIP,
        /** Stopped short of a big crunch. */
        BEFORE_CRUNCH,
        /** Stopped short of the Big Bang (backward runs). */
        BEFORE_BIG_BANG,
        /** A NaN or infinity appeared; the message names the time and the body. */
        NON_FINITE,
        /** Cancelled from outside (e.g. a closed window). */
        CANCELLED
    }

    /** The stop key written to summary files, e.g. "reached_end". */
    public String key() {
        return kind.name().toLowerCase(java.util.Locale.ROOT);
    }
}
