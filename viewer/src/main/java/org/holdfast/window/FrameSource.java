package org.holdfast.window;

import java.util.List;

/**
 * Draws one frame for a view (camera, clock, layers) into an ARGB buffer, and says what the clock
 * may range over. The CPU renderer implements this; the window only shows what it drew.
 *
 * <p>Pixels are {@code int} ARGB in the layout of {@code BufferedImage.TYPE_INT_ARGB}, indexed
 * {@code x + y * width} with row 0 at the top.
 */
public interface FrameSource extends AutoCloseable {

    /** Draws the frame for {@code view} into {@code argb} (length at least width * height). */
    void draw(ViewState view, int width, int height, int[] argb);

    /** Earliest time the clock may show, in Gyr. */
    double startGyr();

    /** Latest time the clock may show, in Gyr (greater than {@link #startGyr()}). */
    double endGyr();

    /** Times of fate events (mergers, escapes, rips) in Gyr, ascending; for "next event". */
    double[] eventTimesGyr();

    /** Names of the members the camera can be centred on, in a fixed order; may be empty. */
    default List<String> memberNames() {
        return List.of();
    }

    /**
     * Writes the centre of member {@code index} at {@code tGyr} into {@code xyzKpc}.
     *
     * @return false if the member has no position then (merged away, not yet known)
     */
    default boolean memberCentreKpc(int index, double tGyr, double[] xyzKpc) {
        return false;
    }

    /** A camera distance that shows the whole group, in kpc. */
    default double overviewDistanceKpc() {
        return 2000.0;
    }

    /**
     * Whether the span is still growing: a scenario evolving as it plays. The clock waits at
     * the growing end instead of stopping there.
     */
    default boolean growing() {
        return false;
    }

    /** Where the run begins, Gyr (for a run into the past, the later end of the span). */
    default double runStartGyr() {
        return startGyr();
    }

    /** Where the run ends, or will end while it grows (known before it gets there), Gyr. */
    default double runEndGyr() {
        return endGyr();
    }

    /** Waits until the span reaches {@code tGyr} or stops growing; returns at once when not growing. */
    default void awaitGyr(double tGyr) {
    }

    /** One line on the state of the source (a run's progress) for the title bar; "" for none. */
    default String status() {
        return "";
    }

    /**
     * Closes the source and removes what it wrote for this command (a live run's kept folder),
     * for a command that ends in bad input after the source was opened. Closing afterwards does
     * nothing more.
     */
    default void discard() {
        close();
    }

    /** Releases what the source holds (files, a live run). */
    @Override
    default void close() {
    }
}
