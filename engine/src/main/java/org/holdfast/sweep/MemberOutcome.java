package org.holdfast.sweep;

import java.io.Serializable;
import java.util.Arrays;
import java.util.List;

import com.fasterxml.jackson.annotation.JsonInclude;

import org.holdfast.fates.Fate;

/**
 * One member's outcome in one run as the sweep tables keep it: its {@link Fate} as the file word,
 * with what the sweep adds (together, subgroup, bound at the start).
 *
 * @param name the member's name
 * @param fate one of {@link Fate}'s keys: bound, merged, escaped, ripped, unbound (not bound to the
 *     group from the start) or returning (left, but not gone for good when the run ended)
 * @param atGyr when it happened; null for bound
 * @param with the member it merged with; null unless merged
 * @param leftGyr for a ripped member, when it actually left the group (the rip decides earlier
 *     than the member is far away); null otherwise or when the run does not say
 * @param together whether the member ends in the group that holds together: bound in it, or
 *     merged into a galaxy that is; null when the run does not say (then "bound" or merged into
 *     a bound member counts)
 * @param group the final bound subgroup that holds the member, or the galaxy it merged into,
 *     numbered from 1 in member order (a galaxy alone is a subgroup of its own); two members
 *     with the same number stay bound to each other or merged. Null when the run does not say.
 * @param boundAtStart whether the member belonged to the group's bound core at the start; null
 *     when the run does not say (then every member counts)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record MemberOutcome(String name, String fate, Double atGyr, String with, Double leftGyr, Boolean together,
        Integer group, Boolean boundAtStart) implements Serializable {

    private static final long serialVersionUID = 2L;

    /** The fates a member may have. */
    public static final List<String> FATES = Arrays.stream(Fate.values()).map(Fate::key).toList();

    /** The outcome of a member that is bound, or merged into a galaxy that stays bound. */
    public static final String TOGETHER = "together";

    /** A fate with nothing but its kind, time and partner known. */
    public MemberOutcome(String name, String fate, Double atGyr, String with) {
        this(name, fate, atGyr, with, null, null, null, null);
    }
}
