package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * Trail segments and centre markers drawn band by band, in any order of the bands, give
 * exactly the light of the same primitives drawn one after the other over the whole frame.
 */
class MarkerLayerTest {

    private static final int WIDTH = 120;
    private static final int HEIGHT = 90;

    @Test
    void bandsInAnyOrderEqualTheWholeFrame() {
        SplittableRandom rng = new SplittableRandom(4);
        SplatKernel kernel = new SplatKernel(1.9);
        MarkerLayer layer = new MarkerLayer(kernel, HEIGHT);
        LightBuffer whole = new LightBuffer(WIDTH, HEIGHT);
        for (int frame = 0; frame < 3; frame++) {
            layer.clear();
            whole.clear();
            for (int s = 0; s < 200; s++) {
                // in or near the frame; every tenth runs from inside it to far beyond, as a trail
                // does whose next sample lies close to the eye's plane
                double x0 = rng.nextDouble() * 160 - 20;
                double y0 = rng.nextDouble() * 130 - 20;
                double x1 = rng.nextDouble() * 160 - 20;
                double y1 = rng.nextDouble() * 130 - 20;
                if (s % 10 == 0) {
                    double a = 2 * Math.PI * rng.nextDouble();
                    x1 = x0 + 1e12 * Math.cos(a);
                    y1 = y0 + 1e12 * Math.sin(a);
                }
                float r = (float) rng.nextDouble();
                layer.addSegment(x0, y0, x1, y1, r, 0.5f * r, 0.25f);
                TrailPainter.line(whole, x0, y0, x1, y1, r, 0.5f * r, 0.25f);
            }
            for (int c = 0; c < 40; c++) {
                double x = rng.nextDouble() * 140 - 10;
                // every fourth centre on a band edge
                double y = c % 4 == 0 ? 16 * rng.nextInt(7) : rng.nextDouble() * 110 - 10;
                layer.addCentre(x, y, 3, 2, 1);
                kernel.draw(whole, x, y, 3, 2, 1);
            }
            LightBuffer banded = new LightBuffer(WIDTH, HEIGHT);
            int bands = SplatLayer.bands(HEIGHT);
            for (int b = bands - 1; b >= 0; b--) {
                layer.drawBand(b, banded);
            }
            assertTrue(whole.total(0) > 100, "the segments are in view");
            assertArrayEquals(whole.copyRgb(), banded.copyRgb(), "frame " + frame);
        }
    }

    @Test
    void aBandTouchesOnlyItsOwnRows() {
        MarkerLayer layer = new MarkerLayer(new SplatKernel(2), HEIGHT);
        layer.addSegment(3.5, 1.2, 110.5, 88.7, 1, 1, 1);
        layer.addSegment(60.2, 0.5, 61.7, 89.5, 1, 1, 1);
        layer.addCentre(40, 32, 5, 5, 5);
        LightBuffer buf = new LightBuffer(WIDTH, HEIGHT);
        layer.drawBand(2, buf);
        double inside = 0;
        for (int y = 0; y < HEIGHT; y++) {
            for (int x = 0; x < WIDTH; x++) {
                if (y < 32 || y >= 48) {
                    assertTrue(buf.red(x, y) == 0, "pixel " + x + "," + y + " is outside band 2");
                } else {
                    inside += buf.red(x, y);
                }
            }
        }
        assertTrue(inside > 10, "band 2 got its share: " + inside);
    }
}
