package org.holdfast.replay;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.holdfast.console.RunProgress;
import org.holdfast.console.Version;
import org.holdfast.fates.FateRun;
import org.holdfast.output.RunWriter;
import org.holdfast.run.RunObserver;
import org.holdfast.run.Simulation;
import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;

/**
 * A scenario evolved into a temporary run folder, as by {@code holdfast evolve}, so that it can be
 * replayed like any run; the folder is removed on {@link #close()}. Evolving first (rather than
 * stepping as frames are drawn) keeps every frame a pure function of its time: frames can be
 * drawn in any order, skipped on a restart and scrubbed back and forth in the window.
 */
public final class TemporaryRun implements AutoCloseable {

    private final Path dir;
    private final Thread onExit;

    private TemporaryRun(Path dir, Thread onExit) {
        this.dir = dir;
        this.onExit = onExit;
    }

    /**
     * Evolves {@code scenario} with the given {@code --set} overrides, as {@code holdfast evolve}
     * would, into a temporary folder. A program told to quit (Ctrl+C, SIGTERM) while the
     * folder exists stops the run and removes the folder on its way out.
     *
     * @param progress where the evolve's progress and a closing line go, or null for none
     * @throws ScenarioException naming the file, line and key when the scenario is bad
     */
    public static TemporaryRun evolve(Path scenario, List<String> sets, PrintWriter progress) {
        Scenario s = ScenarioReader.read(scenario, Overrides.parse(sets), UncertainNumbers.central(), Double.NaN);
        Simulation sim = FateRun.build(s, 0);
        Path parent;
        try {
            parent = Files.createTempDirectory("holdfast-run-");
        } catch (IOException e) {
            sim.close();
            throw new UncheckedIOException("cannot make a temporary run folder", e);
        }
        Path dir = parent.resolve("run");
        CountDownLatch stopped = new CountDownLatch(1);
        Thread onExit = new Thread(() -> {
            sim.cancel();
            try {
                stopped.await(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            delete(parent);
        }, "holdfast-temporary-run-exit");
        Runtime.getRuntime().addShutdownHook(onExit);
        try {
            List<RunObserver> watchers = progress == null ? List.of()
                    : List.of(new RunProgress(progress, RunProgress.onTerminal(), s.run().startGyr(),
                    RunProgress.plannedEndGyr(s)));
            FateRun.Outcome r = new RunWriter(s, dir, Version.number()).run(sim, watchers);
            if (progress != null) {
                progress.printf(Locale.ROOT, "evolved to %.4g Gyr in %.1f s: %s%n", r.result().endGyr(),
                        r.result().wallSeconds(), r.result().reason().message());
                progress.flush();
            }
        } catch (RuntimeException e) {
            stopped.countDown();
            removeHook(onExit);
            delete(parent);
            throw e;
        } finally {
            stopped.countDown();
            sim.close();
        }
        return new TemporaryRun(dir, onExit);
    }

    /** The run folder. */
    public Path dir() {
        return dir;
    }

    @Override
    public void close() {
        removeHook(onExit);
        delete(dir.getParent());
    }

    private static void removeHook(Thread hook) {
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // shutting down already: the hook removes the folder
        }
    }

    /** Removes a folder and everything in it; a folder that will not go is left behind. */
    static void delete(Path root) {
        if (root == null || !Files.exists(root)) {
            return;
        }
        try (Stream<Path> s = Files.walk(root)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }
}
