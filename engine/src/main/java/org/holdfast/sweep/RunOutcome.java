package org.holdfast.sweep;

import java.io.Serializable;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * What one run found.
 *
 * @param verdict the group's verdict over the members bound at the start: bound (all of them
 *     end together), partly-bound (two or more of them do), dissolved (none stay together), or
 *     unbound (no two members were bound at the start)
 * @param boundUntilGyr when the group stopped being bound; null if it stayed bound
 * @param members each member's fate, in scenario order
 * @param energyBudgetError relative error of the run's energy budget
 * @param wallS wall-clock seconds the run took
 * @param sampledValues the values drawn for uncertain numbers, by dotted key (empty when not
 *     sampling)
 */
public record RunOutcome(String verdict, Double boundUntilGyr, List<MemberOutcome> members,
        double energyBudgetError, double wallS, Map<String, Double> sampledValues) implements Serializable {

    private static final long serialVersionUID = 1L;

    /** The group verdicts a run may give. */
    public static final List<String> VERDICTS = List.of("bound", "partly-bound", "dissolved", "unbound");

    public RunOutcome {
        members = List.copyOf(members);
        sampledValues = sampledValues == null ? new TreeMap<>() : new TreeMap<>(sampledValues);
    }

    /** The same outcome with another wall-clock time. */
    public RunOutcome withWallS(double seconds) {
        return new RunOutcome(verdict, boundUntilGyr, members, energyBudgetError, seconds, sampledValues);
    }

    /** The fate of the named member, or null if the run does not know it. */
    public MemberOutcome member(String name) {
        for (MemberOutcome m : members) {
            if (m.name().equals(name)) {
                return m;
            }
        }
        return null;
    }
}
