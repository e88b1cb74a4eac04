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
import org.holdfast.scenario.ScenarioException;

/**
 * Combines the folders of the shards of one sweep into one folder that looks as if the sweep
 * had been made unsharded: the same {@code sweep.json} (as shard 1/1), journal, results,
 * fractions and picture. Refuses shards of different sweeps, a missing or repeated shard, and a
 * shard that has not finished.
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
        if (Files.exists(out.resolve(Sweep.PLAN_FILE)) || Files.exists(out.resolve(Journal.FILE))) {
            throw new ScenarioException("--out", out.toString(), "already holds a sweep; choose an empty folder");
        }
        RunFolder.makeFolder(out, "--out");
        ResultsTable.sorted(all);
        Journal.writeAll(out, all);
        Outputs.writeAtomically(out.resolve(Sweep.PLAN_FILE),
                Journal.JSON.copy().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsBytes(whole));
        List<Path> written = new ArrayList<>(List.of(out.resolve(Sweep.PLAN_FILE), out.resolve(Journal.FILE)));
        written.addAll(Sweep.writeTables(out, whole, all));
        return written;
    }
}
