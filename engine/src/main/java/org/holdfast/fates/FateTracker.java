package org.holdfast.fates;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.BackgroundTide;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;
import org.holdfast.forces.Binding;

/**
 * Decides every member's fate by watching the run. At regular analysis times it finds the
 * hierarchical bound subgroups ({@link Subgroups}) in the current background field (the
 * dark-energy term, plus the mean matter term when the run includes it; a negative coefficient
 * gets no credit, {@link Binding}); the main group is the subgroup of the most massive body.
 *
 * <p>Fates at the end:
 * <ul>
 * <li>{@code bound}: in the main group, and the main group still holds (two members or more,
 *     or it absorbed members by merging);
 * <li>{@code unbound}: never in the main group at any analysis since the start;
 * <li>{@code ripped}: left the main group, and would still be bound to it with the field of the
 *     start of the run (so the change of the field unbound it); {@code escaped} otherwise. Either
 *     needs the member gone for good when the run ends ({@link Binding#leftForGood} under the
 *     weakest repulsion the rest of the expansion history holds); a member that left but is
 *     falling back is {@code returning}. The time is the analysis from which it stayed outside;
 *     the leaving time is when its separation passed the pair's zero-gravity radius.
 * </ul>
 * When the main group itself comes apart (the heaviest member ends alone, having lost its last
 * partner) the verdict is {@code dissolved} and the heaviest member shares the fate and times of
 * the partner whose departure dissolved it: nothing is "bound" to a group that no longer exists.
 * A group with no bound pair even at the start has the verdict {@code unbound}.
 *
 * <p>Times are resolved to the analysis interval.
 */
public final class FateTracker implements RunObserver {

    /** The group's verdict at the end. */
    public enum Verdict {
        BOUND("bound"), PARTLY_BOUND("partly-bound"), DISSOLVED("dissolved"), UNBOUND("unbound");

        private final String key;

        Verdict(String key) {
            this.key = key;
        }

        /** The word used in files. */
        public String key() {
            return key;
        }
    }

    /** Why a member stands where it does at the last analysis; NaN where there is no partner. */
    public record Why(double tGyr, boolean inMain, double separationKpc, double energy, double barrierEnergy,
            double barrierKpc, double zeroGravityKpc, double kCredited) {
    }

    private static final class Track {
        boolean inMain;
        boolean everInMain;
        double leftAt = Double.NaN;
        Fate leftAs;
        double leftGyr = Double.NaN;
        double lastExcess = Double.NaN;
        double lastT = Double.NaN;
        Why why;
    }

    private final BackgroundTide field;
    private final double intervalGyr;
    private final Map<String, Track> tracks = new LinkedHashMap<>();
    private double startGyr;
    private double kStart;
    private double lastAnalysis = Double.NaN;
    private double mainLostPairAt = Double.NaN;
    private boolean mainHasPair = true;
    private boolean everPair;
    private Verdict verdict = Verdict.BOUND;
    private String lastAlone;
    private int[] lastMain;
    private String lastPartner;

    /**
     * @param history the expansion, for k(t)
     * @param darkEnergy whether the run includes the dark-energy force
     * @param intervalGyr time between analyses
     */
    public FateTracker(ExpansionHistory history, boolean darkEnergy, double intervalGyr) {
        this(history, darkEnergy, false, intervalGyr);
    }

    /**
     * @param matter whether the run includes the mean matter density (then so does binding)
     */
    public FateTracker(ExpansionHistory history, boolean darkEnergy, boolean matter, double intervalGyr) {
        this.field = new BackgroundTide(history, darkEnergy, matter);
        this.intervalGyr = intervalGyr;
    }

    private double k(double tGyr) {
        return field.active() ? field.coefficient(tGyr) : 0.0;
    }

    @Override
    public void init(RunView run) {
        startGyr = run.tGyr();
        kStart = Binding.credited(k(startGyr));
        for (int i = 0; i < run.bodyCount(); i++) {
            tracks.put(run.bodyName(i), new Track());
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
        double k = k(t);
        Subgroups s = Subgroups.find(n, m, x, v, k, run::pairEnergy);
        int[] main = s.mainGroup(m);
        lastMain = main;
        boolean[] isMain = new boolean[n];
        for (int i : main) {
            isMain[i] = true;
        }
        // a main group that absorbed members by merging holds together even when it is one body now
        boolean pair = main.length >= 2 || absorbedInto(run, main);
        everPair |= pair;
        if (mainHasPair && !pair && Double.isNaN(mainLostPairAt)) {
            mainLostPairAt = t;
        }
        if (pair) {
            mainLostPairAt = Double.NaN;
        }
        mainHasPair = pair;
        for (int i = 0; i < n; i++) {
            Track tr = tracks.get(run.bodyName(i));
            if (tr == null) {
                continue;
            }
            Relative rel = Relative.of(i, main, m, x, v);
            tr.why = rel == null ? new Why(t, isMain[i], Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Binding.credited(k)) : rel.why(t, isMain[i], k);
            if (isMain[i] && (pair || n == 1)) {
                tr.inMain = true;
                tr.everInMain = true;
                tr.leftAt = Double.NaN;
                tr.leftAs = null;
                tr.leftGyr = Double.NaN;
            } else if (isMain[i]) {
                // the heaviest member alone: its partners' fates decide its own at the end
                tr.inMain = false;
            } else {
                if (tr.inMain) {
                    tr.inMain = false;
                    tr.leftAt = t;
                    tr.leftAs = rel.boundWith(kStart) && kStart != Binding.credited(k) ? Fate.RIPPED : Fate.ESCAPED;
                    tr.leftGyr = Double.NaN;
                    tr.lastT = Double.NaN;
                }
                noteZeroGravityCrossing(tr, t, tr.why);
            }
        }
    }

    /** Records when the separation first passes the zero-gravity radius, interpolated. */
    private static void noteZeroGravityCrossing(Track tr, double t, Why w) {
        double excess = w.separationKpc() - w.zeroGravityKpc();
        if (Double.isNaN(tr.leftGyr) && excess >= 0 && Double.isFinite(excess)) {
            boolean bracket = Double.isFinite(tr.lastExcess) && tr.lastExcess < 0 && !Double.isNaN(tr.lastT);
            tr.leftGyr = bracket ? tr.lastT + (t - tr.lastT) * (-tr.lastExcess) / (excess - tr.lastExcess) : t;
        }
        tr.lastExcess = excess;
        tr.lastT = t;
    }

    /** Whether any member of the main group survived a merger. */
    private static boolean absorbedInto(RunView run, int[] main) {
        List<RunEvent> events = run.events();
        for (int i : main) {
            String name = run.bodyName(i);
            for (RunEvent e : events) {
                if (e.type() == RunEvent.Kind.MERGED && e.members().get(0).equals(name)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** The weakest credited repulsion from now to the end of the expansion history. */
    private double weakestFutureK(double t) {
        ExpansionHistory h = field.history();
        double end = h.latestGyr();
        double kMin = Binding.credited(k(t));
        if (!(end > t)) {
            return kMin;
        }
        int samples = 512;
        for (int j = 1; j <= samples && kMin > 0; j++) {
            double tj = t + (end - t) * j / samples;
            kMin = Math.min(kMin, Binding.credited(k(Math.min(tj, end))));
        }
        return kMin;
    }

    /** Why each member stands where it does at the last analysis, by name. */
    public Map<String, Why> why() {
        Map<String, Why> out = new LinkedHashMap<>();
        tracks.forEach((name, tr) -> out.put(name, tr.why));
        return out;
    }

    /** Every member's fate as it stands (after the run: the answer). Also sets the verdict. */
    public List<MemberFate> fates(RunView run) {
        Map<String, RunEvent> mergedInto = new HashMap<>();
        for (RunEvent e : run.events()) {
            if (e.type() == RunEvent.Kind.MERGED) {
                for (int j = 1; j < e.members().size(); j++) {
                    mergedInto.put(e.members().get(j), e);
                }
            }
        }
        double kWeak = weakestFutureK(run.tGyr());
        List<MemberFate> out = new ArrayList<>();
        boolean anyOutside = false;
        MemberFate tore = null;
        String alone = null;
        String partner = null;
        double partnerLeft = Double.NaN;
        for (Map.Entry<String, Track> en : tracks.entrySet()) {
            String name = en.getKey();
            RunEvent merger = mergedInto.get(name);
            Track tr = en.getValue();
            MemberFate f;
            if (merger != null) {
                f = new MemberFate(name, Fate.MERGED, merger.tGyr(), merger.members().get(0));
            } else if (tr.inMain) {
                f = new MemberFate(name, Fate.BOUND, Double.NaN, null);
            } else if (!tr.everInMain && tr.leftAs == null) {
                f = new MemberFate(name, Fate.UNBOUND, startGyr, null);
            } else if (tr.leftAs == null) {
                alone = name;
                f = null;
            } else {
                Relative rel = lastMain == null || lastMain.length == 0 || lastMain[0] >= run.bodyCount() ? null
                        : Relative.inRun(run, name, lastMain);
                boolean gone = rel == null || rel.leftForGood(kWeak);
                f = gone ? new MemberFate(name, tr.leftAs, tr.leftAt, tr.leftGyr, null)
                        : new MemberFate(name, Fate.RETURNING, Double.NaN, null);
                if (gone && (tore == null || tr.leftAt >= tore.atGyr())) {
                    tore = f;
                }
                if (tr.leftAs != null && (partner == null || tr.leftAt >= partnerLeft)) {
                    partner = name;
                    partnerLeft = tr.leftAt;
                }
            }
            if (f != null && f.fate() != Fate.BOUND && f.fate() != Fate.MERGED) {
                anyOutside = true;
            }
            out.add(f);
        }
        if (alone != null) {
            // the heaviest member, left alone: it shares the fate of the departure that dissolved the group
            int at = new ArrayList<>(tracks.keySet()).indexOf(alone);
            out.set(at, tore == null ? new MemberFate(alone, everPair ? Fate.RETURNING : Fate.UNBOUND,
                    everPair ? Double.NaN : startGyr, null)
                    : new MemberFate(alone, tore.fate(), tore.atGyr(), tore.leftGyr(), null));
            anyOutside = true;
        }
        lastAlone = alone;
        lastPartner = partner;
        verdict = tracks.size() == 1 ? Verdict.BOUND : !everPair ? Verdict.UNBOUND
                : alone != null ? Verdict.DISSOLVED : anyOutside ? Verdict.PARTLY_BOUND : Verdict.BOUND;
        return out;
    }

    /** The group's verdict at the end (as of the last call of {@link #fates}). */
    public Verdict verdict() {
        return verdict;
    }

    /** When the main group lost its last bound pair, or NaN if it never did (or never had one). */
    public double boundUntilGyr() {
        return mainHasPair || !everPair ? Double.NaN : mainLostPairAt;
    }

    /**
     * Events in time order: the simulation's own (mergers) and, from the fates as they stand,
     * escapes, rips, members unbound from the start, and the dissolution of the group.
     */
    public List<RunEvent> events(RunView run) {
        List<RunEvent> all = new ArrayList<>(run.events());
        List<MemberFate> fates = fates(run);
        for (MemberFate f : fates) {
            RunEvent.Kind kind = switch (f.fate()) {
                case ESCAPED -> RunEvent.Kind.ESCAPED;
                case RIPPED -> RunEvent.Kind.RIPPED;
                case UNBOUND -> RunEvent.Kind.UNBOUND;
                default -> null;
            };
            if (kind != null) {
                all.add(new RunEvent(f.atGyr(), kind, List.of(f.name())));
            }
        }
        if (verdict == Verdict.DISSOLVED && !Double.isNaN(boundUntilGyr())) {
            all.add(new RunEvent(boundUntilGyr(), RunEvent.Kind.DISSOLVED, lastPartner == null ? List.of(lastAlone)
                    : List.of(lastAlone, lastPartner)));
        }
        all.sort(Comparator.comparingDouble(RunEvent::tGyr));
        return all;
    }
}
