package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FrameFilesTest {

    @TempDir
    Path dir;

    @Test
    void namesAreNumberedFromOne() {
        assertEquals("frame_000001.png", FrameFiles.name(1));
        assertEquals("frame_012345.png", FrameFiles.name(12345));
        assertThrows(IllegalArgumentException.class, () -> FrameFiles.name(0));
    }

    @Test
    void writtenFramesReadBackExactlyAndLeaveNoTemporaryFiles() throws IOException {
        FrameFiles frames = new FrameFiles(dir.resolve("film"));
        BufferedImage im = new BufferedImage(8, 6, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < 6; y++) {
            for (int x = 0; x < 8; x++) {
                im.setRGB(x, y, (x * 31) << 16 | (y * 40) << 8 | (x * y));
            }
        }
        assertFalse(frames.isComplete(3));
        Path written = frames.write(3, im);
        assertTrue(frames.isComplete(3));
        assertEquals("frame_000003.png", written.getFileName().toString());
        BufferedImage back = ImageIO.read(written.toFile());
        for (int y = 0; y < 6; y++) {
            for (int x = 0; x < 8; x++) {
                assertEquals(im.getRGB(x, y), back.getRGB(x, y), "pixel " + x + "," + y);
            }
        }
        try (Stream<Path> files = Files.list(frames.folder())) {
            assertEquals(1, files.count(), "only the finished frame is left");
        }
    }
}
