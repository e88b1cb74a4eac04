package org.holdfast.console;

import java.io.PrintWriter;
import java.time.Duration;
import java.util.Locale;

import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;

import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Shows how far a run has come: a progress bar on a terminal (simulated time, steps, rate, ETA),
 * plain lines every few seconds when the output is a file or a pipe, nothing when quiet.
 */
public final class RunProgress implements RunObserver {

    private static final long PLAIN_INTERVAL_NANOS = 5_000_000_000L;

    private final PrintWriter out;
    private final boolean terminal;
    private final double startGyr;
    private final double spanMyr;
    private ProgressBar bar;
    private long startNanos;
    private long lastPlain;

    /**
     * @param terminal draw a bar (true) or print plain lines (false); see {@link #onTerminal()}
     */
    public RunProgress(PrintWriter out, boolean terminal, double startGyr, double untilGyr) {
        this.out = out;
        this.terminal = terminal;
        this.startGyr = startGyr;
        this.spanMyr = Math.abs(untilGyr - startGyr) * 1e3;
    }

    /**
     * Where a scenario's run will end unless stopped: run.until_gyr, or the end of its expansion
     * history when a big rip or crunch (or the Big Bang, backward) comes first, so that the
     * estimate of a run that stops before a rip counts toward the rip, not toward until_gyr.
     */
    public static double plannedEndGyr(org.holdfast.scenario.Scenario s) {
        double until = s.run().untilGyr();
        return Math.max(s.expansion().earliestGyr(), Math.min(s.expansion().latestGyr(), until));
    }

    /** Whether standard output is an interactive terminal. */
    public static boolean onTerminal() {
        return System.console() != null && System.getenv("CI") == null;
    }

    @Override
    public void init(RunView run) {
        startNanos = System.nanoTime();
        lastPlain = startNanos;
        if (terminal) {
            bar = new ProgressBarBuilder()
                    .setTaskName("evolve")
                    .setInitialMax(Math.max(1, Math.round(spanMyr)))
                    .setUnit(" Myr", 1)
                    .setStyle(ProgressBarStyle.COLORFUL_UNICODE_BLOCK)
                    .setUpdateIntervalMillis(250)
                    .setMaxRenderedLength(100)
                    .build();
        }
    }

    @Override
    public void afterStep(RunView run) {
        double doneMyr = Math.abs(run.tGyr() - startGyr) * 1e3;
        if (bar != null) {
            bar.stepTo(Math.round(doneMyr));
            bar.setExtraMessage(String.format(Locale.ROOT, "t=%.2f Gyr, %d steps", run.tGyr(), run.steps()));
            return;
        }
        long now = System.nanoTime();
        if (now - lastPlain >= PLAIN_INTERVAL_NANOS) {
            lastPlain = now;
            double seconds = (now - startNanos) * 1e-9;
            double rate = doneMyr / 1e3 / seconds;
            double eta = rate > 0 ? (spanMyr - doneMyr) / 1e3 / rate : Double.NaN;
            out.printf(Locale.ROOT, "  t = %8.3f Gyr  %5.1f%%  %,d steps  %.3g Gyr/s  eta %s%n",
                    run.tGyr(), 100 * doneMyr / spanMyr, run.steps(), rate, formatEta(eta));
            out.flush();
        }
    }

    @Override
    public void finish(RunView run, StopReason reason) {
        if (bar != null) {
            bar.close();
            bar = null;
        }
    }

    private static String formatEta(double seconds) {
        if (!Double.isFinite(seconds)) {
            return "?";
        }
        Duration d = Duration.ofSeconds(Math.round(seconds));
        return String.format(Locale.ROOT, "%d:%02d:%02d", d.toHours(), d.toMinutesPart(), d.toSecondsPart());
    }
}
