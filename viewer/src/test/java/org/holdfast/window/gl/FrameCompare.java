package org.holdfast.window.gl;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;

import javax.imageio.ImageIO;

/** Compares a PNG with an ARGB frame, channel by channel (alpha ignored: the PNG is opaque). */
final class FrameCompare {

    private FrameCompare() {
    }

    /** Largest difference of any red, green or blue value between the PNG and {@code argb}. */
    static int maxChannelDifference(Path png, int[] argb, int width, int height) throws IOException {
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(width, img.getWidth(), "PNG width");
        assertEquals(height, img.getHeight(), "PNG height");
        int worst = 0;
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int a = img.getRGB(x, y);
                int b = argb[x + y * width];
                for (int shift = 0; shift <= 16; shift += 8) {
                    worst = Math.max(worst, Math.abs(((a >> shift) & 0xFF) - ((b >> shift) & 0xFF)));
                }
            }
        }
        return worst;
    }
}
