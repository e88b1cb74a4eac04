package org.holdfast.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.knowm.xchart.XYChart;
import org.junit.jupiter.api.Test;

class ChartsTest {

    @Test
    void tickLabelsAreReadableAtEveryScale() {
        // The end of a phantom run's Hubble diagram printed 1.938495097952533E14 before.
        assertEquals("1.9\u00d710\u00b9\u2074", Charts.tickLabel(1.938495097952533e14));
        assertEquals("5.7\u00d710\u2079", Charts.tickLabel(5.667119067665881e9));
        assertEquals("10\u2075", Charts.tickLabel(1e5));
        assertEquals("-2\u00d710\u207b\u2074", Charts.tickLabel(-2e-4));
        assertEquals("0", Charts.tickLabel(0));
        assertEquals("1,500", Charts.tickLabel(1500));
        assertEquals("-70", Charts.tickLabel(-70));
        assertEquals("0.25", Charts.tickLabel(0.25));
        // 9.96e6 rounds to 10.0 x 10^6: written as 10^7, not "10 x 10^6"
        assertEquals("10\u2077", Charts.tickLabel(9.96e6));
    }

    @Test
    void linearAxesGetReadableLabelsLogarithmicOnesKeepTheirOwn() {
        XYChart c = Charts.lines("t", "x", "y", 400, 300);
        c.getStyler().setYAxisLogarithmic(true);
        Charts.labelTicks(c);
        assertNotNull(c.getStyler().getxAxisTickLabelsFormattingFunction());
        assertNull(c.getStyler().getyAxisTickLabelsFormattingFunction());
    }

    @Test
    void aDashedLineKeepsOnlySegmentsLongEnoughForADash() {
        // 1000 points across a 700-pixel plot: 0.7 px apart, which XChart would draw solid.
        int n = 1000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 0.01;
            y[i] = i == 500 ? Double.NaN : 100 + 50 * Math.sin(x[i]);
        }
        double[][] t = Charts.thinForDashes(x, y, 10, 40, 160, false, 700, 500, 14);
        // the curve is about 1500 px long on the screen: some 1500 / 14 points stay
        assertTrue(t[0].length < 130 && t[0].length > 60, "kept " + t[0].length);
        assertEquals(x[0], t[0][0]);
        assertEquals(x[n - 1], t[0][t[0].length - 1], "the last point stays");
        int gaps = 0;
        for (int i = 1; i < t[0].length; i++) {
            if (Double.isNaN(t[1][i])) {
                gaps++;
                continue;
            }
            boolean beforeGapOrLast = i == t[0].length - 1 || Double.isNaN(t[1][i + 1]);
            if (!Double.isNaN(t[1][i - 1]) && !beforeGapOrLast) {
                double dx = (t[0][i] - t[0][i - 1]) / 10 * 700;
                double dy = (t[1][i] - t[1][i - 1]) / 120 * 500;
                assertTrue(Math.hypot(dx, dy) >= 14, "segment " + i + " is " + Math.hypot(dx, dy) + " px");
            }
        }
        assertEquals(1, gaps, "the gap is kept");
    }

    /** Notes go beneath the chart, in three columns, never over it; nothing half-written stays. */
    @Test
    void notesAreWrittenBeneathTheChart(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        XYChart c = Charts.lines("t", "x", "y", 400, 300);
        Charts.line(c, "a", new double[] {0, 1, 2}, new double[] {1, 3, 2}, 0);
        java.nio.file.Path plain = dir.resolve("plain.png");
        java.nio.file.Path noted = dir.resolve("noted.png");
        Charts.savePng(c, java.util.List.of(), plain);
        java.util.List<String> notes = new java.util.ArrayList<>();
        for (int k = 1; k <= 7; k++) {
            notes.add(k + "   t = " + k + ".0 Gyr   merged: Tessaly, Vell");
        }
        Charts.savePng(c, notes, noted);
        java.awt.image.BufferedImage a = javax.imageio.ImageIO.read(plain.toFile());
        java.awt.image.BufferedImage b = javax.imageio.ImageIO.read(noted.toFile());
        assertEquals(300, a.getHeight(), "no notes, no room for them");
        assertEquals(300 + 3 * 19 + 2 * 14, b.getHeight(), "seven notes in three columns take three rows");
        int ink = 0;
        for (int y = 300; y < b.getHeight(); y++) {
            for (int x = 0; x < b.getWidth(); x++) {
                ink += b.getRGB(x, y) != a.getRGB(0, 0) ? 1 : 0;
            }
        }
        assertTrue(ink > 200, "the notes are drawn: " + ink + " pixels of text");
        for (int y = 0; y < 300; y++) {
            for (int x = 0; x < 400; x++) {
                assertEquals(a.getRGB(x, y), b.getRGB(x, y), "the chart itself is unchanged at " + x + "," + y);
            }
        }
        try (var files = java.nio.file.Files.list(dir)) {
            assertEquals(2, files.count(), "no .part file left");
        }
    }
}
