package org.holdfast.render.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * Checks every projection must pass: its inverse map agrees with it both ways (a pixel's
 * direction projects back onto the pixel; a visible direction's pixel unprojects back to the
 * direction). Subclasses give the projection and its own geometry checks.
 */
abstract class ProjectionContract {

    /** Round trips agree to this many pixels / radians (double rounding only). */
    static final double EXACT = 1e-9;

    abstract Projection projection();

    @Test
    void pixelToDirectionAndBack() {
        Projection p = projection();
        double[] dir = new double[3];
        double[] px = new double[2];
        int checked = 0;
        for (int j = 0; j <= 20; j++) {
            for (int i = 0; i <= 20; i++) {
                double x = (i + 0.37) * p.width() / 21.0;
                double y = (j + 0.61) * p.height() / 21.0;
                if (!p.unproject(x, y, dir)) {
                    continue;
                }
                assertEquals(1, Math.sqrt(dir[0] * dir[0] + dir[1] * dir[1] + dir[2] * dir[2]), EXACT, "unit direction");
                assertTrue(p.project(dir[0], dir[1], dir[2], px), "an unprojected direction is visible");
                assertEquals(x, px[0], 1e-7 * p.width(), "x round trip");
                assertEquals(y, px[1], 1e-7 * p.height(), "y round trip");
                checked++;
            }
        }
        assertTrue(checked > 200, "most sample pixels show a direction (" + checked + ")");
    }

    @Test
    void directionToPixelAndBack() {
        Projection p = projection();
        SplittableRandom rng = new SplittableRandom(7);
        double[] dir = new double[3];
        double[] px = new double[2];
        int visible = 0;
        for (int k = 0; k < 2000; k++) {
            double z = 2 * rng.nextDouble() - 1;
            double phi = 2 * Math.PI * rng.nextDouble();
            double s = Math.sqrt(1 - z * z);
            double x = s * Math.cos(phi);
            double y = s * Math.sin(phi);
            double scale = 0.1 + 10 * rng.nextDouble();
            if (!p.project(scale * x, scale * y, scale * z, px)) {
                continue;
            }
            visible++;
            assertTrue(p.unproject(px[0], px[1], dir));
            assertEquals(x, dir[0], 1e-7);
            assertEquals(y, dir[1], 1e-7);
            assertEquals(z, dir[2], 1e-7);
        }
        assertTrue(visible > 100, "some random directions are visible (" + visible + ")");
    }
}
