package org.holdfast.render.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Azimuthal equidistant projection about the dome's zenith: distance from the centre
 * proportional to the angle from the zenith, rho = R c (Snyder 1987, Map Projections: A Working
 * Manual, USGS Professional Paper 1395, the azimuthal equidistant projection), scaled so that
 * half the span reaches the rim of the square dome master frame (common practice).
 */
class DomeProjectionTest extends ProjectionContract {

    static final int SIZE = 400;

    @Override
    Projection projection() {
        return new DomeProjection(SIZE, 180, 0);
    }

    @Test
    void zenithLandsAtTheCentre() {
        double[] px = new double[2];
        assertTrue(projection().project(0, 0, -3, px));
        assertEquals(SIZE / 2.0, px[0], EXACT);
        assertEquals(SIZE / 2.0, px[1], EXACT);
    }

    @Test
    void horizonLandsOnTheRimOfA180DegreeDome() {
        double[] px = new double[2];
        for (int k = 0; k < 36; k++) {
            double phi = Math.toRadians(10 * k);
            assertTrue(projection().project(Math.cos(phi), Math.sin(phi), 0, px));
            double r = Math.hypot(px[0] - SIZE / 2.0, px[1] - SIZE / 2.0);
            assertEquals(SIZE / 2.0, r, 1e-9, "horizon at azimuth " + 10 * k);
        }
    }

    @Test
    void radiusGrowsLinearlyWithZenithAngle() {
        double[] px = new double[2];
        for (int deg = 5; deg <= 85; deg += 10) {
            double t = Math.toRadians(deg);
            assertTrue(projection().project(Math.sin(t), 0, -Math.cos(t), px));
            assertEquals(SIZE / 2.0 * deg / 90.0, px[0] - SIZE / 2.0, 1e-9, "zenith angle " + deg);
            assertEquals(SIZE / 2.0, px[1], 1e-9);
        }
    }

    @Test
    void upIsTowardsTheTopOfTheFrame() {
        double[] px = new double[2];
        assertTrue(projection().project(0, 1, -1, px));
        assertEquals(SIZE / 2.0, px[0], 1e-9);
        assertEquals(SIZE / 4.0, px[1], 1e-9);
    }

    @Test
    void wideDomeShowsBelowTheHorizonAndHidesBehind() {
        DomeProjection wide = new DomeProjection(SIZE, 240, 0);
        double[] px = new double[2];
        double t = Math.toRadians(119.5);
        assertTrue(wide.project(Math.sin(t), 0, -Math.cos(t), px));
        assertEquals(SIZE / 2.0 * (1 + 119.5 / 120), px[0], 1e-9, "119.5 degrees out, just inside the rim of 240");
        assertFalse(projection().project(Math.sin(t), 0, -Math.cos(t), px), "but outside a 180-degree dome");
        double beyond = Math.toRadians(120.5);
        assertFalse(wide.project(Math.sin(beyond), 0, -Math.cos(beyond), px), "just beyond the rim of 240");
        assertFalse(wide.project(0, 0, 1, px), "straight behind is never shown");
    }

    @Test
    void tiltOf90PutsTheViewDirectionOnTheLowerRim() {
        DomeProjection tilted = new DomeProjection(SIZE, 180, 90);
        double[] px = new double[2];
        assertTrue(tilted.project(0, 0, -1, px));
        assertEquals(SIZE / 2.0, px[0], 1e-9);
        assertEquals(SIZE, px[1], 1e-9);
        assertTrue(tilted.project(0, 1, 0, px), "camera up is the zenith");
        assertEquals(SIZE / 2.0, px[0], 1e-9);
        assertEquals(SIZE / 2.0, px[1], 1e-9);
    }

    @Test
    void outsideTheDiscShowsNothing() {
        assertFalse(projection().unproject(1, 1, new double[3]));
    }

    @Test
    void rejectsSpansBeyond240() {
        assertThrows(IllegalArgumentException.class, () -> new DomeProjection(64, 241, 0));
        assertThrows(IllegalArgumentException.class, () -> new DomeProjection(64, 180, 91));
    }
}
