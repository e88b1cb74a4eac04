package org.holdfast.window;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.holdfast.replay.RunArchive;
import org.holdfast.replay.RunFrameSource;
import org.holdfast.replay.TemporaryRun;
import org.holdfast.scenario.ScenarioException;

/**
 * Opens the frame source for what {@code holdfast view} was given: a finished run's folder
 * (replayed from its snapshots) or a scenario file (evolved first, then replayed). This is
 * the one place that connects the window to the renderer and the engine.
 */
public final class FrameSources {

    private FrameSources() {
    }

    /**
     * Opens a source for {@code input}: a run folder is replayed from its snapshots; a scenario
     * file is first evolved into a temporary run folder (removed when the source closes) and
     * then replayed, so the clock can run both ways.
     */
    public static FrameSource open(Path input) throws CannotOpenException {
        try {
            if (Files.isDirectory(input)) {
                return new RunFrameSource(RunArchive.open(input), null);
            }
            if (input.getFileName() != null && input.getFileName().toString().endsWith(".toml")) {
                TemporaryRun run = TemporaryRun.evolve(input, List.of(), null);
                try {
                    return new RunFrameSource(RunArchive.open(run.dir()), run);
                } catch (RuntimeException e) {
                    run.close();
                    throw e;
                }
            }
        } catch (ScenarioException e) {
            throw new CannotOpenException(e.getMessage());
        }
        throw new CannotOpenException("'" + input + "' is neither a run folder nor a scenario (.toml) file");
    }

    /** Opens a source for an input path; {@link FrameSources#open} is the real one. */
    @FunctionalInterface
    public interface SourceOpener {
        FrameSource open(Path input) throws CannotOpenException;
    }

    /** The input cannot be shown; the message says why, in one line. */
    public static final class CannotOpenException extends Exception {

        private static final long serialVersionUID = 1L;

        public CannotOpenException(String message) {
            super(message);
        }
    }
}
