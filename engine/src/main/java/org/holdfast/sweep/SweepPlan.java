package org.holdfast.sweep;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything that decides which runs a sweep makes and what each gives: the scenario (by the
 * SHA-256 of its text), the fixed overrides, the grid, the samples per point, the master seed,
 * the end time and the shard. Written to {@code sweep.json} so that a restart, or a merge of
 * shards, can check it is continuing the same sweep.
 *
 * <p>Grid points are numbered row-major in the order the axes were given (the last axis
 * varies fastest); run {@code r} is sample {@code r % samples} of point {@code r / samples};
 * shard {@code i} of {@code n} makes the runs with {@code r % n == i - 1}.
 *
 * @param format version of this layout
 * @param scenario the scenario file as given (informative only)
 * @param scenarioSha256 hex SHA-256 of the scenario text
 * @param set fixed overrides ({@code --set}), in order
 * @param axes the varied keys
 * @param samples runs per grid point
 * @param sample whether uncertain numbers are drawn (true with {@code --samples})
 * @param seed master seed
 * @param untilGyr end time; null for the scenario's own
 * @param keepSnapshots whether runs write snapshots
 * @param shardIndex this shard, from 1
 * @param shardCount number of shards
 * @param draws {@link #PAIRED} (draw s of the uncertain numbers is the same at every grid
 *     point: common random numbers) or {@link #INDEPENDENT} (fresh draws at every point)
 * @param pairs named pairs of members whose staying together is counted ({@code --pair A,B});
 *     they change the tables, not the runs, so two plans that differ only here are the same sweep
 * @param outcome what the two-key map shows: null for the group staying bound, a member's name
 *     (it ends together), or {@code A+B} (a named pair); like the pairs, pictures only
 */
public record SweepPlan(int format, String scenario, String scenarioSha256, Map<String, String> set,
        List<Axis> axes, int samples, boolean sample, long seed, Double untilGyr, boolean keepSnapshots,
        int shardIndex, int shardCount, String draws, List<List<String>> pairs, String outcome) {

    /** The current layout version. */
    public static final int FORMAT = 2;

    /** Draw s is the same at every grid point (the default). */
    public static final String PAIRED = "paired";

    /** Every run draws afresh. */
    public static final String INDEPENDENT = "independent";

    public SweepPlan {
        set = new LinkedHashMap<>(set);
        axes = List.copyOf(axes);
        draws = draws == null ? INDEPENDENT : draws;
        pairs = pairs == null ? List.of() : pairs.stream().map(List::copyOf).toList();
    }

    /** A plan with paired draws and no named pairs. */
    public SweepPlan(int format, String scenario, String scenarioSha256, Map<String, String> set, List<Axis> axes,
            int samples, boolean sample, long seed, Double untilGyr, boolean keepSnapshots, int shardIndex,
            int shardCount) {
        this(format, scenario, scenarioSha256, set, axes, samples, sample, seed, untilGyr, keepSnapshots, shardIndex,
                shardCount, PAIRED, List.of(), null);
    }

    /** The number of grid points (1 when nothing is varied). */
    public long points() {
        long p = 1;
        for (Axis a : axes) {
            p *= a.size();
        }
        return p;
    }

    /** The number of runs in the whole sweep, all shards together. */
    public long runs() {
        return points() * samples;
    }

    /** Whether run {@code r} belongs to this shard. */
    public boolean inShard(long run) {
        return run % shardCount == shardIndex - 1;
    }

    /** The number of runs in this shard. */
    public long runsInShard() {
        long total = runs();
        long first = shardIndex - 1;
        return first >= total ? 0 : (total - 1 - first) / shardCount + 1;
    }

    /** The varied values at a grid point, one per axis. */
    public double[] valuesAt(int point) {
        double[] v = new double[axes.size()];
        int rest = point;
        for (int i = axes.size() - 1; i >= 0; i--) {
            Axis a = axes.get(i);
            v[i] = a.values().get(rest % a.size());
            rest /= a.size();
        }
        return v;
    }

    /** The grid index of each axis at a point (the last axis varies fastest). */
    public int[] indicesAt(int point) {
        int[] idx = new int[axes.size()];
        int rest = point;
        for (int i = axes.size() - 1; i >= 0; i--) {
            idx[i] = rest % axes.get(i).size();
            rest /= axes.get(i).size();
        }
        return idx;
    }

    /** The overrides of a run at a grid point: the fixed ones, then the varied ones. */
    public Map<String, String> overridesAt(int point) {
        Map<String, String> o = new LinkedHashMap<>(set);
        double[] v = valuesAt(point);
        for (int i = 0; i < v.length; i++) {
            o.put(axes.get(i).key(), Axis.format(v[i]));
        }
        return o;
    }

    /** The keys that the axes vary, in order. */
    public List<String> variedKeys() {
        List<String> keys = new ArrayList<>();
        for (Axis a : axes) {
            keys.add(a.key());
        }
        return keys;
    }

    /**
     * The runs of this shard that are not yet done, with their seeds, in run order. With paired
     * draws, sample s of every grid point is draw s of the master seed, so that every uncertain
     * number, drawn from (seed, draw, key path), is the same across the grid (and the same as
     * {@code evolve --seed SEED --sample s} gives); otherwise each run has its own seed from
     * {@link SeedPlan} and draw 0.
     */
    public List<RunTask> pendingTasks(BitSet done) {
        List<RunTask> tasks = new ArrayList<>();
        SeedPlan seeds = new SeedPlan(seed);
        List<String> varied = variedKeys();
        boolean paired = PAIRED.equals(draws);
        for (int p = 0; p < points(); p++) {
            long[] s = paired ? null : seeds.forPoint(p, samples);
            for (int k = 0; k < samples; k++) {
                long run = (long) p * samples + k;
                if (inShard(run) && !done.get((int) run)) {
                    tasks.add(paired ? new RunTask(run, p, k, seed, k, overridesAt(p), varied)
                            : new RunTask(run, p, k, s[k], 0, overridesAt(p), varied));
                }
            }
        }
        return tasks;
    }

    /** This plan as shard {@code index} of {@code count}. */
    public SweepPlan withShard(int index, int count) {
        return new SweepPlan(format, scenario, scenarioSha256, set, axes, samples, sample, seed, untilGyr,
                keepSnapshots, index, count, draws, pairs, outcome);
    }

    /** This plan with other named pairs and map outcome (what the tables and pictures show). */
    public SweepPlan withShown(List<List<String>> newPairs, String newOutcome) {
        return new SweepPlan(format, scenario, scenarioSha256, set, axes, samples, sample, seed, untilGyr,
                keepSnapshots, shardIndex, shardCount, draws, newPairs, newOutcome);
    }

    /**
     * The first setting in which two sweeps differ, in the words of the command line.
     *
     * @param other how the other sweep has it ("--seed 43", "no --until")
     * @param mine how this sweep has it
     */
    public record Difference(String other, String mine) {
    }

    /**
     * How this sweep differs from another, ignoring the shard and the scenario's file name.
     *
     * @return the first differing setting, or null if both describe the same sweep
     */
    public Difference differenceFrom(SweepPlan o) {
        if (format != o.format) {
            return new Difference("layout version " + o.format, "layout version " + format);
        }
        if (!scenarioSha256.equals(o.scenarioSha256)) {
            return new Difference("a scenario with SHA-256 " + shortHash(o.scenarioSha256),
                    "a scenario with SHA-256 " + shortHash(scenarioSha256));
        }
        if (!set.equals(o.set)) {
            return new Difference(describeSet(o.set), describeSet(set));
        }
        if (!axes.equals(o.axes)) {
            return new Difference(describe(o.axes), describe(axes));
        }
        if (samples != o.samples || sample != o.sample) {
            return new Difference(o.describeSamples(), describeSamples());
        }
        if (!draws.equals(o.draws)) {
            return new Difference("--draws " + o.draws, "--draws " + draws);
        }
        if (seed != o.seed) {
            return new Difference("--seed " + o.seed, "--seed " + seed);
        }
        if (!Objects.equals(untilGyr, o.untilGyr)) {
            return new Difference(describeUntil(o.untilGyr), describeUntil(untilGyr));
        }
        if (keepSnapshots != o.keepSnapshots) {
            return new Difference(o.keepSnapshots ? "--keep-snapshots" : "no --keep-snapshots",
                    keepSnapshots ? "--keep-snapshots" : "no --keep-snapshots");
        }
        return null;
    }

    private String describeSamples() {
        return sample ? "--samples " + samples : "no --samples";
    }

    private static String describeUntil(Double until) {
        return until == null ? "no --until" : "--until " + until;
    }

    private static String describeSet(Map<String, String> set) {
        if (set.isEmpty()) {
            return "no --set";
        }
        List<String> parts = new ArrayList<>();
        set.forEach((k, v) -> parts.add("--set " + k + "=" + v));
        return String.join(" ", parts);
    }

    private static String shortHash(String h) {
        return h.length() > 12 ? h.substring(0, 12) : h;
    }

    private static String describe(List<Axis> axes) {
        if (axes.isEmpty()) {
            return "no --vary";
        }
        List<String> parts = new ArrayList<>();
        for (Axis a : axes) {
            parts.add("--vary " + a.key() + " (" + a.size() + (a.size() == 1 ? " value" : " values") + " from "
                    + Axis.format(a.values().get(0)) + " to " + Axis.format(a.values().get(a.size() - 1)) + ")");
        }
        return String.join(" ", parts);
    }
}
