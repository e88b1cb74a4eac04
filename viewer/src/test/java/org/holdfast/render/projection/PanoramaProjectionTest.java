package org.holdfast.render.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Equirectangular (plate carree) projection: x = R lambda, y = R phi (Snyder 1987, Map
 * Projections: A Working Manual, USGS Professional Paper 1395, the equidistant cylindrical
 * projection), here with azimuth as longitude and elevation as latitude over a 2:1 frame.
 */
class PanoramaProjectionTest extends ProjectionContract {

    @Override
    Projection projection() {
        return new PanoramaProjection(200);
    }

    @Test
    void frameIsTwiceAsWideAsHigh() {
        assertEquals(400, projection().width());
        assertEquals(200, projection().height());
    }

    @Test
    void azimuthMapsLinearlyToX() {
        double[] px = new double[2];
        for (int deg = -175; deg <= 175; deg += 25) {
            double a = Math.toRadians(deg);
            assertTrue(projection().project(Math.sin(a), 0, -Math.cos(a), px));
            assertEquals(400 * (0.5 + deg / 360.0), px[0], 1e-9, "azimuth " + deg);
            assertEquals(100, px[1], 1e-9, "on the horizon");
        }
    }

    @Test
    void elevationMapsLinearlyToY() {
        double[] px = new double[2];
        for (int deg = -80; deg <= 80; deg += 20) {
            double e = Math.toRadians(deg);
            assertTrue(projection().project(0, Math.sin(e), -Math.cos(e), px));
            assertEquals(200 * (0.5 - deg / 180.0), px[1], 1e-9, "elevation " + deg);
        }
        assertTrue(projection().project(0, 1, 0, px));
        assertEquals(0, px[1], 1e-9, "the zenith is the top edge");
    }
}
