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
}
