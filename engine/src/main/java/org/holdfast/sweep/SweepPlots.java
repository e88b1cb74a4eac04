package org.holdfast.sweep;

import java.awt.BasicStroke;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.output.Charts;
import org.holdfast.output.ChartPalette;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The sweep's pictures, PNG, drawn headless from {@code fractions.csv}'s rows and the runs.
 *
 * <p>With one varied key: {@code fractions.png}, the fraction of runs in which each member
 * ends together with the group, each named pair stays together, and the group stays bound,
 * every point with its 95% Wilson interval as a bar (curves shifted a little sideways so that
 * coinciding ones stay visible; the group's drawn last, dark and thick, above the members'); and {@code fate-times.png}, a strip plot of the time of every member's fate
 * (at_gyr) at each grid point, one colour per fate. With two: {@code map.png}
 * ({@link MapPlot}), the chosen outcome's fraction over both keys with its 50% contour. With
 * more keys there is no picture (slice {@code fractions.csv}).
 */
public final class SweepPlots {

    /** The one-key fractions picture. */
    public static final String LINE_FILE = "fractions.png";

    /** The one-key fate-times picture. */
    public static final String TIMES_FILE = "fate-times.png";

    /** The two-key map. */
    public static final String MAP_FILE = "map.png";

    /** The group's colour: the ink of the text, so that it stands apart from every member. */
    static final Color GROUP = ChartPalette.INK;

    /** Fate colours in the strip plot (not member colours: there, colour is the fate). */
    private static final Map<String, Color> FATE_COLOURS = Map.of(
            "merged", new Color(0x2F7FB8), "escaped", new Color(0xC7821A), "ripped", new Color(0xC9473B),
            "unbound", new Color(0x6B675E));

    private SweepPlots() {
    }

    /**
     * Draws the pictures that fit the number of varied keys into {@code dir}.
     *
     * @param records the runs, sorted by run index
     * @return the files written (none for three keys or more)
     */
    public static List<Path> draw(SweepPlan plan, List<Fractions.Row> rows, List<RunRecord> records, Path dir)
            throws IOException {
        List<Path> out = new ArrayList<>();
        if (plan.axes().size() == 1) {
            Path f = dir.resolve(LINE_FILE);
            Charts.savePng(f, lineChart(plan, rows));
            out.add(f);
            Path t = dir.resolve(TIMES_FILE);
            Charts.savePng(t, timesChart(plan, records));
            out.add(t);
        } else if (plan.axes().size() == 2) {
            Path f = dir.resolve(MAP_FILE);
            MapPlot.save(plan, rows, f);
            out.add(f);
        }
        return out;
    }

    /** One curve of the fractions picture: a name and, per grid value, fraction and band. */
    record Curve(String name, double[] y, double[] low, double[] high) {
        Curve(String name, int n) {
            this(name, new double[n], new double[n], new double[n]);
        }
    }

    /** The curves of the fractions picture: members (together), pairs, then the group (bound). */
    static List<Curve> curves(SweepPlan plan, List<Fractions.Row> rows) {
        int n = plan.axes().get(0).size();
        Map<String, Curve> byName = new LinkedHashMap<>();
        Curve group = new Curve("group stays bound (members bound at the start)", n);
        for (Fractions.Row r : rows) {
            Curve c = null;
            if (r.level().equals("member") && r.outcome().equals(MemberOutcome.TOGETHER)) {
                c = byName.computeIfAbsent(r.name() + " together", k -> new Curve(k, n));
            } else if (r.level().equals("pair")) {
                c = byName.computeIfAbsent(r.name().replace("+", " & ") + " together", k -> new Curve(k, n));
            } else if (r.level().equals("group") && r.outcome().equals("bound")) {
                c = group;
            }
            if (c != null) {
                int i = plan.indicesAt(r.point())[0];
                c.y()[i] = r.fraction();
                c.low()[i] = r.low();
                c.high()[i] = r.high();
            }
        }
        List<Curve> all = new ArrayList<>(byName.values());
        all.add(group);
        return all;
    }

    static XYChart lineChart(SweepPlan plan, List<Fractions.Row> rows) {
        Axis axis = plan.axes().get(0);
        long runs = rows.isEmpty() ? 0 : rows.get(0).runs();
        XYChart chart = Charts.lines("Who holds together (" + runs + " runs per value; bars: 95% Wilson intervals)",
                label(axis.key()), "fraction of runs", 1000, 620);
        var s = chart.getStyler();
        s.setYAxisMin(-0.02);
        s.setYAxisMax(1.02);
        s.setMarkerSize(7);
        double[] x = axis.values().stream().mapToDouble(Double::doubleValue).toArray();
        List<Curve> curves = curves(plan, rows);
        // Curves often coincide (a host and its satellite, a pair of them): each is shifted a
        // little sideways, so that every line and every interval stays visible.
        double step = axis.size() > 1 ? minStep(axis) : 1.0;
        double spread = Math.min(0.5, 0.04 * curves.size()) * step;
        // interval bars first, so that every line is drawn over every bar; the group's last of all
        for (int c = 0; c < curves.size(); c++) {
            Curve cv = curves.get(c);
            boolean isGroup = c == curves.size() - 1;
            Color col = isGroup ? GROUP : ChartPalette.member(c);
            double dx = offset(c, curves.size(), spread);
            // one series per curve: vertical bars, separated by gaps (NaN)
            double[] bx = new double[3 * x.length];
            double[] by = new double[3 * x.length];
            for (int i = 0; i < x.length; i++) {
                bx[3 * i] = x[i] + dx;
                bx[3 * i + 1] = x[i] + dx;
                bx[3 * i + 2] = x[i] + dx;
                by[3 * i] = cv.low()[i];
                by[3 * i + 1] = cv.high()[i];
                by[3 * i + 2] = Double.NaN;
            }
            XYSeries bar = chart.addSeries(cv.name() + " 95%", bx, by);
            bar.setLineColor(new Color(col.getRed(), col.getGreen(), col.getBlue(), isGroup ? 200 : 150));
            bar.setLineStyle(new BasicStroke(isGroup ? 3.0f : 1.8f));
            bar.setMarker(SeriesMarkers.NONE);
            bar.setShowInLegend(false);
        }
        for (int c = 0; c < curves.size(); c++) {
            Curve cv = curves.get(c);
            boolean isGroup = c == curves.size() - 1;
            Color col = isGroup ? GROUP : ChartPalette.member(c);
            double dx = offset(c, curves.size(), spread);
            double[] xs = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                xs[i] = x[i] + dx;
            }
            XYSeries line = chart.addSeries(cv.name(), xs, cv.y());
            line.setLineColor(col);
            line.setMarkerColor(col);
            line.setMarker(isGroup ? SeriesMarkers.DIAMOND : SeriesMarkers.CIRCLE);
            line.setLineStyle(new BasicStroke(isGroup ? 4.0f : 2.0f));
        }
        return chart;
    }

    /** The sideways shift of curve c of n: spread evenly over [-spread/2, spread/2]. */
    static double offset(int c, int n, double spread) {
        return n == 1 ? 0 : (c / (double) (n - 1) - 0.5) * spread;
    }

    /**
     * The strip plot of fate times: one point per member and run with a time (merged, escaped,
     * ripped, unbound), at its grid value, spread a little sideways by fate and by run so that
     * equal times stay visible.
     */
    static XYChart timesChart(SweepPlan plan, List<RunRecord> records) {
        Axis axis = plan.axes().get(0);
        XYChart chart = Charts.lines("When members merged or left (every run, every member)", label(axis.key()),
                "time of the fate [Gyr from today]", 1000, 620);
        chart.getStyler().setMarkerSize(6);
        double step = axis.size() > 1 ? minStep(axis) : 1.0;
        List<String> order = List.of("merged", "escaped", "ripped", "unbound");
        Map<String, List<double[]>> points = new LinkedHashMap<>();
        order.forEach(f -> points.put(f, new ArrayList<>()));
        int samples = Math.max(1, plan.samples());
        for (RunRecord r : records) {
            double x0 = plan.valuesAt(r.point())[0];
            for (MemberOutcome m : r.outcome().members()) {
                List<double[]> list = points.get(m.fate());
                if (list == null || m.atGyr() == null) {
                    continue;
                }
                int f = order.indexOf(m.fate());
                double jitter = ((r.sample() + 0.5) / samples - 0.5) * 0.12;
                list.add(new double[] {x0 + step * ((f - 1.5) * 0.14 + jitter), m.atGyr()});
            }
        }
        boolean any = false;
        for (Map.Entry<String, List<double[]>> e : points.entrySet()) {
            if (e.getValue().isEmpty()) {
                continue;
            }
            any = true;
            double[] xs = e.getValue().stream().mapToDouble(p -> p[0]).toArray();
            double[] ys = e.getValue().stream().mapToDouble(p -> p[1]).toArray();
            XYSeries s = chart.addSeries(e.getKey() + " (" + xs.length + ")", xs, ys);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            Color c = FATE_COLOURS.get(e.getKey());
            s.setMarkerColor(new Color(c.getRed(), c.getGreen(), c.getBlue(), 170));
            s.setMarker(SeriesMarkers.CIRCLE);
        }
        if (!any) {
            double[] xs = axis.values().stream().mapToDouble(Double::doubleValue).toArray();
            XYSeries s = chart.addSeries("no member merged or left in any run", xs, new double[xs.length]);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarkerColor(ChartPalette.GUIDE);
            s.setMarker(SeriesMarkers.NONE);
        }
        return chart;
    }

    private static double minStep(Axis a) {
        double m = Double.POSITIVE_INFINITY;
        List<Double> v = new ArrayList<>(a.values());
        v.sort(Double::compare);
        for (int i = 1; i < v.size(); i++) {
            double d = v.get(i) - v.get(i - 1);
            if (d > 0) {
                m = Math.min(m, d);
            }
        }
        return Double.isFinite(m) ? m : 1.0;
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
}
