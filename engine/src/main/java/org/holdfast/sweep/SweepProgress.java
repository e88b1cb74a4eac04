package org.holdfast.sweep;

import java.io.PrintWriter;
import java.time.Duration;
import java.util.Locale;

import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Shows a sweep's progress: on a terminal a bar with runs done of the total, runs per second
 * and the time left; otherwise (a file, a pipe, a batch job's log) one plain line every
 * {@code intervalS} seconds and one at the end.
 */
public final class SweepProgress implements Sweep.Listener {

    private final PrintWriter out;
    private final boolean terminal;
    private final long intervalNanos;
    private ProgressBar bar;
    private long total;
    private long done;
    private long madeHere;
    private long startNanos;
    private long lastLine;
    private boolean saving = true;

    /**
     * @param terminal draw a bar (true only for an interactive terminal)
     * @param intervalS seconds between plain lines
     */
    public SweepProgress(PrintWriter out, boolean terminal, double intervalS) {
        this.out = out;
        this.terminal = terminal;
        this.intervalNanos = (long) (intervalS * 1e9);
    }

    @Override
    public void start(long runsInShard, long alreadyDone) {
        total = runsInShard;
        done = alreadyDone;
        startNanos = System.nanoTime();
        lastLine = startNanos;
        if (alreadyDone > 0) {
            out.printf(Locale.ROOT, "resuming: %d of %d runs already done%n", alreadyDone, runsInShard);
            out.flush();
        }
        if (terminal && done < total) {
            bar = new ProgressBarBuilder().setTaskName("sweep").setInitialMax(total).setUnit(" runs", 1)
                    .showSpeed().setStyle(ProgressBarStyle.COLORFUL_UNICODE_BLOCK).setUpdateIntervalMillis(250)
                    .setMaxRenderedLength(100).startsFrom(done, Duration.ZERO).build();
        }
    }

    @Override
    public void runDone(RunRecord record) {
        done++;
        madeHere++;
        if (bar != null) {
            bar.stepTo(done);
            return;
        }
        long now = System.nanoTime();
        if (now - lastLine >= intervalNanos) {
            lastLine = now;
            line(now);
        }
    }

    @Override
    public boolean saving() {
        return saving;
    }

    /**
     * Stops saving runs (the sweep is being stopped) and says what was kept.
     *
     * @return "stopped: 18 of 70 runs saved; run the same command to go on"
     */
    public synchronized String stop() {
        saving = false;
        if (bar != null) {
            bar.close();
            bar = null;
        }
        return String.format(Locale.ROOT, "stopped: %d of %d runs saved; run the same command to go on", done, total);
    }

    /** Whether every run of the shard is saved. */
    public synchronized boolean complete() {
        return done >= total;
    }

    @Override
    public void finish() {
        if (bar != null) {
            bar.close();
            bar = null;
        } else if (madeHere > 0) {
            line(System.nanoTime());
        }
    }

    private void line(long now) {
        double s = (now - startNanos) * 1e-9;
        double rate = s > 0 ? madeHere / s : Double.NaN;
        double eta = rate > 0 ? (total - done) / rate : Double.NaN;
        out.printf(Locale.ROOT, "  %d/%d runs  %.3g runs/s  eta %s%n", done, total, rate, formatEta(eta));
        out.flush();
    }

    static String formatEta(double seconds) {
        if (!Double.isFinite(seconds)) {
            return "?";
        }
        Duration d = Duration.ofSeconds(Math.round(seconds));
        return String.format(Locale.ROOT, "%d:%02d:%02d", d.toHours(), d.toMinutesPart(), d.toSecondsPart());
    }
}
