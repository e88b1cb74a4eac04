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
 */
public record SweepPlan(int format, String scenario, String scenarioSha256, Map<String, String> set,
        List<Axis> axes, int samples, boolean sample, long seed, Double untilGyr, boolean keepSnapshots,
        int shardIndex, int shardCount) {

    /** The current layout version. */
    public static final int FORMAT = 1;

    public SweepPlan {
        set = new LinkedHashMap<>(set);
        axes = List.copyOf(axes);
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

    /** The runs of this shard that are not yet done, with their seeds, in run order. */
    public List<RunTask> pendingTasks(BitSet done) {
        List<RunTask> tasks = new ArrayList<>();
        SeedPlan seeds = new SeedPlan(seed);
        List<String> varied = variedKeys();
        for (int p = 0; p < points(); p++) {
            long[] s = seeds.forPoint(p, samples);
            for (int k = 0; k < samples; k++) {
                long run = (long) p * samples + k;
                if (inShard(run) && !done.get((int) run)) {
                    tasks.add(new RunTask(run, p, k, s[k], overridesAt(p), varied));
                }
            }
        }
        return tasks;
    }

    /** This plan as shard {@code index} of {@code count}. */
    public SweepPlan withShard(int index, int count) {
        return new SweepPlan(format, scenario, scenarioSha256, set, axes, samples, sample, seed, untilGyr,
                keepSnapshots, index, count);
    }

    /**
     * How this sweep differs from another, ignoring the shard and the scenario's file name.
     *
     * @return the first differing field in words, or null if both describe the same sweep
     */
    public String differenceFrom(SweepPlan o) {
        if (format != o.format) {
            return "layout version " + o.format + " vs " + format;
        }
        if (!scenarioSha256.equals(o.scenarioSha256)) {
            return "the scenario's content (SHA-256 " + shortHash(o.scenarioSha256) + " vs " + shortHash(scenarioSha256) + ")";
        }
        if (!set.equals(o.set)) {
            return "--set " + o.set + " vs " + set;
        }
        if (!axes.equals(o.axes)) {
            return "--vary " + describe(o.axes) + " vs " + describe(axes);
        }
        if (samples != o.samples || sample != o.sample) {
            return "--samples " + o.samples + " vs " + samples;
        }
        if (seed != o.seed) {
            return "--seed " + o.seed + " vs " + seed;
        }
        if (!Objects.equals(untilGyr, o.untilGyr)) {
            return "--until " + o.untilGyr + " vs " + untilGyr;
        }
        if (keepSnapshots != o.keepSnapshots) {
            return "--keep-snapshots";
        }
        return null;
    }

    private static String shortHash(String h) {
        return h.length() > 12 ? h.substring(0, 12) : h;
    }

    private static String describe(List<Axis> axes) {
        List<String> parts = new ArrayList<>();
        for (Axis a : axes) {
            parts.add(a.key() + "(" + a.size() + " values)");
        }
        return String.join(" ", parts);
    }
}
