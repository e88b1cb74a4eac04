package org.holdfast.expansion;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

import javax.imageio.ImageIO;

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
        chart.getStyler().setXAxisDecimalPattern("0.#");
        XYSeries s = chart.addSeries("a(t)", x, y);
        s.setLineColor(CURVE);
        s.setLineStyle(new BasicStroke(2.5f));
        s.setMarker(SeriesMarkers.NONE);
        return chart;
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
        return chart;
    }
}
