package org.holdfast.window;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.holdfast.replay.LiveRun;
import org.holdfast.replay.RunArchive;
import org.holdfast.window.RunFrameSource;
import org.holdfast.schema.ScenarioException;

/**
 * Opens the frame source for what {@code holdfast view} was given: a finished run's folder
 * (replayed from its snapshots) or a scenario file (evolved while it plays). This is
 * the one place that connects the window to the renderer and the engine.
 */
public final class FrameSources {

    private FrameSources() {
    }

    /**
     * Opens a source for {@code input}: a run folder is replayed from its snapshots; a scenario
     * file is evolved on a background thread as it plays, into a temporary run folder (removed
     * when the source closes) or into {@code keep}.
     *
     * @param sets {@code --set KEY=VALUE} overrides for a scenario
     * @param keep run folder to write and keep for a scenario, or null
     */
    public static FrameSource open(Path input, List<String> sets, Path keep) throws CannotOpenException {
        try {
            if (Files.isDirectory(input)) {
                return new RunFrameSource(RunArchive.open(input), null);
            }
            if (input.getFileName() != null && input.getFileName().toString().endsWith(".toml")) {
                return RunFrameSource.following(LiveRun.start(input, sets, keep));
            }
        } catch (ScenarioException e) {
            throw new CannotOpenException(e.getMessage());
        }
        throw new CannotOpenException("'" + input + "' is neither a run folder nor a scenario (.toml) file");
    }

    /** Opens a source for an input path; {@link FrameSources#open} is the real one. */
    @FunctionalInterface
    public interface SourceOpener {
        /**
         * @param sets {@code --set} overrides for a scenario
         * @param keep {@code --out} folder to keep a scenario's run in, or null
         */
        FrameSource open(Path input, List<String> sets, Path keep) throws CannotOpenException;
    }

    /** The input cannot be shown; the message says why, in one line. */
    public static final class CannotOpenException extends Exception {

        private static final long serialVersionUID = 1L;

        public CannotOpenException(String message) {
            super(message);
        }
    }
}
