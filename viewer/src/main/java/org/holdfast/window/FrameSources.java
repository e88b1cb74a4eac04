package org.holdfast.window;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Opens the frame source for what {@code holdfast view} was given: a finished run's folder
 * (replayed from its snapshots) or a scenario file (evolved live as the clock plays). This is
 * the one place that connects the window to the renderer and the engine.
 */
public final class FrameSources {

    private FrameSources() {
    }

    /** Opens a source for {@code input}; see {@link SourceOpener}. */
    public static FrameSource open(Path input) throws CannotOpenException {
        if (Files.isDirectory(input)) {
            throw new CannotOpenException("cannot replay run folder '" + input
                    + "' yet: this build has no replay renderer connected to the window");
        }
        if (input.getFileName() != null && input.getFileName().toString().endsWith(".toml")) {
            throw new CannotOpenException("cannot evolve scenario '" + input
                    + "' live yet: this build has no live renderer connected to the window");
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
