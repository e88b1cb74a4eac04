package org.holdfast.expansion;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

import javax.imageio.ImageIO;

import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** Draws a(t) above w(a) into one PNG (XChart, headless). */
public final class ExpansionPlot {

    private static final Color INK = new Color(0x1F, 0x2A, 0x36);
    private static final Color CURVE = new Color(0x0E, 0x7C, 0x86);
    private static final Color EOS = new Color(0xC2, 0x5B, 0x12);
    private static final Color GRID = new Color(0xE3, 0xE7, 0xEB);
    private static final int WIDTH = 900;
    private static final int HEIGHT = 420;
    /** About the width of the plot area inside a chart WIDTH wide (axis labels and margins off). */
    private static final double PLOT_WIDTH_PX = WIDTH - 95;
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 13);

    private ExpansionPlot() {
    }

    /** Writes the plot (to a temporary file first, then moved into place). */
    public static void write(ExpansionTable table, String title, Path png) throws IOException {
        BufferedImage top = BitmapEncoder.getBufferedImage(scaleFactorChart(table, title));
        BufferedImage bottom = BitmapEncoder.getBufferedImage(eosChart(table));
        BufferedImage both = new BufferedImage(WIDTH, 2 * HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = both.createGraphics();
        try {
            g.drawImage(top, 0, 0, null);
            g.drawImage(bottom, 0, HEIGHT, null);
        } finally {
            g.dispose();
        }
        Path dir = png.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".expansion-", ".png");
        try {
            ImageIO.write(both, "png", tmp.toFile());
            Files.move(tmp, png, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    private static XYChart scaleFactorChart(ExpansionTable t, String title) {
        double lo = t.earliestGyr();
        double hi = Math.min(t.latestGyr(), t.ripGyr().isPresent() || t.crunchGyr().isPresent()
                ? t.latestGyr() : Math.max(30.0, 2 * t.ageGyr()));
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        int n = 600;
        for (int i = 0; i <= n; i++) {
            double tt = Math.min(hi, lo + (hi - lo) * i / n);
            double a = t.scaleFactor(tt);
            if (a > 1e6) {
                break;
            }
            x.add(tt);
            y.add(a);
        }
        XYChart chart = style(new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title)
                .xAxisTitle("time t [Gyr from today]").yAxisTitle("scale factor a (1 today, log scale)").build());
        chart.getStyler().setYAxisLogarithmic(true);
        // Round ends, so that the ticks fall on round times and one of them on today.
        double step = tickStep(hi - lo);
        chart.getStyler().setXAxisMin(Math.floor(lo / step) * step);
        chart.getStyler().setXAxisMax(Math.ceil(hi / step) * step);
        chart.getStyler().setXAxisDecimalPattern(step < 1 ? "0.#" : "0");
        XYSeries s = chart.addSeries("a(t)", x, y);
        s.setLineColor(CURVE);
        s.setLineStyle(new BasicStroke(2.5f));
        s.setMarker(SeriesMarkers.NONE);
        double top = y.stream().mapToDouble(Double::doubleValue).max().orElse(1);
        double bottom = y.stream().mapToDouble(Double::doubleValue).min().orElse(1);
        double labelA = Math.pow(10, Math.log10(bottom) + 0.92 * (Math.log10(top) - Math.log10(bottom)));
        double gyrPerPixel = (chart.getStyler().getXAxisMax() - chart.getStyler().getXAxisMin()) / PLOT_WIDTH_PX;
        mark(chart, 0.0, "today", labelA, gyrPerPixel, true);
        if (t.ripGyr().isPresent()) {
            mark(chart, t.ripGyr().getAsDouble(), String.format(java.util.Locale.ROOT,
                    "big rip, %.1f Gyr from today", t.ripGyr().getAsDouble()), labelA, gyrPerPixel, false);
        }
        if (t.crunchGyr().isPresent()) {
            mark(chart, t.crunchGyr().getAsDouble(), String.format(java.util.Locale.ROOT,
                    "big crunch, %.1f Gyr from today", t.crunchGyr().getAsDouble()), labelA, gyrPerPixel, false);
        }
        return chart;
    }

    /**
     * A vertical line at time t with a label beside it (XChart centres a label on its point, so
     * the point is moved by half the label's width, in time units, off the line).
     */
    private static void mark(XYChart chart, double t, String label, double labelA, double gyrPerPixel, boolean right) {
        chart.addAnnotation(new AnnotationLine(t, true, false));
        double halfWidthPx = LABEL.getStringBounds(label, new FontRenderContext(null, true, true)).getWidth() / 2 + 6;
        double x = t + (right ? 1 : -1) * halfWidthPx * gyrPerPixel;
        chart.addAnnotation(new AnnotationText(label, x, labelA, false));
    }

    /** A round tick spacing (1, 2 or 5 times a power of ten) giving at most ten ticks over the span. */
    static double tickStep(double span) {
        double raw = span / 10;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= raw) {
                return m * p;
            }
        }
        return 10 * p;
    }

    private static XYChart eosChart(ExpansionTable t) {
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        double aHi = Math.min(t.scaleFactor(t.expandingUntilGyr()), 100.0);
        double lnLo = Math.log(1e-3);
        double lnHi = Math.log(Math.max(aHi, 2.0));
        DarkEnergyModel de = t.cosmology().darkEnergy();
        int n = 400;
        for (int i = 0; i <= n; i++) {
            double a = Math.exp(lnLo + (lnHi - lnLo) * i / n);
            x.add(a);
            y.add(de.w(a));
        }
        XYChart chart = style(new XYChartBuilder().width(WIDTH).height(HEIGHT)
                .title("dark-energy equation of state w(a)")
                .xAxisTitle("scale factor a (log scale)").yAxisTitle("equation of state w").build());
        chart.getStyler().setXAxisLogarithmic(true);
        double wMin = y.stream().mapToDouble(Double::doubleValue).min().orElse(-1);
        double wMax = y.stream().mapToDouble(Double::doubleValue).max().orElse(-1);
        chart.getStyler().setYAxisMin(wMin - 0.1);
        chart.getStyler().setYAxisMax(wMax + 0.1);
        chart.getStyler().setYAxisDecimalPattern("0.00");
        XYSeries s = chart.addSeries("w(a)", x, y);
        s.setLineColor(EOS);
        s.setLineStyle(new BasicStroke(2.5f));
        s.setMarker(SeriesMarkers.NONE);
        return chart;
    }

    private static XYChart style(XYChart chart) {
        var st = chart.getStyler();
        st.setLegendVisible(false);
        st.setChartBackgroundColor(Color.WHITE);
        st.setPlotBackgroundColor(Color.WHITE);
        st.setPlotGridLinesColor(GRID);
        st.setPlotBorderVisible(false);
        st.setChartFontColor(INK);
        st.setAxisTickLabelsColor(INK);
        st.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
        st.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        st.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        st.setChartTitleBoxVisible(false);
        st.setAnnotationTextFont(LABEL);
        st.setAnnotationTextFontColor(INK);
        st.setAnnotationLineColor(new Color(0x8A, 0x94, 0x9E));
        return chart;
    }
}
