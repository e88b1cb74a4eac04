package org.holdfast.schema;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;

/** Shared by the layers above: {@link #reason} (moved here from RunFolder, which still offers it). */
public final class IoFailure {

    private IoFailure() {
    }

    /** A file-system failure in plain words. */
    public static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileAlreadyExistsException f) {
            return (f.getFile() == null ? "a file" : f.getFile()) + " is in the way and is not a folder";
        }
        if (e instanceof NoSuchFileException) {
            return "the file system refuses it (no such file or directory)";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason().toLowerCase(java.util.Locale.ROOT);
        }
        return String.valueOf(e.getMessage());
    }
}
