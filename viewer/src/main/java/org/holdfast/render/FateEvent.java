package org.holdfast.render;

import java.util.List;
import java.util.Objects;

import org.holdfast.run.RunEvent;

/**
 * One fate event in view: when it happened, what kind, and the members it concerns (for a
 * merger, the survivor first).
 *
 * @param tGyr simulated time of the event, Gyr from today
 * @param kind what happened
 * @param members names of the galaxies involved, at least one
 */
public record FateEvent(double tGyr, RunEvent.Kind kind, List<String> members) {

    public FateEvent {
        Objects.requireNonNull(kind, "kind");
        members = List.copyOf(members);
        if (members.isEmpty()) {
            throw new IllegalArgumentException("a fate event needs at least one member");
        }
        if (!Double.isFinite(tGyr)) {
            throw new IllegalArgumentException("event time must be finite: " + tGyr);
        }
    }

    /**
     * The event as one line of plain words, e.g. "Tessaly merged with Brin". Each kind is told
     * with the word of its key in summary.json and the fate table (merged, escaped, ripped,
     * unbound, dissolved), so that a film's audience and a reader of the run's files name the
     * same event alike.
     */
    public String describe() {
        String first = members.get(0);
        String all = String.join(" and ", members);
        return switch (kind) {
            case MERGED -> members.size() == 1 ? first + " merged"
                    : first + " merged with " + String.join(" and ", members.subList(1, members.size()));
            case ESCAPED -> all + " escaped the group";
            case RIPPED -> all + " ripped away by dark energy";
            case UNBOUND -> all + (members.size() == 1 ? " was" : " were") + " unbound from the start";
            case DISSOLVED -> "the group dissolved (" + all + ")";
        };
    }
}
