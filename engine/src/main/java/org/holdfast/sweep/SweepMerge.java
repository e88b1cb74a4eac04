package org.holdfast.sweep;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.SerializationFeature;

import org.holdfast.output.RunFolder;
import org.holdfast.schema.ScenarioException;

/**
 * Combines the folders of the shards of one sweep into one folder that looks as if the sweep
 * had been made unsharded: the same {@code sweep.json} (as shard 1/1), journal, results,
 * fractions and pictures. Refuses shards of different sweeps, a missing or repeated shard, and a
 * shard that has not finished. A merge stopped part-way (kill -9 included) is finished by the
 * same command: the output folder then names this merge, and everything is written again.
 */
public final class SweepMerge {

    private SweepMerge() {
    }

    /**
     * @return the files written
     * @throws ScenarioException naming the folder at fault
     */
    public static List<Path> merge(List<Path> dirs, Path out) throws IOException {
        if (dirs.isEmpty()) {
            throw new ScenarioException("sweep-merge", null, "give at least one shard folder");
        }
        TreeMap<Integer, Path> byShard = new TreeMap<>();
        SweepPlan first = null;
        Path firstDir = null;
        List<RunRecord> all = new ArrayList<>();
        for (Path d : dirs) {
            SweepPlan p = Sweep.readPlan(d);
            if (first == null) {
                first = p;
                firstDir = d;
            } else {
                SweepPlan.Difference diff = first.differenceFrom(p);
                if (diff == null && p.shardCount() != first.shardCount()) {
                    diff = new SweepPlan.Difference("--shard I/" + p.shardCount(), "--shard I/" + first.shardCount());
                }
                if (diff != null) {
                    throw new ScenarioException(d.toString(), null, "belongs to a different sweep than " + firstDir
                            + ": it was made with " + diff.other() + ", " + firstDir + " with " + diff.mine());
                }
            }
            Path earlier = byShard.put(p.shardIndex(), d);
            if (earlier != null) {
                throw new ScenarioException(d.toString(), null, "is shard " + p.shardIndex() + "/" + p.shardCount()
                        + " again (also " + earlier + ")");
            }
            List<RunRecord> records = Journal.read(d);
            Sweep.checkJournal(d, p, p.pendingTasks(new BitSet()), records);
            if (records.size() != p.runsInShard()) {
                throw new ScenarioException(d.toString(), null, "shard " + p.shardIndex() + "/" + p.shardCount()
                        + " is not finished: " + records.size() + " of " + p.runsInShard()
                        + " runs (run its sweep command again to finish it)");
            }
            all.addAll(records);
        }
        List<Integer> missing = new ArrayList<>();
        for (int i = 1; i <= first.shardCount(); i++) {
            if (!byShard.containsKey(i)) {
                missing.add(i);
            }
        }
        if (!missing.isEmpty()) {
            throw new ScenarioException("sweep-merge", null, "missing shard(s) " + missing + " of " + first.shardCount());
        }
        SweepPlan whole = first.withShard(1, 1);
        checkOut(out, whole);
        RunFolder.makeFolder(out, "--out");
        ResultsTable.sorted(all);
        // The plan first: a merge killed at any later moment leaves a folder that names this
        // sweep, which the same command then accepts and writes again from the start (every
        // file is written whole, to a temporary name and renamed).
        Outputs.writeAtomically(out.resolve(Sweep.PLAN_FILE),
                Journal.JSON.copy().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsBytes(whole));
        Journal.writeAll(out, all);
        List<Path> written = new ArrayList<>(List.of(out.resolve(Sweep.PLAN_FILE), out.resolve(Journal.FILE)));
        written.addAll(Sweep.writeTables(out, whole, all));
        return written;
    }

    /**
     * The output folder must be new, empty (but for temporary files a killed merge leaves), or
     * hold this very merge (a merge stopped part-way, or done already: it is written again).
     */
    private static void checkOut(Path out, SweepPlan whole) throws IOException {
        if (!Files.isDirectory(out)) {
            return;
        }
        if (Files.exists(out.resolve(Sweep.PLAN_FILE))) {
            SweepPlan there;
            try {
                there = Sweep.readPlan(out);
            } catch (ScenarioException e) {
                throw new ScenarioException("--out", out.toString(), "holds a damaged sweep plan; choose an empty folder");
            }
            SweepPlan.Difference diff = whole.differenceFrom(there);
            if (diff != null || there.shardCount() != 1) {
                throw new ScenarioException("--out", out.toString(), "already holds a different sweep ("
                        + (diff != null ? "made with " + diff.other() : "shard " + there.shardIndex() + "/"
                                + there.shardCount()) + "); choose an empty folder");
            }
            return;
        }
        try (var entries = Files.list(out)) {
            if (entries.map(p -> p.getFileName().toString())
                    .anyMatch(n -> !n.startsWith(".") && !n.endsWith(".tmp") && !n.endsWith(".part"))) {
                throw new ScenarioException("--out", out.toString(), "is not empty and holds no sweep; choose an empty folder");
            }
        }
    }
}
