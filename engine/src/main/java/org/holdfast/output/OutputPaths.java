package org.holdfast.output;

import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.schema.ScenarioException;

/**
 * Checks an output path the user named before any work is done, so that a path that runs
 * through an ordinary file, or into a folder that cannot be written, is bad input (one line
 * naming the option, exit code 2) rather than a failure after the frames or the run.
 */
public final class OutputPaths {

    private OutputPaths() {
    }

    /** What the path should end in. */
    public enum Kind {
        /** A folder (it may exist or not). */
        FOLDER,
        /** A file (it may exist, and is replaced). */
        FILE
    }

    /**
     * @param option the option naming the path ("--out", "--video"), for the message
     * @throws ScenarioException if the path cannot be written as the kind asked for
     */
    public static void check(Path path, Kind kind, String option) {
        Path abs = path.toAbsolutePath().normalize();
        if (Files.exists(abs)) {
            if (kind == Kind.FOLDER && !Files.isDirectory(abs)) {
                throw new ScenarioException(option, null, path + " is a file, not a folder");
            }
            if (kind == Kind.FILE && Files.isDirectory(abs)) {
                throw new ScenarioException(option, null, path + " is a folder, not a file");
            }
            if (!Files.isWritable(abs)) {
                throw new ScenarioException(option, null, "cannot write " + path + ": permission denied");
            }
            return;
        }
        Path parent = abs.getParent();
        while (parent != null && !Files.exists(parent)) {
            parent = parent.getParent();
        }
        if (parent == null) {
            return;
        }
        if (!Files.isDirectory(parent)) {
            throw new ScenarioException(option, null, "cannot write " + path + ": " + parent
                    + " is in the way and is not a folder");
        }
        if (!Files.isWritable(parent)) {
            throw new ScenarioException(option, null, "cannot write " + path + ": the folder " + parent
                    + " is not writable (permission denied)");
        }
    }
}
