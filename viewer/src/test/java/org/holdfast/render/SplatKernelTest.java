package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Pixel checks of one Gaussian splat on small frames. */
class SplatKernelTest {

    /**
     * The footprint weights are normalised, so the light deposited equals the brightness
     * wherever the splat falls (by construction; tolerance: float rounding of 9 to 49 products).
     */
    @Test
    void singleSplatTotalLightEqualsItsBrightness() {
        for (double sigma : new double[] {0.5, 1.0, 2.3}) {
            SplatKernel k = new SplatKernel(sigma);
            for (double fx = 10; fx < 11; fx += 0.137) {
                LightBuffer buf = new LightBuffer(24, 20);
                k.draw(buf, fx, 9.71, 3.5f, 1.25f, 0.5f);
                assertEquals(3.5, buf.total(0), 3.5 * 1e-6, "red, sigma " + sigma + ", x " + fx);
                assertEquals(1.25, buf.total(1), 1.25 * 1e-6, "green");
                assertEquals(0.5, buf.total(2), 0.5 * 1e-6, "blue");
            }
        }
    }

    /** The light-weighted centre lies within half a sub-pixel phase of the splat's position. */
    @Test
    void lightIsCentredOnTheSplat() {
        SplatKernel k = new SplatKernel(0.8);
        double fx = 7.3;
        double fy = 5.86;
        LightBuffer buf = new LightBuffer(16, 12);
        k.draw(buf, fx, fy, 1, 1, 1);
        double sx = 0;
        double sy = 0;
        for (int y = 0; y < 12; y++) {
            for (int x = 0; x < 16; x++) {
                sx += (x + 0.5) * buf.red(x, y);
                sy += (y + 0.5) * buf.red(x, y);
            }
        }
        assertEquals(fx, sx, 0.5 / SplatKernel.PHASES);
        assertEquals(fy, sy, 0.5 / SplatKernel.PHASES);
    }

    @Test
    void splatIsRoundAndPeaksAtItsPixel() {
        SplatKernel k = new SplatKernel(1.0);
        LightBuffer buf = new LightBuffer(9, 9);
        k.draw(buf, 4.5, 4.5, 1, 1, 1);
        assertEquals(buf.red(3, 4), buf.red(5, 4), 1e-7);
        assertEquals(buf.red(4, 3), buf.red(4, 5), 1e-7);
        assertEquals(buf.red(3, 4), buf.red(4, 3), 1e-7);
        assertTrue(buf.red(4, 4) > buf.red(3, 4) && buf.red(3, 4) > buf.red(3, 3));
    }

    @Test
    void splatCutByTheEdgeLosesTheLightOutside() {
        SplatKernel k = new SplatKernel(0.5);
        LightBuffer buf = new LightBuffer(8, 8);
        k.draw(buf, 0.5, 4.5, 1, 1, 1);
        double inside = buf.total(0);
        assertTrue(inside < 1 && inside > 0.5, "part of the light falls off the left edge: " + inside);
    }

    /** Drawing a splat band by band gives the same pixels as drawing it whole. */
    @Test
    void bandsTogetherEqualTheWhole() {
        SplatKernel k = new SplatKernel(1.7);
        LightBuffer whole = new LightBuffer(20, 20);
        LightBuffer parts = new LightBuffer(20, 20);
        k.draw(whole, 9.2, 9.9, 2, 1, 0.5f);
        k.draw(parts, 9.2, 9.9, 2, 1, 0.5f, 0, 9);
        k.draw(parts, 9.2, 9.9, 2, 1, 0.5f, 9, 11);
        k.draw(parts, 9.2, 9.9, 2, 1, 0.5f, 11, 20);
        assertArrayEquals(whole.copyRgb(), parts.copyRgb());
    }
}
