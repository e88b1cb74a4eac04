package org.holdfast.film;

import java.io.PrintWriter;
import java.util.Locale;

import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * How far a render has come: a progress bar on a terminal, a plain line every few seconds when
 * the output is a file or a pipe (a bar's redraws would litter a log), nothing when quiet.
 */
final class FrameProgress implements AutoCloseable {

    private static final long PLAIN_INTERVAL_NANOS = 5_000_000_000L;

    private final PrintWriter out;
    private final int total;
    private final ProgressBar bar;
    private final long startNanos = System.nanoTime();
    private long lastPlain = startNanos;
    private int done;
    private int drawn;

    FrameProgress(PrintWriter out, int total, boolean terminal, boolean quiet) {
        this.out = quiet ? null : out;
        this.total = total;
        this.bar = quiet || !terminal ? null : new ProgressBarBuilder().setTaskName("render").setInitialMax(total)
                .setUnit(" frames", 1).setStyle(ProgressBarStyle.COLORFUL_UNICODE_BLOCK)
                .setUpdateIntervalMillis(250).setMaxRenderedLength(100).build();
    }

    /** Whether standard output is an interactive terminal. */
    static boolean onTerminal() {
        return System.console() != null && System.getenv("CI") == null;
    }

    /** One more frame finished; {@code drew} is false when it was already complete. */
    void frameDone(boolean drew) {
        done++;
        if (drew) {
            drawn++;
        }
        if (bar != null) {
            bar.stepTo(done);
            return;
        }
        long now = System.nanoTime();
        if (out != null && (now - lastPlain >= PLAIN_INTERVAL_NANOS)) {
            lastPlain = now;
            double s = (now - startNanos) * 1e-9;
            double perFrame = drawn > 0 ? s / drawn : Double.NaN;
            out.printf(Locale.ROOT, "  frame %d of %d  %5.1f%%  %.2f s per frame%n", done, total, 100.0 * done / total,
                    perFrame);
            out.flush();
        }
    }

    /** Frames drawn (not skipped) so far. */
    int drawn() {
        return drawn;
    }

    double seconds() {
        return (System.nanoTime() - startNanos) * 1e-9;
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
