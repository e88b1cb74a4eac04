package org.holdfast.window;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;

import javax.imageio.ImageIO;

/**
 * PNG files of frames. A file appears whole or not at all: it is written under a temporary name
 * beside its destination and then renamed.
 */
public final class Screenshots {

    private Screenshots() {
    }

    /** Writes the ARGB frame (row 0 on top) as an opaque RGB PNG at {@code file}. */
    public static void writePng(Path file, int[] argb, int width, int height) throws IOException {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        img.setRGB(0, 0, width, height, argb, 0, width);
        Path abs = file.toAbsolutePath();
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".part");
        try {
            if (!ImageIO.write(img, "png", tmp.toFile())) {
                throw new IOException("no PNG writer available");
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (java.nio.file.AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The first {@code shot-NNNN.png} in {@code dir} that does not exist yet. */
    public static Path nextFreeName(Path dir) {
        for (int i = 1; i < 100_000; i++) {
            Path p = dir.resolve(String.format(Locale.ROOT, "shot-%04d.png", i));
            if (!Files.exists(p)) {
                return p;
            }
        }
        throw new IllegalStateException("no free screenshot name left in " + dir);
    }
}
