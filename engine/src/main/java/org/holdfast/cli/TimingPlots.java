package org.holdfast.cli;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.output.Charts;
import org.holdfast.weighing.Background;
import org.holdfast.weighing.DarkEnergyBound;
import org.holdfast.weighing.FlowData;
import org.holdfast.weighing.FlowFit;
import org.holdfast.weighing.MassDraws;
import org.holdfast.weighing.PairMotion;
import org.holdfast.weighing.PairOrbit;
import org.holdfast.weighing.TimingSolver;
import org.knowm.xchart.XYChart;

/** The pictures of a weighing, drawn with the project's charts. */
final class TimingPlots {

    private TimingPlots() {
    }

    /** Histograms of the draws' masses, one line per background, 40 bins over the 0.5-99.5% range. */
    static void histogram(MassDraws.Draw[] draws, Path file) {
        XYChart c = Charts.lines("Timing mass of " + draws.length + " draws", "mass (10^12 Msun)", "draws per bin", 900, 560);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Background b : Background.values()) {
            double[] v = Arrays.stream(MassDraws.masses(draws, b)).filter(Double::isFinite).sorted().toArray();
            if (v.length > 0) {
                lo = Math.min(lo, v[(int) (0.005 * (v.length - 1))]);
                hi = Math.max(hi, v[(int) Math.ceil(0.995 * (v.length - 1))]);
            }
        }
        if (!(hi > lo)) {
            hi = lo * 1.01 + 1;
        }
        int bins = 40;
        double width = (hi - lo) / bins;
        for (Background b : Background.values()) {
            double[] v = MassDraws.masses(draws, b);
            int[] count = new int[bins];
            int n = 0;
            for (double x : v) {
                if (Double.isFinite(x) && x >= lo && x <= hi) {
                    count[Math.min(bins - 1, (int) ((x - lo) / width))]++;
                    n++;
                }
            }
            if (n == 0) {
                continue;
            }
            double[] xs = new double[2 * bins];
            double[] ys = new double[2 * bins];
            for (int k = 0; k < bins; k++) {
                xs[2 * k] = (lo + k * width) / 1e12;
                xs[2 * k + 1] = (lo + (k + 1) * width) / 1e12;
                ys[2 * k] = count[k];
                ys[2 * k + 1] = count[k];
            }
            Charts.line(c, b.label(), xs, ys, b.ordinal());
        }
        Charts.savePng(c, file);
    }

    /** The relative orbit in its plane, today's position on the +x axis, from the Big Bang to a Kepler period ahead. */
    static void orbits(PairMotion p, ExpansionTable table, Map<Background, TimingSolver.Weighing> found, Path file) {
        XYChart c = Charts.lines("Relative orbit of the pair", "x (kpc)", "y (kpc)", 940, 640);
        for (Map.Entry<Background, TimingSolver.Weighing> e : found.entrySet()) {
            Background b = e.getKey();
            PairOrbit orbit = TimingSolver.orbit(p, e.getValue().massMsun(), TimingReport.field(b, table));
            PairOrbit.Path back = new PairOrbit.Path();
            orbit.back(-p.ageGyr() * (1 + 1e-9), back);
            double ahead = Double.isFinite(e.getValue().periodGyr()) ? Math.min(e.getValue().periodGyr(), 40) : 10;
            if (table != null) {
                ahead = Math.min(ahead, table.latestGyr() * 0.99);
            }
            PairOrbit.Path fwd = new PairOrbit.Path();
            orbit.forward(ahead, fwd);
            List<double[]> pts = new java.util.ArrayList<>(back.points());
            java.util.Collections.reverse(pts);
            pts.addAll(fwd.points());
            double[] x = new double[pts.size()];
            double[] y = new double[pts.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = pts.get(i)[1] * Math.cos(pts.get(i)[2]);
                y[i] = pts.get(i)[1] * Math.sin(pts.get(i)[2]);
            }
            Charts.line(c, b.label(), x, y, b.ordinal());
        }
        Charts.points(c, "today", new double[] {p.separationKpc()}, new double[] {0}, 5, 8);
        equalScales(c);
        Charts.savePng(c, file);
    }

    /** The same kpc per pixel on both axes (roughly: the plot area is about square). */
    private static void equalScales(XYChart c) {
        double xl = Double.POSITIVE_INFINITY;
        double xh = Double.NEGATIVE_INFINITY;
        double yl = Double.POSITIVE_INFINITY;
        double yh = Double.NEGATIVE_INFINITY;
        for (var s : c.getSeriesMap().values()) {
            for (double v : s.getXData()) {
                xl = Math.min(xl, v);
                xh = Math.max(xh, v);
            }
            for (double v : s.getYData()) {
                yl = Math.min(yl, v);
                yh = Math.max(yh, v);
            }
        }
        double half = 0.55 * Math.max(xh - xl, yh - yl);
        double xm = 0.5 * (xl + xh);
        double ym = 0.5 * (yl + yh);
        c.getStyler().setXAxisMin(xm - half).setXAxisMax(xm + half).setYAxisMin(ym - half).setYAxisMax(ym + half);
    }

    /** The relative likelihood of the strength of dark energy. */
    static void bound(DarkEnergyBound.Result b, String parameter, Path file) {
        XYChart c = Charts.lines("Dark energy against the independent mass", parameter, "relative likelihood", 900, 560);
        Charts.line(c, "likelihood", b.ratio(), b.likelihood(), 0);
        Charts.guide(c, "95% upper bound", new double[] {b.upper95(), b.upper95()}, new double[] {0, 1});
        if (parameter.startsWith("w")) {
            Charts.guide(c, "95% lower bound", new double[] {b.lower95(), b.lower95()}, new double[] {0, 1});
        }
        Charts.savePng(c, file);
    }

    /** The galaxies and the fitted velocity-distance relation. */
    static void flow(FlowData d, FlowFit.Result fit, Path file) {
        XYChart c = Charts.lines("Velocity-distance relation around the group", "distance (kpc)", "radial velocity (km/s)",
                900, 600);
        double lo = Arrays.stream(d.distanceKpc()).min().orElse(1);
        double hi = Arrays.stream(d.distanceKpc()).max().orElse(2);
        int n = 200;
        double[] x = new double[n];
        double[] y = new double[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            double r = lo * 0.9 + (hi * 1.1 - lo * 0.9) * i / (n - 1);
            if (fit.bestModel().curve().covers(r, fit.bestMassMsun())) {
                x[k] = r;
                y[k] = fit.bestModel().curve().velocityKms(r, fit.bestMassMsun());
                k++;
            }
        }
        var pts = Charts.points(c, "galaxies", d.distanceKpc(), d.velocityKms(), 1, 7);
        // the velocity errors as bars (the distance errors enter the fit through the slope)
        c.removeSeries(pts.getName());
        var withBars = c.addSeries("galaxies (velocity errors)", d.distanceKpc(), d.velocityKms(), d.velocityErrKms());
        withBars.setXYSeriesRenderStyle(org.knowm.xchart.XYSeries.XYSeriesRenderStyle.Scatter);
        withBars.setMarker(pts.getMarker());
        withBars.setMarkerColor(pts.getMarkerColor());
        c.getStyler().setErrorBarsColorSeriesColor(true);
        Charts.line(c, String.format(java.util.Locale.ROOT, "best fit, M = %.3g Msun", fit.bestMassMsun()),
                Arrays.copyOf(x, k), Arrays.copyOf(y, k), 0);
        double r0 = fit.bestModel().curve().zeroVelocityKpc(fit.bestMassMsun());
        if (Double.isFinite(r0)) {
            Charts.guide(c, "zero-velocity radius", new double[] {r0, r0},
                    new double[] {Arrays.stream(d.velocityKms()).min().orElse(-100), Arrays.stream(d.velocityKms()).max().orElse(100)});
        }
        Charts.savePng(c, file);
    }
}
