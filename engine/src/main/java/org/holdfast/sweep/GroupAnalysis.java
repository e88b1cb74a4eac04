package org.holdfast.sweep;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.fates.Subgroups;
import org.holdfast.run.RunView;

/**
 * The sweep's reading of a run's start and end, with the public fates API
 * ({@link Subgroups}): which members form the bound core at the start, which final bound
 * subgroup holds each member (or the galaxy it merged into), which of those subgroups is the
 * group that holds together, and the group's verdict over the members bound at the start.
 *
 * <p>Definitions, chosen so that nothing depends on which member is heavier:
 * <ul>
 * <li>the <em>core</em> at the start is the bound subgroup with the most members (ties: the
 * larger total mass); a member is bound at the start if it is in the core and the core has
 * two members or more;</li>
 * <li>at the end each member is counted in the subgroup of the galaxy it ends in (itself, or
 * the one it merged into); the <em>holding group</em> is the subgroup holding the most members
 * that were bound at the start (ties: the most members, then the larger mass), provided it
 * holds two members or more;</li>
 * <li>a member is {@code together} when it is counted in the holding group;</li>
 * <li>the verdict: {@code unbound} when fewer than two members were bound at the start,
 * {@code bound} when all of them are together, {@code partly-bound} when two or more of them
 * still share one subgroup, otherwise {@code dissolved}.</li>
 * </ul>
 */
public final class GroupAnalysis {

    private GroupAnalysis() {
    }

    /** The state of the bodies at one instant, copied out of a run. */
    public record State(String[] names, double[] mass, double[][] x, double[][] v, double k) {

        /** Copies the bodies of a run as they are now, with the dark-energy coefficient k (1/Gyr^2). */
        public static State of(RunView run, double k) {
            int n = run.bodyCount();
            String[] names = new String[n];
            for (int i = 0; i < n; i++) {
                names[i] = run.bodyName(i);
            }
            double[][] x = {copy(run.bodyX(), n), copy(run.bodyY(), n), copy(run.bodyZ(), n)};
            double[][] v = {copy(run.bodyVx(), n), copy(run.bodyVy(), n), copy(run.bodyVz(), n)};
            return new State(names, copy(run.bodyMass(), n), x, v, k);
        }

        private static double[] copy(double[] a, int n) {
            return java.util.Arrays.copyOf(a, n);
        }

        int[] groups() {
            Subgroups s = Subgroups.find(names.length, mass, x, v, k);
            int[] g = new int[names.length];
            for (int i = 0; i < g.length; i++) {
                g[i] = s.groupOf(i);
            }
            return g;
        }
    }

    /** The answer: the members with their extra fields filled in, and the verdict. */
    public record Result(List<MemberOutcome> members, String verdict) {
    }

    /**
     * @param fates every member's fate, in scenario order (merged members name the galaxy they
     *     merged into)
     * @param start the bodies at the start (every member)
     * @param end the bodies at the end (the survivors of mergers)
     */
    public static Result analyse(List<MemberOutcome> fates, State start, State end) {
        Map<String, Boolean> atStart = boundAtStart(start);
        Map<String, Integer> endIndex = new HashMap<>();
        for (int i = 0; i < end.names().length; i++) {
            endIndex.put(end.names()[i], i);
        }
        int[] endGroup = end.groups();
        RunOutcome probe = new RunOutcome("", null, fates, 0, 0, null);
        // the end subgroup each member is counted in; -1 when its galaxy is not found
        Map<String, Integer> raw = new LinkedHashMap<>();
        for (MemberOutcome f : fates) {
            MemberOutcome s = Outcomes.survivor(probe, f);
            Integer i = s == null ? null : endIndex.get(s.name());
            raw.put(f.name(), i == null ? -1 : endGroup[i]);
        }
        int holding = holdingGroup(raw, atStart, end, endGroup);
        Map<Integer, Integer> number = new HashMap<>();
        List<MemberOutcome> out = new ArrayList<>();
        for (MemberOutcome f : fates) {
            int g = raw.get(f.name());
            Integer label = g < 0 ? null : number.computeIfAbsent(g, k -> number.size() + 1);
            boolean together = g >= 0 && g == holding;
            out.add(new MemberOutcome(f.name(), f.fate(), f.atGyr(), f.with(), f.leftGyr(), together, label,
                    atStart.getOrDefault(f.name(), false)));
        }
        return new Result(out, verdict(raw, atStart));
    }

    /** Members of the largest bound subgroup at the start, if it has two or more. */
    static Map<String, Boolean> boundAtStart(State start) {
        int[] g = start.groups();
        Map<Integer, int[]> count = new HashMap<>(); // members, then mass rank
        Map<Integer, Double> mass = new HashMap<>();
        for (int i = 0; i < g.length; i++) {
            count.computeIfAbsent(g[i], k -> new int[1])[0]++;
            mass.merge(g[i], start.mass()[i], Double::sum);
        }
        int core = -1;
        for (int c : count.keySet()) {
            if (core < 0 || count.get(c)[0] > count.get(core)[0]
                    || (count.get(c)[0] == count.get(core)[0] && mass.get(c) > mass.get(core))) {
                core = c;
            }
        }
        Map<String, Boolean> out = new HashMap<>();
        for (int i = 0; i < g.length; i++) {
            out.put(start.names()[i], g[i] == core && count.get(core)[0] >= 2);
        }
        return out;
    }

    private static int holdingGroup(Map<String, Integer> raw, Map<String, Boolean> atStart, State end, int[] endGroup) {
        Map<Integer, int[]> tally = new HashMap<>(); // {bound at start, members}
        raw.forEach((name, g) -> {
            if (g >= 0) {
                int[] t = tally.computeIfAbsent(g, k -> new int[2]);
                t[0] += atStart.getOrDefault(name, false) ? 1 : 0;
                t[1]++;
            }
        });
        Map<Integer, Double> mass = new HashMap<>();
        for (int i = 0; i < endGroup.length; i++) {
            mass.merge(endGroup[i], end.mass()[i], Double::sum);
        }
        int best = -1;
        for (Map.Entry<Integer, int[]> e : tally.entrySet()) {
            int g = e.getKey();
            int[] t = e.getValue();
            if (best < 0) {
                best = g;
                continue;
            }
            int[] b = tally.get(best);
            if (t[0] > b[0] || (t[0] == b[0] && (t[1] > b[1] || (t[1] == b[1] && mass.get(g) > mass.get(best))))) {
                best = g;
            }
        }
        return best >= 0 && tally.get(best)[1] >= 2 ? best : -1;
    }

    private static String verdict(Map<String, Integer> raw, Map<String, Boolean> atStart) {
        Map<Integer, Integer> ofCore = new HashMap<>();
        int core = 0;
        for (Map.Entry<String, Integer> e : raw.entrySet()) {
            if (atStart.getOrDefault(e.getKey(), false)) {
                core++;
                if (e.getValue() >= 0) {
                    ofCore.merge(e.getValue(), 1, Integer::sum);
                }
            }
        }
        if (core < 2) {
            return "unbound";
        }
        int most = ofCore.values().stream().mapToInt(Integer::intValue).max().orElse(0);
        return most == core ? "bound" : most >= 2 ? "partly-bound" : "dissolved";
    }
}
