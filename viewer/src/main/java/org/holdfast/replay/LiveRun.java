package org.holdfast.replay;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.holdfast.console.Version;
import org.holdfast.fates.FateRun;
import org.holdfast.fates.FateTracker;
import org.holdfast.output.RunFolder;
import org.holdfast.output.RunWriter;
import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.Simulation;
import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;

/**
 * A scenario evolving on a background thread while it is shown. The run writes an ordinary run
 * folder, exactly as {@code holdfast evolve} would (a temporary one, removed on {@link #close()},
 * unless the caller names a folder to keep); a {@link RunArchive} opened on it and refreshed
 * between frames sees each snapshot once it is complete, so everything already evolved can be
 * replayed both ways while the run goes on.
 *
 * <p>With each snapshot the run publishes the fate events as its fate tracker sees them then:
 * mergers as they happen, escapes and rips as they stand (a member that rejoins its group
 * loses its escape again); the summary at the end has the final word. Closing a live run that
 * is still going (or quitting the JVM, as with Ctrl+C) cancels it at its next step; a kept folder
 * then holds a complete run up to that time, with "cancelled" as its stop reason.
 */
public final class LiveRun implements AutoCloseable {

    private final Path dir;
    private final boolean temporary;
    private final double startGyr;
    /** Where the run will end unless stopped sooner: run.until_gyr, or short of it before a rip. */
    private final double endGyr;
    /** The topmost folder this run created for a kept run (removed by {@link #discard}), or null. */
    private final Path created;
    private final Simulation simulation;
    private final FateTracker fates;
    private final Thread thread;
    /** Stops the run and tidies up if the JVM is told to quit (Ctrl+C) before {@link #close()}. */
    private final Thread onExit;
    private final Object progress = new Object();
    private volatile int snapshots;
    private volatile double reachedGyr;
    private volatile List<FateEvent> eventsSoFar = List.of();
    private volatile boolean finished;
    private volatile String stopMessage;
    private volatile double stoppedGyr = Double.NaN;
    private volatile String failure;

    private LiveRun(Scenario scenario, Path dir, boolean temporary, Simulation simulation, Path created) {
        this.dir = dir;
        this.temporary = temporary;
        this.created = created;
        this.startGyr = scenario.run().startGyr();
        this.endGyr = simulation.plannedEndGyr();
        this.reachedGyr = startGyr;
        this.simulation = simulation;
        this.fates = FateRun.tracker(scenario);
        RunWriter writer = new RunWriter(scenario, dir, Version.number());
        this.thread = new Thread(() -> evolve(writer), "holdfast-live-run");
        thread.setDaemon(true);
        this.onExit = new Thread(this::stop, "holdfast-live-run-exit");
    }

    /**
     * Reads and checks the scenario, then starts evolving it and returns once the first
     * snapshot is written.
     *
     * @param sets {@code --set KEY=VALUE} overrides
     * @param keep run folder to write and keep (checked as {@code evolve --out} checks it), or
     *        null for a temporary one
     * @throws ScenarioException for bad input (file, line and key named), before anything runs
     */
    public static LiveRun start(Path scenarioFile, List<String> sets, Path keep) {
        Scenario s = ScenarioReader.read(scenarioFile, Overrides.parse(sets), UncertainNumbers.central(), Double.NaN);
        Path dir = keep != null ? RunFolder.choose(keep, scenarioFile) : temporaryFolder();
        Simulation sim = FateRun.build(s, 0);
        LiveRun live;
        try {
            live = new LiveRun(s, dir, keep == null, sim, keep == null ? null : firstMissing(keep));
        } catch (RuntimeException e) {
            sim.close();
            if (keep == null) {
                TemporaryRun.delete(dir.getParent());
            }
            throw e;
        }
        Runtime.getRuntime().addShutdownHook(live.onExit);
        live.thread.start();
        live.awaitSnapshots(1);
        if (live.failure != null && live.snapshots == 0) {
            String why = live.failure;
            live.discard();
            throw new ScenarioException(scenarioFile.toString(), null, why);
        }
        return live;
    }

    /** The topmost of {@code dir} and its parents that does not exist yet, or null when dir exists. */
    private static Path firstMissing(Path dir) {
        Path p = dir.toAbsolutePath().normalize();
        if (Files.exists(p)) {
            return null;
        }
        while (p.getParent() != null && !Files.exists(p.getParent())) {
            p = p.getParent();
        }
        return p;
    }

    private static Path temporaryFolder() {
        try {
            return Files.createTempDirectory("holdfast-live-").resolve("run");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot make a temporary run folder", e);
        }
    }

    private void evolve(RunWriter writer) {
        try {
            FateRun.Outcome r = writer.run(simulation, fates, List.of(new Feed()));
            stopMessage = r.result().reason().message();
            stoppedGyr = r.result().endGyr();
        } catch (RuntimeException e) {
            failure = e.getMessage() == null ? e.toString() : e.getMessage();
        } finally {
            simulation.close();
            finished = true;
            synchronized (progress) {
                progress.notifyAll();
            }
        }
    }

    /** Publishes each snapshot once the folder's writers have written it. */
    private final class Feed implements RunObserver {
        @Override
        public void atSnapshot(RunView run) {
            List<FateEvent> found = new ArrayList<>();
            for (RunEvent e : fates.events(run)) {
                FateEvent f = RunArchive.event(e.kind(), e.tGyr(), e.members());
                if (f != null) {
                    found.add(f);
                }
            }
            eventsSoFar = List.copyOf(found);
            reachedGyr = run.tGyr();
            synchronized (progress) {
                snapshots++;
                progress.notifyAll();
            }
        }
    }

    /** The run folder being written. */
    public Path dir() {
        return dir;
    }

    /** Whether the folder is removed on close. */
    public boolean temporary() {
        return temporary;
    }

    /** Where the run starts, Gyr. */
    public double startGyr() {
        return startGyr;
    }

    /**
     * Where the run will end, Gyr, known before it starts: run.until_gyr, or just short of the
     * end of the expansion history when that comes first (a big rip). It stops sooner only on
     * a bad number or when cancelled.
     */
    public double plannedEndGyr() {
        return endGyr;
    }

    /** Snapshots written so far. */
    public int snapshotsWritten() {
        return snapshots;
    }

    /** Time of the latest snapshot written, Gyr. */
    public double reachedGyr() {
        return reachedGyr;
    }

    /** Fate events as they stood at the latest snapshot, oldest first. */
    public List<FateEvent> eventsSoFar() {
        return eventsSoFar;
    }

    /** Whether the run has ended (summary written) or failed. */
    public boolean finished() {
        return finished;
    }

    /** Why the run failed, or null. */
    public String failure() {
        return failure;
    }

    /** One line on where the run stands. */
    public String status() {
        if (failure != null) {
            return "the run failed: " + failure;
        }
        if (finished) {
            // a cancelled run stops between snapshots: say up to where it can be shown
            return stoppedGyr == reachedGyr ? "run ended: " + stopMessage
                    : String.format(Locale.ROOT, "run ended: %s; snapshots up to %.4g Gyr", stopMessage, reachedGyr);
        }
        return String.format(Locale.ROOT, "evolving: %.4g of %.4g Gyr", reachedGyr, endGyr);
    }

    /** Waits until at least {@code count} snapshots are written or the run has ended. */
    public void awaitSnapshots(int count) {
        synchronized (progress) {
            while (snapshots < count && !finished) {
                try {
                    progress.wait(200);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    /** Waits until the run has passed {@code tGyr} (in its own direction) or has ended. */
    public void awaitGyr(double tGyr) {
        double dir = Math.signum(endGyr - startGyr);
        synchronized (progress) {
            while ((tGyr - reachedGyr) * dir > 0 && !finished) {
                try {
                    progress.wait(200);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    /** Cancels a run still going, waits for it to write its last files, removes a temporary folder. */
    @Override
    public void close() {
        try {
            Runtime.getRuntime().removeShutdownHook(onExit);
        } catch (IllegalStateException e) {
            // the JVM is already shutting down, and the hook is doing this
        }
        stop();
    }

    /**
     * Closes the run and removes what it wrote into a kept folder: the folder itself (and any
     * parents) when this run created it, else its contents. For a command that ends in bad
     * input after the run started, so that it leaves nothing behind.
     */
    public void discard() {
        close();
        if (temporary) {
            return;
        }
        if (created != null) {
            TemporaryRun.delete(created);
        } else {
            try (var s = Files.list(dir)) {
                s.forEach(TemporaryRun::delete);
            } catch (IOException e) {
                // the folder is gone or unreadable: nothing left to remove
            }
        }
    }

    private void stop() {
        simulation.cancel();
        try {
            thread.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        if (temporary) {
            TemporaryRun.delete(dir.getParent());
        }
    }
}
