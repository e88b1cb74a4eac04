package org.holdfast.output;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.holdfast.run.RunEvent;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;

/**
 * The pictures of a run, written into its folder: members' distances with the zero-gravity
 * radius and the events, the energy-budget residual, and the local Hubble diagram at the start
 * and the end.
 */
public final class RunPlots {

    /** File names inside a run folder. */
    public static final String DISTANCES = "distances.png";
    public static final String ENERGY = "energy.png";
    public static final String HUBBLE = "hubble.png";

    private static final int W = 1100;
    private static final int H = 650;
    /** About the plot area of a W x H chart with its legend outside (a little less, to be safe). */
    private static final double PLOT_W = W - 380;
    private static final double PLOT_H = H - 110;
    /** Shortest segment of a dashed line: more than one dash and gap. */
    private static final double DASH_MIN_PX = 1.2 * Charts.DASH_PERIOD_PX;

    private RunPlots() {
    }

    /** Writes all three pictures. */
    public static void write(Path runDir, RunRecorder rec, List<RunEvent> events, String title) {
        distances(runDir.resolve(DISTANCES), rec, events, title);
        energy(runDir.resolve(ENERGY), rec, title);
        hubble(runDir.resolve(HUBBLE), rec, title);
    }

    static void distances(Path file, RunRecorder rec, List<RunEvent> events, String title) {
        XYChart c = Charts.lines(title + ": distance from the group centre", "time from today [Gyr]",
                "distance [kpc]", W, H);
        double[] t = rec.times();
        int colour = 0;
        double max = 0;
        double min = Double.POSITIVE_INFINITY;
        for (double[] d : rec.distancesKpc().values()) {
            for (double v : d) {
                if (v > max) {
                    max = v;
                }
                if (v > 0 && v < min) {
                    min = v;
                }
            }
        }
        // A member far away squashes the bound ones into the axis: then plot on a log scale,
        // with distances below 1 kpc (a body at the centre) drawn at 1 kpc.
        boolean log = max > 50 * Math.max(min, 1);
        c.getStyler().setYAxisLogarithmic(log);
        if (log) {
            c.setYAxisTitle("distance [kpc] (log; under 1 kpc drawn at 1)");
        }
        double[] zg = rec.zeroGravityKpc();
        double[] zgShown = capped(zg, 5 * Math.max(max, 1));
        double yHi = Math.max(max, maxFinite(zgShown));
        double yLo = log ? Math.min(1.0, Math.max(minFinite(zgShown), 1e-3)) : 0;
        double tSpan = t.length == 0 ? 1 : Math.max(t[t.length - 1] - t[0], 1e-9);
        for (Map.Entry<String, double[]> e : rec.distancesKpc().entrySet()) {
            double[] d = log ? atLeast(e.getValue(), 1.0) : e.getValue();
            if (colour >= ChartPalette.size()) {
                // dashed, so thinned: XChart restarts the dashes on every segment
                double[][] thin = Charts.thinForDashes(t, d, tSpan, yLo, yHi, log, PLOT_W, PLOT_H, DASH_MIN_PX);
                Charts.line(c, e.getKey(), thin[0], thin[1], colour).setLineStyle(
                        new java.awt.BasicStroke(2.2f, java.awt.BasicStroke.CAP_BUTT,
                        java.awt.BasicStroke.JOIN_MITER, 10f, new float[] {9f, 4f}, 0f));
            } else {
                Charts.line(c, e.getKey(), t, d, colour);
            }
            colour++;
        }
        if (hasFinite(zg)) {
            double[][] thin = Charts.thinForDashes(t, zgShown, tSpan, yLo, yHi, log, PLOT_W, PLOT_H, DASH_MIN_PX);
            Charts.guide(c, "zero-gravity radius of the main group", thin[0], thin[1]);
        }
        // Each event: a line marked with its number at the top, and a note beneath the chart.
        // Numbers of events close in time are stacked in a few rows so that they stay readable.
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < events.size(); i++) {
            RunEvent ev = events.get(i);
            c.addAnnotation(new AnnotationLine(ev.tGyr(), true, false));
            int row = i % 4;
            double y = log ? max * Math.pow(0.75, row) : max * (0.97 - 0.05 * row);
            c.addAnnotation(new AnnotationText(Integer.toString(i + 1), ev.tGyr(), y, false));
            notes.add(String.format(java.util.Locale.ROOT, "%d   t = %.1f Gyr   %s: %s", i + 1, ev.tGyr(), ev.type().key(),
                    String.join(", ", ev.members())));
        }
        Charts.savePng(c, notes, file);
    }

    static void energy(Path file, RunRecorder rec, String title) {
        XYChart c = Charts.lines(title + ": energy budget", "time from today [Gyr]",
                "relative residual of the energy budget", W, H);
        double[] r = rec.residuals();
        double[] t = rec.times();
        List<double[]> kept = positive(t, r);
        if (kept.get(0).length >= 2) {
            c.getStyler().setYAxisLogarithmic(true);
            Charts.line(c, "|residual|", kept.get(0), kept.get(1), 0);
        } else {
            Charts.line(c, "residual", t, r, 0);
        }
        Charts.savePng(c, file);
    }

    static void hubble(Path file, RunRecorder rec, String title) {
        XYChart start = hubblePanel(title + ": local Hubble diagram today", rec.startDiagram());
        XYChart end = hubblePanel(String.format(java.util.Locale.ROOT, "... and at t = %.1f Gyr",
                rec.endDiagram().tGyr()), rec.endDiagram());
        Charts.savePng(file, start, end);
    }

    /** One time's diagram: flow tracers, members, the zero line and the zero-velocity radius. */
    private static XYChart hubblePanel(String title, RunRecorder.HubbleDiagram d) {
        XYChart c = Charts.lines(title, "distance from the group centre [kpc]", "radial velocity [km/s]", W * 3 / 4, H);
        if (d.flowR().length > 0) {
            Charts.points(c, "flow tracers", d.flowR(), d.flowVr(), 1, 3);
        }
        Charts.points(c, "members", d.memberR(), d.memberVr(), 5, 6);
        double r0 = zeroVelocityRadius(d.flowR(), d.flowVr());
        if (!Double.isNaN(r0)) {
            // a dashed vertical guide named in the legend, so that no label sits on the ticks
            double lo = Math.min(minFinite(d.flowVr()), minFinite(d.memberVr()));
            double hi = Math.max(maxFinite(d.flowVr()), maxFinite(d.memberVr()));
            Charts.guide(c, String.format(java.util.Locale.ROOT, "zero-velocity radius, %.0f kpc", r0),
                    new double[] {r0, r0}, new double[] {lo, hi});
        }
        double vLo = Math.min(minFinite(d.flowVr()), minFinite(d.memberVr()));
        double vHi = Math.max(maxFinite(d.flowVr()), maxFinite(d.memberVr()));
        if (Double.isFinite(vLo) && vHi - vLo <= 1e-9 * Math.max(1, Math.abs(vHi))) {
            // all at one speed (a circular orbit seen from its centre): give the axis a height
            double pad = Math.max(1.0, 0.1 * Math.abs(vHi));
            c.getStyler().setYAxisMin(vLo - pad);
            c.getStyler().setYAxisMax(vHi + pad);
        }
        c.addAnnotation(new AnnotationLine(0, false, false));
        return c;
    }

    /**
     * The radius where the flow's radial velocity changes sign: the smallest distance beyond
     * which every flow tracer recedes, from sorted samples (common practice: the turnaround
     * radius read off a Hubble diagram). NaN when there is no infall or no recession.
     */
    static double zeroVelocityRadius(double[] r, double[] vr) {
        if (r.length == 0) {
            return Double.NaN;
        }
        double lastInfall = Double.NaN;
        for (int i = 0; i < r.length; i++) {
            if (vr[i] < 0 && !(r[i] <= lastInfall)) {
                lastInfall = r[i];
            }
        }
        if (Double.isNaN(lastInfall)) {
            return Double.NaN;
        }
        double firstBeyond = Double.POSITIVE_INFINITY;
        for (int i = 0; i < r.length; i++) {
            if (r[i] > lastInfall && r[i] < firstBeyond) {
                firstBeyond = r[i];
            }
        }
        return Double.isInfinite(firstBeyond) ? Double.NaN : 0.5 * (lastInfall + firstBeyond);
    }

    private static double maxFinite(double[] a) {
        double m = Double.NEGATIVE_INFINITY;
        for (double v : a) {
            if (Double.isFinite(v) && v > m) {
                m = v;
            }
        }
        return m;
    }

    private static double minFinite(double[] a) {
        double m = Double.POSITIVE_INFINITY;
        for (double v : a) {
            if (Double.isFinite(v) && v < m) {
                m = v;
            }
        }
        return m;
    }

    private static double[] atLeast(double[] a, double floor) {
        double[] out = a.clone();
        for (int i = 0; i < out.length; i++) {
            if (out[i] < floor) {
                out[i] = floor;
            }
        }
        return out;
    }

    private static boolean hasFinite(double[] a) {
        for (double v : a) {
            if (Double.isFinite(v)) {
                return true;
            }
        }
        return false;
    }

    private static double[] capped(double[] a, double cap) {
        double[] out = a.clone();
        for (int i = 0; i < out.length; i++) {
            if (out[i] > cap) {
                out[i] = Double.NaN;
            }
        }
        return out;
    }

    private static List<double[]> positive(double[] t, double[] r) {
        List<Double> tt = new ArrayList<>();
        List<Double> rr = new ArrayList<>();
        for (int i = 0; i < r.length; i++) {
            if (r[i] > 0 && Double.isFinite(r[i])) {
                tt.add(t[i]);
                rr.add(Math.abs(r[i]));
            }
        }
        return List.of(tt.stream().mapToDouble(Double::doubleValue).toArray(),
                rr.stream().mapToDouble(Double::doubleValue).toArray());
    }
}
