package org.holdfast.render.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Pinhole perspective: image position = focal length x (x/depth, y/depth) about the centre
 * (Hartley and Zisserman 2003, Multiple View Geometry in Computer Vision, 2nd ed., Cambridge
 * University Press, the basic pinhole model of the finite-camera chapter; section from memory).
 */
class FlatProjectionTest extends ProjectionContract {

    @Override
    Projection projection() {
        return new FlatProjection(320, 180, 60);
    }

    @Test
    void straightAheadLandsAtTheCentre() {
        double[] px = new double[2];
        assertTrue(projection().project(0, 0, -42, px));
        assertEquals(160, px[0], EXACT);
        assertEquals(90, px[1], EXACT);
    }

    @Test
    void halfTheFieldOfViewUpLandsOnTheTopEdge() {
        double[] px = new double[2];
        double half = Math.toRadians(30);
        assertTrue(projection().project(0, Math.sin(half), -Math.cos(half), px));
        assertEquals(0, px[1], 1e-9);
        assertTrue(projection().project(0, -Math.sin(half), -Math.cos(half), px));
        assertEquals(180, px[1], 1e-9);
    }

    @Test
    void rightIsRightAndBehindIsHidden() {
        double[] px = new double[2];
        assertTrue(projection().project(1, 0, -10, px));
        assertTrue(px[0] > 160);
        assertFalse(projection().project(0, 0, 5, px));
        assertFalse(projection().project(1, 1, 0, px));
    }

    @Test
    void rejectsImpossibleFieldsOfView() {
        assertThrows(IllegalArgumentException.class, () -> new FlatProjection(10, 10, 0));
        assertThrows(IllegalArgumentException.class, () -> new FlatProjection(10, 10, 180));
    }
}
