package org.holdfast.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.SerializationFeature;

import org.holdfast.output.RunFolder;
import org.holdfast.schema.ScenarioException;

/**
 * Makes a sweep in a folder, or finishes one that was stopped: checks that the folder holds
 * this sweep (or nothing yet), makes the runs its journal lacks, then writes the tables and
 * pictures from the journal.
 *
 * <p>A folder holds {@code sweep.json} (the {@link SweepPlan}), {@code runs.jsonl} (the
 * {@link Journal}) and, once every run of the shard is in, {@code results.csv}; an unsharded
 * sweep (or a merge) adds {@code fractions.csv} and a picture.
 */
public final class Sweep {

    /** The plan's file name inside a sweep folder. */
    public static final String PLAN_FILE = "sweep.json";

    /** What a call did. */
    public record Summary(long runsInShard, long alreadyDone, long made, List<Path> written) {
    }

    /** Told about progress; all methods are called from one thread. */
    public interface Listener {
        /** Before the first run: how many the shard has and how many were already done. */
        default void start(long runsInShard, long alreadyDone) {
        }

        /** After each run. */
        default void runDone(RunRecord record) {
        }

        /** After the last run, before the tables are written. */
        default void finish() {
        }

        /**
         * Whether runs that finish from now on are still saved; false once the sweep is being
         * stopped, so that a count of saved runs given then stays true. Asked, and the run
         * saved, while holding this listener's lock.
         */
        default boolean saving() {
            return true;
        }
    }

    private Sweep() {
    }

    /**
     * Makes (or finishes) the sweep.
     *
     * @throws ScenarioException if the folder holds a different sweep, or a run reports bad input
     * @throws Exception the first failure of a run; finished runs stay in the journal
     */
    public static Summary run(SweepPlan plan, Path scenario, Path dir, RunSpec spec, SweepEngine engine,
            Listener listener) throws Exception {
        boolean fresh = !Files.exists(dir.resolve(PLAN_FILE));
        Path created = RunFolder.makeFolder(dir, "--out");
        try {
            claim(dir, plan);
        } catch (ScenarioException e) {
            RunFolder.removeCreated(dir, created);
            throw e;
        }
        List<RunRecord> all;
        long already;
        long made;
        try (Journal journal = Journal.open(dir)) {
            List<RunTask> shardTasks = plan.pendingTasks(new BitSet());
            checkJournal(dir, plan, shardTasks, journal.existing());
            BitSet done = journal.done();
            List<RunTask> pending = new ArrayList<>();
            for (RunTask t : shardTasks) {
                if (!done.get((int) t.run())) {
                    pending.add(t);
                }
            }
            already = journal.existing().size();
            all = new ArrayList<>(journal.existing());
            listener.start(shardTasks.size(), already);
            try {
                engine.run(scenario, spec, pending, r -> {
                    synchronized (listener) {
                        if (!listener.saving()) {
                            return;
                        }
                        journal.append(r);
                        all.add(r);
                        listener.runDone(r);
                    }
                });
            } catch (ScenarioException e) {
                if (fresh) {
                    // Bad input found by a run of a new sweep: leave no trace (the runs made so far
                    // belong to a plan that cannot finish), so the corrected command starts clean.
                    journal.close();
                    removeNewSweep(dir, created);
                }
                throw e;
            }
            made = pending.size();
        }
        listener.finish();
        List<Path> written = writeTables(dir, plan, ResultsTable.sorted(all));
        return new Summary(plan.runsInShard(), already, made, written);
    }

    /** Removes what a new sweep wrote into its folder, and the folder itself if this sweep made it. */
    private static void removeNewSweep(Path dir, Path created) throws IOException {
        deleteTree(dir.resolve("snapshots"));
        Files.deleteIfExists(dir.resolve(Journal.FILE));
        Files.deleteIfExists(dir.resolve(PLAN_FILE));
        RunFolder.removeCreated(dir, created);
    }

    private static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (var walk = Files.walk(p)) {
            for (Path q : walk.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(q);
            }
        }
    }

    /** Writes results.csv and, when the plan covers the whole sweep, fractions.csv and the picture. */
    static List<Path> writeTables(Path dir, SweepPlan plan, List<RunRecord> sorted) throws IOException {
        List<Path> written = new ArrayList<>();
        Path results = dir.resolve(ResultsTable.FILE);
        Outputs.writeAtomically(results, ResultsTable.csv(plan, sorted).getBytes(StandardCharsets.UTF_8));
        written.add(results);
        if (plan.shardCount() == 1 && !sorted.isEmpty()) {
            List<Fractions.Row> rows = Fractions.rows(plan, sorted);
            Path fractions = dir.resolve(Fractions.FILE);
            Outputs.writeAtomically(fractions, Fractions.csv(plan, rows).getBytes(StandardCharsets.UTF_8));
            written.add(fractions);
            written.addAll(SweepPlots.draw(plan, rows, sorted, dir));
        }
        return written;
    }

    /** Writes the plan into an empty folder, or checks that the folder's plan is this one. */
    static void claim(Path dir, SweepPlan plan) throws IOException {
        Path file = dir.resolve(PLAN_FILE);
        if (Files.exists(file)) {
            SweepPlan there = readPlan(dir);
            SweepPlan.Difference diff = plan.differenceFrom(there);
            if (diff == null && (there.shardIndex() != plan.shardIndex() || there.shardCount() != plan.shardCount())) {
                diff = new SweepPlan.Difference(shard(there), shard(plan));
            }
            if (diff != null) {
                throw new ScenarioException("--out", dir.toString(), "holds a different sweep: the folder was made with "
                        + diff.other() + ", this command asks for " + diff.mine() + "; choose another folder");
            }
            if (!there.pairs().equals(plan.pairs()) || !java.util.Objects.equals(there.outcome(), plan.outcome())) {
                // the same runs, other tables: remember what this command asked to be shown
                writePlan(file, plan);
            }
            return;
        }
        try (var entries = Files.list(dir)) {
            // A temporary file is what a sweep killed while claiming the folder leaves behind.
            if (entries.map(p -> p.getFileName().toString()).anyMatch(n -> !n.startsWith(".") && !n.endsWith(".tmp"))) {
                throw new ScenarioException("--out", dir.toString(), "is not empty and holds no sweep; choose another folder");
            }
        }
        writePlan(file, plan);
    }

    static void writePlan(Path file, SweepPlan plan) throws IOException {
        byte[] json = Journal.JSON.copy().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsBytes(plan);
        Outputs.writeAtomically(file, json);
    }

    private static String shard(SweepPlan p) {
        return p.shardCount() == 1 ? "no --shard" : "--shard " + p.shardIndex() + "/" + p.shardCount();
    }

    /** Reads a folder's plan. */
    public static SweepPlan readPlan(Path dir) throws IOException {
        Path file = dir.resolve(PLAN_FILE);
        if (!Files.isRegularFile(file)) {
            throw new ScenarioException(dir.toString(), null, "not a sweep folder (no " + PLAN_FILE + ")");
        }
        try {
            return Journal.JSON.readValue(file.toFile(), SweepPlan.class);
        } catch (IOException e) {
            throw new ScenarioException(file.toString(), null, "not a sweep plan: " + e.getMessage().lines().findFirst().orElse(""));
        }
    }

    /** Every journal record must be a run of this shard, with the seed the plan gives it, once. */
    static void checkJournal(Path dir, SweepPlan plan, List<RunTask> shardTasks, List<RunRecord> records) {
        Map<Long, RunTask> byRun = new HashMap<>();
        for (RunTask t : shardTasks) {
            byRun.put(t.run(), t);
        }
        BitSet seen = new BitSet();
        for (RunRecord r : records) {
            RunTask t = byRun.get(r.run());
            String where = dir.resolve(Journal.FILE).toString();
            if (t == null || t.point() != r.point() || t.sample() != r.sample() || t.seed() != r.seed()) {
                throw new ScenarioException(where, "run " + r.run(), "is not a run of this sweep");
            }
            if (seen.get((int) r.run())) {
                throw new ScenarioException(where, "run " + r.run(), "is recorded twice");
            }
            seen.set((int) r.run());
        }
    }
}
