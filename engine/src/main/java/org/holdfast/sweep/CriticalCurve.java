package org.holdfast.sweep;

import java.awt.BasicStroke;
import java.awt.Color;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.commons.csv.CSVPrinter;
import org.holdfast.output.Charts;
import org.holdfast.output.ChartPalette;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A critical curve in the plane of two keys: for each value of the second key ("along"), the
 * value of the first at which the outcome's fraction crosses one half, found by
 * {@link Threshold}, with the bracket that holds it and, with 6 paired draws or more, a 95%
 * confidence interval for the median draw's critical value. Written as
 * {@code critical-curve.csv} and drawn as {@code critical-curve.png} (points with the interval,
 * or the bracket, as a horizontal bar).
 */
public final class CriticalCurve {

    /** The table's file name. */
    public static final String CSV_FILE = "critical-curve.csv";

    /** The picture's file name. */
    public static final String PNG_FILE = "critical-curve.png";

    /**
     * One point of the curve.
     *
     * @param along the value of the second key
     * @param found whether the outcome changes inside the searched range at this value
     * @param value the critical value of the first key (NaN when not found)
     * @param low the bracket's lower end
     * @param high the bracket's upper end
     * @param fractionAtLow the outcome's fraction at the bracket's lower end (at the range's
     *     low end when not found)
     * @param fractionAtHigh the same at the upper end
     * @param runs the runs made for this point
     * @param ciLow with paired draws (6 or more), the lower end of a 95% confidence interval for the
     *     median of the draws' own critical values ({@link Threshold#medianLevels95}); NaN otherwise
     * @param ciHigh its upper end
     */
    public record Point(double along, boolean found, double value, double low, double high, double fractionAtLow,
            double fractionAtHigh, int runs, double ciLow, double ciHigh) {
    }

    private CriticalCurve() {
    }

    /** The table as CSV text. */
    public static String csv(String key, String alongKey, int samples, List<Point> points) throws IOException {
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, ResultsTable.CSV)) {
            p.printRecord(alongKey, "found", key, key + ".bracket_low", key + ".bracket_high", "fraction_at_bracket_low",
                    "fraction_at_bracket_high", key + ".median_ci95_low", key + ".median_ci95_high", "samples", "runs");
            for (Point pt : points) {
                p.printRecord(Double.toString(pt.along()), Boolean.toString(pt.found()),
                        pt.found() ? Double.toString(pt.value()) : "", Double.toString(pt.low()),
                        Double.toString(pt.high()), fmt(pt.fractionAtLow()), fmt(pt.fractionAtHigh()),
                        Double.isNaN(pt.ciLow()) ? "" : Double.toString(pt.ciLow()),
                        Double.isNaN(pt.ciHigh()) ? "" : Double.toString(pt.ciHigh()),
                        Integer.toString(samples), Integer.toString(pt.runs()));
            }
        }
        return w.toString();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6f", v);
    }

    /** Writes the table and the picture into {@code dir}; returns both paths. */
    public static List<Path> write(Path dir, String key, String alongKey, String what, int samples, List<Point> points)
            throws IOException {
        Path csv = dir.resolve(CSV_FILE);
        Outputs.writeAtomically(csv, csv(key, alongKey, samples, points).getBytes(StandardCharsets.UTF_8));
        Path png = dir.resolve(PNG_FILE);
        Charts.savePng(png, chart(key, alongKey, what, samples, points));
        return List.of(csv, png);
    }

    static XYChart chart(String key, String alongKey, String what, int samples, List<Point> points) {
        String title = samples == 1 ? "Critical curve: " + what + " (one run per value)"
                : "Critical curve: " + what + " in half of " + samples + " paired draws";
        XYChart chart = Charts.lines(title, SweepPlots.label(key), SweepPlots.label(alongKey), 1000, 640);
        chart.getStyler().setMarkerSize(9);
        List<double[]> found = new ArrayList<>();
        for (Point p : points) {
            if (p.found()) {
                found.add(new double[] {p.value(), p.along()});
                if (!Double.isNaN(p.ciLow()) && !Double.isNaN(p.ciHigh())) {
                    XYSeries ci = chart.addSeries("95% " + p.along(), new double[] {p.ciLow(), p.ciHigh()},
                            new double[] {p.along(), p.along()});
                    ci.setLineColor(new Color(0xC9, 0x47, 0x3B, 140));
                    ci.setLineStyle(new BasicStroke(6f));
                    ci.setMarker(SeriesMarkers.NONE);
                    ci.setShowInLegend(false);
                }
                // the bracket: a short horizontal bar through the point
                XYSeries bar = chart.addSeries("bracket " + p.along(), new double[] {p.low(), p.high()},
                        new double[] {p.along(), p.along()});
                bar.setLineColor(ChartPalette.GUIDE);
                bar.setLineStyle(new BasicStroke(3f));
                bar.setMarker(SeriesMarkers.NONE);
                bar.setShowInLegend(false);
            }
        }
        if (found.isEmpty()) {
            XYSeries none = chart.addSeries("no change inside the range", new double[] {0}, new double[] {0});
            none.setMarker(SeriesMarkers.NONE);
            return chart;
        }
        XYSeries s = chart.addSeries(samples >= 6 ? "critical value (bars: 95% interval of the median draw)"
                : "critical value (bars: bracket)", found.stream().mapToDouble(p -> p[0]).toArray(),
                found.stream().mapToDouble(p -> p[1]).toArray());
        s.setLineColor(ChartPalette.INK);
        s.setMarkerColor(new Color(0xC9473B));
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setLineStyle(new BasicStroke(2f));
        return chart;
    }
}
