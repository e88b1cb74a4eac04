package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;

import org.holdfast.render.projection.FlatProjection;
import org.junit.jupiter.api.Test;

/** Galaxy names placed so that they do not overlap (LabelPlacer, used by the overlay painter). */
class LabelPlacerTest {

    private static final int ASCENT = 9;
    private static final int DESCENT = 3;
    private static final int GAP = 4;

    /** Placed labels of a frame 320 x 200: origins, or null where left out. */
    private static int[][] place(LabelPlacer p, double[] centres, int... widths) {
        int n = widths.length;
        int[] xy = new int[2 * n];
        boolean[] placed = new boolean[n];
        p.place(n, centres, widths, ASCENT, DESCENT, GAP, 320, 200, xy, placed);
        int[][] out = new int[n][];
        for (int i = 0; i < n; i++) {
            out[i] = placed[i] ? new int[] {xy[2 * i], xy[2 * i + 1]} : null;
        }
        return out;
    }

    @Test
    void aLoneNameSitsAtTheUpperRightAsBefore() {
        int[][] at = place(new LabelPlacer(), new double[] {100.4, 80.6}, 40);
        assertArrayEquals(new int[] {100 + GAP, 81 - GAP}, at[0]);
    }

    @Test
    void nameAtTheRightEdgeMovesToTheLeftOfItsGalaxy() {
        int[][] at = place(new LabelPlacer(), new double[] {310, 80}, 40);
        assertArrayEquals(new int[] {310 - GAP - 40, 80 - GAP}, at[0]);
    }

    @Test
    void namesOfAKnotOfGalaxiesNeverOverlapAndTheFirstIsAlwaysShown() {
        int n = 12;
        double[] c = new double[2 * n];
        int[] w = new int[n];
        for (int i = 0; i < n; i++) {
            c[2 * i] = 160 + (i % 3);
            c[2 * i + 1] = 100 + (i % 4);
            w[i] = 30 + 3 * i;
        }
        LabelPlacer p = new LabelPlacer();
        int[][] at = place(p, c, w);
        // the upper right would cover the knot's other centres; the upper left does not
        assertArrayEquals(new int[] {160 - GAP - 30, 100 - GAP}, at[0], "the first name always has a place");
        int shown = 0;
        for (int i = 0; i < n; i++) {
            if (at[i] == null) {
                continue;
            }
            shown++;
            for (int j = 0; j < i; j++) {
                if (at[j] != null) {
                    boolean apart = at[i][0] >= at[j][0] + w[j] || at[j][0] >= at[i][0] + w[i]
                            || at[i][1] - ASCENT >= at[j][1] + DESCENT || at[j][1] - ASCENT >= at[i][1] + DESCENT;
                    assertTrue(apart, "names " + i + " and " + j + " overlap");
                }
            }
        }
        assertTrue(shown >= 4 && shown < n, "some names shown, some left out: " + shown);
        int[][] again = place(p, c, w);
        for (int i = 0; i < n; i++) {
            assertArrayEquals(at[i], again[i], "the same frame gets the same names (" + i + ")");
        }
    }

    @Test
    void aNameKeepsClearOfAnotherGalaxyWhenItCan() {
        // galaxy 1 sits where galaxy 0's name would go at the upper right
        int[][] at = place(new LabelPlacer(), new double[] {100, 80, 115, 70}, 40, 40);
        assertArrayEquals(new int[] {100 - GAP - 40, 80 - GAP}, at[0], "upper left instead");
    }

    /**
     * In a rendered frame, a second galaxy on top of the first no longer writes its name over
     * the first one's: the first name's pixels are those it has alone, and the second name is
     * drawn elsewhere.
     */
    @Test
    void inAFrameTwoGalaxiesInOnePlaceShowTwoReadableNames() {
        RenderSettings look = new RenderSettings().noOverlays().overlay(Overlay.NAMES, true).threads(1)
                .referenceDistanceKpc(FrameRendererTest.REF_KPC).galaxyBrightness(0).trailBrightness(0);
        String[] names = {"Tessaly", "Brin"};
        double[] zero = new double[2];
        SceneFrame alone = new SceneFrame().setGalaxies(1, names, new int[] {0}, zero, zero, zero);
        SceneFrame both = new SceneFrame().setGalaxies(2, names, new int[] {0, 1}, zero, zero, zero);
        try (FrameRenderer r = new FrameRenderer(new FlatProjection(320, 200, 50), look)) {
            int[] one = FrameRendererTest.pixels(r.render(alone, FrameRendererTest.front()));
            BufferedImage img = r.render(both, FrameRendererTest.front());
            int[] two = FrameRendererTest.pixels(img);
            int litOne = 0;
            int litOnlyInTwo = 0;
            for (int i = 0; i < one.length; i++) {
                boolean lit1 = (one[i] & 0xFFFFFF) != 0;
                if (lit1) {
                    litOne++;
                    assertEquals(one[i], two[i], "pixel " + (i % 320) + ", " + (i / 320) + " of the first name");
                } else if ((two[i] & 0xFFFFFF) != 0) {
                    litOnlyInTwo++;
                }
            }
            assertTrue(litOne > 20, "the first name is drawn: " + litOne);
            assertTrue(litOnlyInTwo > 10, "the second name is drawn apart: " + litOnlyInTwo);
        }
    }

    @Test
    void galaxiesOutOfViewGetNoName() {
        int[][] at = place(new LabelPlacer(), new double[] {Double.NaN, Double.NaN, 50, 50}, 40, 40);
        assertEquals(null, at[0]);
        assertFalse(at[1] == null);
    }
}
