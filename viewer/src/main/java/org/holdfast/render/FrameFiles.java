package org.holdfast.render;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;

import javax.imageio.ImageIO;

/**
 * Numbered PNG frames in one folder: {@code frame_000001.png}, {@code frame_000002.png}, ...
 * Each frame is written under a temporary name and then renamed, so a file with the final
 * name is always complete and a restarted render can skip it.
 */
public final class FrameFiles {

    private final Path folder;

    /** @param folder where the frames go; created if missing */
    public FrameFiles(Path folder) {
        this.folder = folder;
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create frame folder " + folder, e);
        }
    }

    public Path folder() {
        return folder;
    }

    /** The file name of frame {@code index} (1-based): frame_000001.png. */
    public static String name(int index) {
        if (index < 1 || index > 999_999) {
            throw new IllegalArgumentException("frame index must be in [1, 999999]: " + index);
        }
        return String.format(Locale.ROOT, "frame_%06d.png", index);
    }

    /** The file name of the overlay layer of frame {@code index}: overlay_000001.png. */
    public static String layerName(int index) {
        return "overlay" + name(index).substring("frame".length());
    }

    /** Writes the overlay layer of frame {@code index} (an RGBA PNG), under a temporary name first. */
    public Path writeLayer(int index, BufferedImage image) {
        return writeAs(folder.resolve(layerName(index)), layerName(index), image);
    }

    public Path path(int index) {
        return folder.resolve(name(index));
    }

    /** Whether frame {@code index} was already written completely. */
    public boolean isComplete(int index) {
        return Files.isRegularFile(path(index));
    }

    /** Writes frame {@code index}: to a temporary file, then renamed into place. */
    public Path write(int index, BufferedImage image) {
        return writeAs(path(index), name(index), image);
    }

    private Path writeAs(Path target, String name, BufferedImage image) {
        // a temporary name of this worker's own: several workers may draw into one folder
        Path temp = folder.resolve("." + name + "." + ProcessHandle.current().pid() + "."
                + Thread.currentThread().getId() + ".part");
        try {
            if (!ImageIO.write(image, "png", temp.toFile())) {
                throw new IOException("no PNG writer for this image type");
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            return target;
        } catch (IOException e) {
            try {
                Files.deleteIfExists(temp);
            } catch (IOException ignored) {
                // the original error matters more
            }
            throw new UncheckedIOException("cannot write frame " + target, e);
        }
    }
}
