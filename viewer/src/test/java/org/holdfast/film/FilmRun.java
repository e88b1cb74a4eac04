package org.holdfast.film;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;

import javax.imageio.ImageIO;

import org.holdfast.window.FrameSources;
import org.holdfast.window.ViewRun;

/** Runs {@code holdfast render} in-process and reads what it wrote, for the film tests. */
final class FilmRun {

    private FilmRun() {
    }

    static ViewRun.Result render(String... args) {
        String[] all = new String[args.length + 1];
        all[0] = "render";
        System.arraycopy(args, 0, all, 1, args.length);
        return ViewRun.run(FrameSources::open, all);
    }

    static BufferedImage image(Path png) throws IOException {
        BufferedImage img = ImageIO.read(png.toFile());
        if (img == null) {
            throw new IOException("not a PNG: " + png);
        }
        return img;
    }

    /** Largest red, green or blue difference between two images of one size. */
    static int maxDifference(BufferedImage a, BufferedImage b) {
        int worst = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                int p = a.getRGB(x, y);
                int q = b.getRGB(x, y);
                for (int s = 0; s <= 16; s += 8) {
                    worst = Math.max(worst, Math.abs(((p >> s) & 0xFF) - ((q >> s) & 0xFF)));
                }
            }
        }
        return worst;
    }

    /** Fraction of pixels whose colour differs at all. */
    static double differingFraction(BufferedImage a, BufferedImage b) {
        long n = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                if ((a.getRGB(x, y) & 0xFFFFFF) != (b.getRGB(x, y) & 0xFFFFFF)) {
                    n++;
                }
            }
        }
        return n / (double) (a.getWidth() * a.getHeight());
    }

    /** Number of pixels brighter than black. */
    static int litPixels(BufferedImage a) {
        int n = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                if ((a.getRGB(x, y) & 0xFFFFFF) != 0) {
                    n++;
                }
            }
        }
        return n;
    }
}
