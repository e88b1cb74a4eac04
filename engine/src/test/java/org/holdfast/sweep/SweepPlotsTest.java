package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/** The pictures' geometry: the 50% contour, the order curves are drawn in, the intervals drawn. */
class SweepPlotsTest {

    /** A plane f = x / 4 on a 5 x 3 grid: its 0.5 level line is the straight line x = 2 (exact for linear data). */
    @Test
    void theContourOfAPlaneIsItsLevelLine() {
        double[][] v = new double[5][3];
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 3; j++) {
                v[i][j] = i / 4.0;
            }
        }
        List<double[]> segs = MapPlot.contour(v, 0.5);
        assertEquals(2, segs.size(), "one segment per row of cells");
        for (double[] s : segs) {
            assertEquals(2.0, s[0], 1e-12);
            assertEquals(2.0, s[2], 1e-12);
        }
        // a tilted plane f = (x + y) / 6: the crossing points lie on x + y = 3
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 3; j++) {
                v[i][j] = (i + j) / 6.0;
            }
        }
        for (double[] s : MapPlot.contour(v, 0.5)) {
            assertEquals(3.0, s[0] + s[1], 1e-12);
            assertEquals(3.0, s[2] + s[3], 1e-12);
        }
        assertTrue(MapPlot.contour(new double[][] {{0, 0}, {0, 0}}, 0.5).isEmpty(), "no crossing, no line");
    }

    @Test
    void everyFractionIsDrawnWithItsIntervalAndTheGroupLast() {
        SweepPlan plan = new SweepPlan(SweepPlan.FORMAT, "x.toml", "00", Map.of(), List.of(Axis.parse("k=1,2,3")), 5,
                true, 1, null, false, 1, 1, SweepPlan.PAIRED, List.of(List.of("Arro", "Belk")), null);
        List<RunRecord> records = new ArrayList<>();
        for (int r = 0; r < 15; r++) {
            String fa = r % 3 == 0 ? "ripped" : "bound";
            records.add(new RunRecord(r, r / 5, r % 5, 1, new RunOutcome(fa.equals("bound") ? "bound" : "dissolved", null,
                    List.of(new MemberOutcome("Arro", "bound", null, null), new MemberOutcome("Belk", fa, 2.0, null)), 0, 0,
                    null)));
        }
        List<Fractions.Row> rows = Fractions.rows(plan, records);
        List<SweepPlots.Curve> curves = SweepPlots.curves(plan, rows);
        assertEquals(List.of("Arro together", "Belk together", "Arro & Belk together",
                "group stays bound (members bound at the start)"), curves.stream().map(SweepPlots.Curve::name).toList());
        XYChart chart = SweepPlots.lineChart(plan, rows);
        List<String> names = new ArrayList<>(chart.getSeriesMap().keySet());
        assertEquals("group stays bound (members bound at the start)", names.get(names.size() - 1),
                "the group's line is drawn last, over the members'");
        for (SweepPlots.Curve c : curves) {
            XYSeries bar = chart.getSeriesMap().get(c.name() + " 95%");
            assertFalse(bar == null, c.name() + " has its intervals drawn");
            for (int i = 0; i < 3; i++) {
                double[] ci = Wilson.interval95(Math.round(c.y()[i] * 5), 5);
                assertEquals(ci[0], bar.getYData()[3 * i], 1e-15, c.name() + " at point " + i);
                assertEquals(ci[1], bar.getYData()[3 * i + 1], 1e-15, c.name() + " at point " + i);
                assertTrue(Double.isNaN(bar.getYData()[3 * i + 2]), "a gap between the bars");
            }
        }
    }

    /** fractions.csv writes six decimals exactly as String.format("%.6f") would (common practice: Java's Formatter). */
    @Test
    void fractionsAreWrittenAsFormatWritesThem() {
        java.util.Random random = new java.util.Random(6);
        for (int i = 0; i < 20_000; i++) {
            double v = i < 10_000 ? random.nextDouble() : Wilson.interval95(random.nextInt(50), 50)[i % 2];
            assertEquals(String.format(java.util.Locale.ROOT, "%.6f", v), Fractions.fmt(v), "v = " + v);
        }
        for (double v : new double[] {0, 1, 0.5, 0.0000005, 0.9999995, 0.1234565}) {
            assertEquals(String.format(java.util.Locale.ROOT, "%.6f", v), Fractions.fmt(v), "v = " + v);
        }
    }
}
