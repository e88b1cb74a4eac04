package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Wu's anti-aliased line (Wu 1991, Computer Graphics 25(4); issue from memory) splits each column's light
 * between the two nearest pixels in proportion to closeness, so the light-weighted centre of
 * each column lies on the line; we add light per unit length, so the total is length x
 * brightness.
 */
class TrailPainterTest {

    @Test
    void shallowLineDepositsLengthTimesBrightness() {
        LightBuffer buf = new LightBuffer(64, 32);
        // from x = 10.5 to 50.5 the pixel centres 10..49 are covered: 40 columns
        TrailPainter.line(buf, 10.5, 8.2, 50.5, 18.2, 0.5f, 0.25f, 1f);
        double length = Math.hypot(40, 10);
        assertEquals(0.5 * length, buf.total(0), 1e-4);
        assertEquals(1.0 * length, buf.total(2), 1e-4);
    }

    @Test
    void steepLineDepositsLengthTimesBrightness() {
        LightBuffer buf = new LightBuffer(32, 64);
        TrailPainter.line(buf, 8.3, 60.5, 14.3, 4.5, 1f, 1f, 1f);
        assertEquals(Math.hypot(6, 56), buf.total(1), 1e-4);
    }

    @Test
    void eachColumnIsCentredOnTheLine() {
        LightBuffer buf = new LightBuffer(40, 20);
        double x0 = 2.5;
        double y0 = 3.1;
        double x1 = 37.5;
        double y1 = 15.9;
        TrailPainter.line(buf, x0, y0, x1, y1, 1, 1, 1);
        for (int x = 3; x < 37; x++) {
            double sum = 0;
            double moment = 0;
            for (int y = 0; y < 20; y++) {
                sum += buf.red(x, y);
                moment += (y + 0.5) * buf.red(x, y);
            }
            double onLine = y0 + (y1 - y0) * (x + 0.5 - x0) / (x1 - x0);
            assertTrue(sum > 0);
            assertEquals(onLine, moment / sum, 1e-5, "column " + x);
        }
    }

    @Test
    void chainedSegmentsDoNotLightTheJointTwice() {
        LightBuffer chained = new LightBuffer(40, 10);
        TrailPainter.line(chained, 2.5, 5, 20.5, 5, 1, 1, 1);
        TrailPainter.line(chained, 20.5, 5, 30.5, 5, 1, 1, 1);
        LightBuffer straight = new LightBuffer(40, 10);
        TrailPainter.line(straight, 2.5, 5, 30.5, 5, 1, 1, 1);
        assertEquals(straight.total(0), chained.total(0), 1e-5);
        assertEquals(straight.red(20, 4), chained.red(20, 4), 1e-6);
    }
}
