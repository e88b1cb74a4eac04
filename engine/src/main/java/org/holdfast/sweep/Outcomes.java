package org.holdfast.sweep;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The outcomes a sweep counts beyond a member's fate, read off one run: whether a member ends
 * {@code together} with the group, and whether two named members stay bound to each other (or
 * merged). Both use what the run recorded ({@link MemberOutcome#together()},
 * {@link MemberOutcome#group()}); for a run that recorded only fates (an older journal, a test's
 * stand-in physics) they fall back on the fates: bound counts as together, and merged counts
 * as the galaxy it merged into.
 */
public final class Outcomes {

    private Outcomes() {
    }

    /** Whether the member is bound, or merged into a galaxy that stays bound; false if unknown. */
    public static boolean together(RunOutcome o, String name) {
        MemberOutcome f = o.member(name);
        if (f == null) {
            return false;
        }
        if (f.together() != null) {
            return f.together();
        }
        MemberOutcome end = survivor(o, f);
        return end != null && end.fate().equals("bound");
    }

    /**
     * Whether two members end bound to each other or merged, directly or through a third galaxy:
     * symmetric in {@code a} and {@code b}.
     */
    public static boolean pairTogether(RunOutcome o, String a, String b) {
        MemberOutcome fa = o.member(a);
        MemberOutcome fb = o.member(b);
        if (fa == null || fb == null) {
            return false;
        }
        if (fa.group() != null && fb.group() != null) {
            return fa.group().equals(fb.group());
        }
        MemberOutcome ea = survivor(o, fa);
        MemberOutcome eb = survivor(o, fb);
        if (ea == null || eb == null) {
            return false;
        }
        return ea.name().equals(eb.name()) || (ea.fate().equals("bound") && eb.fate().equals("bound"));
    }

    /** The galaxy a member ends in: itself, or the end of its chain of mergers; null for a broken chain. */
    static MemberOutcome survivor(RunOutcome o, MemberOutcome f) {
        Set<String> seen = new HashSet<>();
        MemberOutcome at = f;
        while (at != null && at.fate().equals("merged") && at.with() != null) {
            if (!seen.add(at.name())) {
                return null;
            }
            at = o.member(at.with());
        }
        return at;
    }

    /** The canonical name of a pair in tables: the two names joined with '+', in the order given. */
    public static String pairName(List<String> pair) {
        return pair.get(0) + "+" + pair.get(1);
    }
}
