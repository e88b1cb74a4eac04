package org.holdfast.sweep;

import java.io.Serializable;
import java.util.List;

/**
 * One member's fate in one run.
 *
 * @param name the member's name
 * @param fate bound, merged, escaped or ripped
 * @param atGyr when it happened; null for bound
 * @param with the member it merged with; null unless merged
 */
public record MemberFate(String name, String fate, Double atGyr, String with) implements Serializable {

    private static final long serialVersionUID = 1L;

    /** The fates a member may have. */
    public static final List<String> FATES = List.of("bound", "merged", "escaped", "ripped");
}
