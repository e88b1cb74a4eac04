package org.holdfast.sweep;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.HeatMapChart;
import org.knowm.xchart.HeatMapChartBuilder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The sweep's pictures, PNG, drawn headless: with one varied key, the fraction of runs in which
 * each member (and the whole group) stays bound against that key ({@code bound-fraction.png});
 * with two, a map of the fraction of runs whose group verdict is "bound" over both keys
 * ({@code bound-map.png}). With more keys there is no picture (slice {@code fractions.csv}).
 */
public final class SweepPlots {

    /** The one-key picture's file name. */
    public static final String LINE_FILE = "bound-fraction.png";

    /** The two-key picture's file name. */
    public static final String MAP_FILE = "bound-map.png";

    /** Line colours: a dark slate for the group, then members in a muted, distinct order. */
    private static final Color[] PALETTE = {
        new Color(0x26, 0x32, 0x38), new Color(0xC0, 0x5A, 0x1F), new Color(0x2E, 0x7D, 0x6B),
        new Color(0x6A, 0x4C, 0x93), new Color(0xB8, 0x8B, 0x1A), new Color(0x3B, 0x6E, 0xA8),
        new Color(0x9E, 0x3D, 0x5C), new Color(0x5F, 0x7F, 0x2A)
    };

    /** The map's colour ramp, "never bound" to "always bound": ember to teal, light enough for dark numbers. */
    private static final Color[] RAMP = {
        new Color(0xC2, 0x5B, 0x3A), new Color(0xE3, 0xA0, 0x5C), new Color(0xF4, 0xEC, 0xD8),
        new Color(0x86, 0xC2, 0xB6), new Color(0x4A, 0x96, 0x92)
    };

    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 18);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 15);

    private SweepPlots() {
    }

    /**
     * Draws the picture that fits the number of varied keys into {@code dir}.
     *
     * @return the file written, or null when there is none for this grid
     */
    public static Path draw(SweepPlan plan, List<Fractions.Row> rows, Path dir) throws IOException {
        if (plan.axes().size() == 1) {
            Path f = dir.resolve(LINE_FILE);
            save(lineChart(plan, rows), f);
            return f;
        }
        if (plan.axes().size() == 2) {
            Path f = dir.resolve(MAP_FILE);
            save(mapChart(plan, rows), f);
            return f;
        }
        return null;
    }

    static XYChart lineChart(SweepPlan plan, List<Fractions.Row> rows) {
        Axis axis = plan.axes().get(0);
        XYChart chart = new XYChartBuilder().width(900).height(600)
                .title("Fraction of runs that stay bound")
                .xAxisTitle(label(axis.key())).yAxisTitle("fraction of runs bound").build();
        style(chart);
        Map<String, double[]> series = new LinkedHashMap<>();
        series.put("whole group", new double[axis.size()]);
        for (Fractions.Row r : rows) {
            int i = plan.indicesAt(r.point())[0];
            if (r.level().equals("group") && r.outcome().equals("bound")) {
                series.get("whole group")[i] = r.fraction();
            } else if (r.level().equals("member") && r.outcome().equals("bound")) {
                series.computeIfAbsent(r.name(), k -> new double[axis.size()])[i] = r.fraction();
            }
        }
        double[] x = axis.values().stream().mapToDouble(Double::doubleValue).toArray();
        int c = 0;
        for (Map.Entry<String, double[]> e : series.entrySet()) {
            XYSeries s = chart.addSeries(e.getKey(), x, e.getValue());
            s.setLineColor(PALETTE[c % PALETTE.length]);
            s.setMarkerColor(PALETTE[c % PALETTE.length]);
            s.setMarker(SeriesMarkers.CIRCLE);
            s.setLineStyle(new BasicStroke(c == 0 ? 3.0f : 2.0f));
            c++;
        }
        return chart;
    }

    static HeatMapChart mapChart(SweepPlan plan, List<Fractions.Row> rows) {
        Axis ax = plan.axes().get(0);
        Axis ay = plan.axes().get(1);
        HeatMapChart chart = new HeatMapChartBuilder().width(900).height(700)
                .title("Fraction of runs in which the group stays bound")
                .xAxisTitle(label(ax.key())).yAxisTitle(label(ay.key())).build();
        chart.getStyler().setChartBackgroundColor(Color.WHITE);
        chart.getStyler().setChartTitleFont(TITLE);
        chart.getStyler().setAxisTitleFont(LABEL);
        chart.getStyler().setRangeColors(RAMP);
        chart.getStyler().setMin(0.0);
        chart.getStyler().setMax(1.0);
        chart.getStyler().setShowValue(ax.size() * ay.size() <= 100);
        chart.getStyler().setHeatMapValueDecimalPattern("0.00");
        List<Number[]> heat = new ArrayList<>();
        for (Fractions.Row r : rows) {
            if (r.level().equals("group") && r.outcome().equals("bound")) {
                int[] idx = plan.indicesAt(r.point());
                heat.add(new Number[] {idx[0], idx[1], r.fraction()});
            }
        }
        chart.addSeries("bound fraction", ticks(ax), ticks(ay), heat);
        return chart;
    }

    private static List<String> ticks(Axis a) {
        List<String> t = new ArrayList<>();
        for (double v : a.values()) {
            t.add(String.format(Locale.ROOT, "%.4g", v));
        }
        return t;
    }

    private static void style(XYChart chart) {
        var s = chart.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotGridLinesColor(new Color(0xDD, 0xDD, 0xDD));
        s.setChartTitleFont(TITLE);
        s.setAxisTitleFont(LABEL);
        s.setAxisTickLabelsFont(LABEL.deriveFont(13f));
        s.setLegendFont(LABEL.deriveFont(13f));
        s.setYAxisMin(0.0);
        s.setYAxisMax(1.0);
        s.setYAxisDecimalPattern("0.0");
    }

    /** An axis label for a dotted key, with the unit its name carries. */
    static String label(String key) {
        String[] parts = key.split("\\.");
        String last = parts[parts.length - 1];
        if (last.matches("\\d+") && parts.length > 1) {
            last = parts[parts.length - 2]; // a vector component: the unit is the vector's
        }
        String unit = unitOf(last);
        return unit == null ? key : key + " [" + unit + "]";
    }

    private static String unitOf(String name) {
        if (name.equals("h0")) {
            return "km/s/Mpc";
        }
        String[][] suffixes = {{"_gyr", "Gyr"}, {"_myr", "Myr"}, {"_msun", "Msun"}, {"_kpc", "kpc"}, {"_kms", "km/s"}};
        for (String[] s : suffixes) {
            if (name.endsWith(s[0])) {
                return s[1];
            }
        }
        return null;
    }

    private static void save(org.knowm.xchart.internal.chartpart.Chart<?, ?> chart, Path file) throws IOException {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        BitmapEncoder.saveBitmap(chart, buf, BitmapEncoder.BitmapFormat.PNG);
        Outputs.writeAtomically(file, buf.toByteArray());
    }
}
