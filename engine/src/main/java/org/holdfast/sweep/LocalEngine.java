package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;

/**
 * Runs on a fixed pool of worker threads of this JVM. Results are handed to the sink in the
 * order they finish; at most {@code 2 * workers} runs are in flight, so a killed sweep loses
 * only those.
 */
public final class LocalEngine implements SweepEngine {

    private final int workers;

    /** An engine with the given number of worker threads (at least 1). */
    public LocalEngine(int workers) {
        if (workers < 1) {
            throw new IllegalArgumentException("workers must be >= 1, got " + workers);
        }
        this.workers = workers;
    }

    @Override
    public void run(Path scenario, RunSpec spec, List<RunTask> tasks, Consumer<RunRecord> sink) throws Exception {
        if (tasks.isEmpty()) {
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(workers, daemonThreads());
        try {
            CompletionService<RunRecord> done = new ExecutorCompletionService<>(pool);
            int window = 2 * workers;
            int submitted = 0;
            int finished = 0;
            while (finished < tasks.size()) {
                while (submitted < tasks.size() && submitted - finished < window) {
                    RunTask t = tasks.get(submitted++);
                    done.submit(() -> spec.execute(scenario, t));
                }
                try {
                    sink.accept(done.take().get());
                } catch (ExecutionException e) {
                    throw unwrap(e);
                }
                finished++;
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static Exception unwrap(ExecutionException e) {
        Throwable c = e.getCause();
        if (c instanceof Exception ex) {
            return ex;
        }
        if (c instanceof Error err) {
            throw err;
        }
        return e;
    }

    private static ThreadFactory daemonThreads() {
        AtomicInteger n = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, "sweep-worker-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }
}
