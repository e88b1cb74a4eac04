package org.holdfast.fates;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.fates.MemberFate.Fate;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;

/**
 * Decides every member's fate by watching the run. At regular analysis times it finds the
 * hierarchical bound subgroups ({@link Subgroups}) in the current dark-energy field; the main
 * group is the subgroup of the most massive body. A member that leaves the main group is
 * {@code ripped} if it would still be bound to it with the dark-energy coefficient of the start
 * of the run (so the growth of k unbound it), otherwise {@code escaped}; one that comes back
 * is bound again. Mergers come from the simulation's own events.
 *
 * <p>The main group holds while it has two members or more, or has absorbed members by merging.
 *
 * <p>Times are resolved to the analysis interval: a member's time is the first analysis time
 * at which it was found outside the main group for good.
 */
public final class FateTracker implements RunObserver {

    /** The group's verdict at the end. */
    public enum Verdict {
        BOUND("bound"), PARTLY_BOUND("partly-bound"), DISSOLVED("dissolved");

        private final String key;

        Verdict(String key) {
            this.key = key;
        }

        /** The word used in files. */
        public String key() {
            return key;
        }
    }

    private static final class Track {
        boolean inMain;
        double leftAt = Double.NaN;
        Fate leftAs;
    }

    private final ExpansionHistory history;
    private final boolean darkEnergy;
    private final double intervalGyr;
    private final Map<String, Track> tracks = new LinkedHashMap<>();
    private double kStart;
    private double lastAnalysis = Double.NaN;
    private double mainLostPairAt = Double.NaN;
    private boolean mainHasPair = true;
    private int bodiesAtEnd;
    private int outsideAtEnd;

    /**
     * @param history the expansion, for k(t)
     * @param darkEnergy whether the run includes the dark-energy force
     * @param intervalGyr time between analyses
     */
    public FateTracker(ExpansionHistory history, boolean darkEnergy, double intervalGyr) {
        this.history = history;
        this.darkEnergy = darkEnergy;
        this.intervalGyr = intervalGyr;
    }

    private double k(double tGyr) {
        return darkEnergy ? history.darkEnergyAcceleration(tGyr) : 0.0;
    }

    @Override
    public void init(RunView run) {
        kStart = k(run.tGyr());
        for (int i = 0; i < run.bodyCount(); i++) {
            Track t = new Track();
            t.inMain = true;
            tracks.put(run.bodyName(i), t);
        }
        analyse(run);
    }

    @Override
    public void afterStep(RunView run) {
        if (Math.abs(run.tGyr() - lastAnalysis) >= intervalGyr) {
            analyse(run);
        }
    }

    @Override
    public void atSnapshot(RunView run) {
        if (run.tGyr() != lastAnalysis) {
            analyse(run);
        }
    }

    @Override
    public void finish(RunView run, StopReason reason) {
        if (run.tGyr() != lastAnalysis) {
            analyse(run);
        }
    }

    private void analyse(RunView run) {
        double t = run.tGyr();
        lastAnalysis = t;
        int n = run.bodyCount();
        double[] m = run.bodyMass();
        double[][] x = {run.bodyX(), run.bodyY(), run.bodyZ()};
        double[][] v = {run.bodyVx(), run.bodyVy(), run.bodyVz()};
        Subgroups s = Subgroups.find(n, m, x, v, k(t));
        int[] main = s.mainGroup(m);
        boolean[] isMain = new boolean[n];
        for (int i : main) {
            isMain[i] = true;
        }
        // a main group that absorbed members by merging holds together even when it is one body now
        boolean pair = main.length >= 2 || absorbedInto(run, main);
        if (mainHasPair && !pair && Double.isNaN(mainLostPairAt)) {
            mainLostPairAt = t;
        }
        if (pair) {
            mainLostPairAt = Double.NaN;
        }
        mainHasPair = pair;
        int outside = 0;
        for (int i = 0; i < n; i++) {
            Track tr = tracks.get(run.bodyName(i));
            if (tr == null) {
                continue;
            }
            if (isMain[i] || n == 1) {
                tr.inMain = true;
                tr.leftAt = Double.NaN;
                tr.leftAs = null;
            } else {
                outside++;
                if (tr.inMain) {
                    tr.inMain = false;
                    tr.leftAt = t;
                    tr.leftAs = wouldStayWithStartField(i, main, m, x, v) ? Fate.RIPPED : Fate.ESCAPED;
                }
            }
        }
        bodiesAtEnd = n;
        outsideAtEnd = outside;
    }

    /** Whether any member of the main group survived a merger. */
    private static boolean absorbedInto(RunView run, int[] main) {
        List<RunEvent> events = run.events();
        if (events.isEmpty()) {
            return false;
        }
        for (int i : main) {
            String name = run.bodyName(i);
            for (RunEvent e : events) {
                if (e.kind().equals("merged") && e.members().get(0).equals(name)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Whether body i would be bound to the main group if k still had its starting value. */
    private boolean wouldStayWithStartField(int i, int[] main, double[] m, double[][] x, double[][] v) {
        double mm = 0;
        double[] cx = new double[3];
        double[] cv = new double[3];
        for (int j : main) {
            mm += m[j];
            for (int c = 0; c < 3; c++) {
                cx[c] += m[j] * x[c][j];
                cv[c] += m[j] * v[c][j];
            }
        }
        double[] dx = new double[3];
        double[] dv = new double[3];
        for (int c = 0; c < 3; c++) {
            dx[c] = x[c][i] - cx[c] / mm;
            dv[c] = v[c][i] - cv[c] / mm;
        }
        return Binding.test(mm + m[i], kStart, dx, dv).bound() && kStart != k(lastAnalysis);
    }

    /** Every member's fate; call after the run. */
    public List<MemberFate> fates(RunView run) {
        Map<String, RunEvent> mergedInto = new HashMap<>();
        for (RunEvent e : run.events()) {
            if (e.kind().equals("merged")) {
                for (int j = 1; j < e.members().size(); j++) {
                    mergedInto.put(e.members().get(j), e);
                }
            }
        }
        List<MemberFate> out = new ArrayList<>();
        for (Map.Entry<String, Track> en : tracks.entrySet()) {
            String name = en.getKey();
            RunEvent merger = mergedInto.get(name);
            Track tr = en.getValue();
            if (merger != null) {
                out.add(new MemberFate(name, Fate.MERGED, merger.tGyr(), merger.members().get(0)));
            } else if (tr.inMain) {
                out.add(new MemberFate(name, Fate.BOUND, Double.NaN, null));
            } else {
                out.add(new MemberFate(name, tr.leftAs, tr.leftAt, null));
            }
        }
        return out;
    }

    /** The group's verdict at the end. */
    public Verdict verdict() {
        if (bodiesAtEnd <= 1 || outsideAtEnd == 0) {
            return Verdict.BOUND;
        }
        return mainHasPair ? Verdict.PARTLY_BOUND : Verdict.DISSOLVED;
    }

    /** When the main group lost its last bound pair, or NaN if it never did. */
    public double boundUntilGyr() {
        return mainHasPair ? Double.NaN : mainLostPairAt;
    }

    /**
     * Escape and rip events in time order, and the simulation's own events merged in. During a
     * run these are the events as they stand at the last analysis: a member that rejoins the
     * main group loses its escape.
     */
    public List<RunEvent> events(RunView run) {
        List<RunEvent> all = new ArrayList<>(run.events());
        for (Map.Entry<String, Track> en : tracks.entrySet()) {
            Track tr = en.getValue();
            if (!tr.inMain && tr.leftAs != null) {
                all.add(new RunEvent(tr.leftAt, tr.leftAs.key(), List.of(en.getKey())));
            }
        }
        all.sort(java.util.Comparator.comparingDouble(RunEvent::tGyr));
        return all;
    }
}
