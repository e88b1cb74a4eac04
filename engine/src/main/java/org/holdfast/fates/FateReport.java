package org.holdfast.fates;

import java.util.List;
import java.util.Locale;

import org.holdfast.fates.FateTracker.Verdict;
import org.holdfast.run.RunEvent;

/**
 * The fates of a run in plain words, as a presenter could read them out: a table of members
 * and a timeline of events.
 */
public final class FateReport {

    private FateReport() {
    }

    /** "in 4.2 billion years", "1.3 billion years ago", "now", or Myr for short spans. */
    public static String when(double tGyr) {
        double a = Math.abs(tGyr);
        String span;
        if (a < 1e-6) {
            return "now";
        } else if (a < 1) {
            span = String.format(Locale.ROOT, "%.0f million years", a * 1e3);
        } else {
            span = String.format(Locale.ROOT, "%.1f billion years", a);
        }
        return tGyr > 0 ? "in " + span : span + " ago";
    }

    /** The fate table: one line per member, for a group that has not come apart. */
    public static String table(List<MemberFate> fates) {
        return table(fates, Verdict.BOUND);
    }

    /**
     * The fate table: one line per member. When the group came apart ({@link Verdict#DISSOLVED})
     * the member its "main group" ends with is alone, so it is not said to stay bound to a group.
     */
    public static String table(List<MemberFate> fates, Verdict verdict) {
        int width = 4;
        for (MemberFate f : fates) {
            width = Math.max(width, f.name().length());
        }
        StringBuilder sb = new StringBuilder();
        for (MemberFate f : fates) {
            String what = sentence(f);
            sb.append(String.format(Locale.ROOT, "  %-" + width + "s  %s%n", f.name(), what));
        }
        return sb.toString();
    }

    /** What happened to one member, in words. */
    public static String sentence(MemberFate f) {
        return switch (f.fate()) {
            case BOUND -> "stays bound to the group";
            case MERGED -> "merges into " + f.with() + " " + when(f.atGyr());
            case ESCAPED -> "escapes the group " + when(f.atGyr()) + leaving(f);
            case RIPPED -> "is torn away by dark energy " + when(f.atGyr()) + leaving(f);
            case UNBOUND -> "is not bound to the group from the start";
            case RETURNING -> "has left the group but is falling back when the run ends: its fate is not settled";
        };
    }

    /** ", gone past the zero-gravity radius in ..." when the leaving time is known. */
    private static String leaving(MemberFate f) {
        return Double.isNaN(f.leftGyr()) ? "" : " (beyond the zero-gravity radius " + when(f.leftGyr()) + ")";
    }

    /** The verdict in words. */
    public static String verdict(Verdict v, double boundUntilGyr) {
        return switch (v) {
            case BOUND -> "The group holds together.";
            case PARTLY_BOUND -> "Part of the group holds together; the members listed above as leaving do not.";
            case DISSOLVED -> "The group comes apart"
                    + (Double.isNaN(boundUntilGyr) ? "." : ": its last bound pair separates " + when(boundUntilGyr) + ".");
            case UNBOUND -> "The group is not bound: no member is bound to the heaviest one, even at the start.";
        };
    }

    /** The timeline of events, one line each. */
    public static String timeline(List<RunEvent> events) {
        if (events.isEmpty()) {
            return "  nothing happens: no mergers, no escapes, no member torn away\n";
        }
        StringBuilder sb = new StringBuilder();
        for (RunEvent e : events) {
            String who = e.members().isEmpty() ? "" : e.members().get(0);
            String what = switch (e.type()) {
                case MERGED -> String.join(" and ", e.members()) + " merge";
                case ESCAPED -> who + " escapes";
                case RIPPED -> who + " is torn away by dark energy";
                case UNBOUND -> who + " is not bound to the group from the start";
                case DISSOLVED -> "the group comes apart: " + String.join(" and ", e.members()) + " separate";
            };
            sb.append(String.format(Locale.ROOT, "  %-26s %s%n", when(e.tGyr()), what));
        }
        return sb.toString();
    }
}
