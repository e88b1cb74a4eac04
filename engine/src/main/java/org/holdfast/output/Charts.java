package org.holdfast.output;

import java.awt.BasicStroke;
import java.awt.Font;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler.LegendPosition;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts in holdfast's own look (XChart, headless): paper background, ink text, light grid,
 * the {@link ChartPalette} for series. Every chart the project draws starts here.
 */
public final class Charts {

    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 17);
    private static final Font AXIS = new Font(Font.SANS_SERIF, Font.PLAIN, 14);
    private static final Font TICKS = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    private Charts() {
    }

    /** A new line chart with labelled axes (units in the titles). */
    public static XYChart lines(String title, String xTitle, String yTitle, int width, int height) {
        XYChart chart = new XYChartBuilder().width(width).height(height).title(title)
                .xAxisTitle(xTitle).yAxisTitle(yTitle).build();
        var s = chart.getStyler();
        s.setChartBackgroundColor(ChartPalette.PAPER);
        s.setPlotBackgroundColor(ChartPalette.PAPER);
        s.setPlotBorderVisible(false);
        s.setPlotGridLinesColor(ChartPalette.GRID);
        s.setChartFontColor(ChartPalette.INK);
        s.setAxisTickLabelsColor(ChartPalette.INK);
        s.setChartTitleFont(TITLE);
        s.setAxisTitleFont(AXIS);
        s.setAxisTickLabelsFont(TICKS);
        s.setLegendFont(TICKS);
        s.setLegendBackgroundColor(ChartPalette.PAPER);
        s.setLegendBorderColor(ChartPalette.GRID);
        s.setLegendPosition(LegendPosition.OutsideE);
        s.setMarkerSize(0);
        s.setAntiAlias(true);
        s.setChartTitleBoxVisible(false);
        s.setAnnotationTextFont(TICKS);
        s.setAnnotationTextFontColor(ChartPalette.INK);
        s.setAnnotationLineColor(ChartPalette.GUIDE);
        return chart;
    }

    /**
     * Readable tick labels on the linear axes ({@link #tickLabel}); a logarithmic axis keeps
     * XChart's own labels, which sit on its powers of ten. Called when a chart is saved, once
     * its axes are settled.
     */
    static void labelTicks(XYChart chart) {
        var s = chart.getStyler();
        s.setxAxisTickLabelsFormattingFunction(s.isXAxisLogarithmic() ? null : Charts::tickLabel);
        s.setyAxisTickLabelsFormattingFunction(s.isYAxisLogarithmic() ? null : Charts::tickLabel);
    }

    /**
     * A tick label a reader can take in at a glance: plain digits with thousands separators up
     * to 10^5 (at most three decimals), a power of ten beyond, "1.9 x 10^14" written with a
     * superscript exponent.
     */
    public static String tickLabel(double v) {
        double a = Math.abs(v);
        if (a == 0) {
            return "0";
        }
        if (a < 1e5 && a >= 1e-3) {
            java.text.DecimalFormat f = new java.text.DecimalFormat("#,##0.###",
                    java.text.DecimalFormatSymbols.getInstance(java.util.Locale.ROOT));
            return f.format(v);
        }
        int e = (int) Math.floor(Math.log10(a));
        double m = v / Math.pow(10, e);
        if (Math.abs(m) >= 9.95) {
            m /= 10;
            e++;
        }
        String mantissa = String.format(java.util.Locale.ROOT, "%.1f", m).replace(".0", "");
        return (mantissa.equals("1") ? "" : mantissa.equals("-1") ? "-" : mantissa + "\u00d7") + "10" + superscript(e);
    }

    private static String superscript(int e) {
        String digits = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
        StringBuilder sb = new StringBuilder();
        for (char c : Integer.toString(e).toCharArray()) {
            sb.append(c == '-' ? '\u207b' : digits.charAt(c - '0'));
        }
        return sb.toString();
    }

    /**
     * Thins a series that is to be drawn dashed. XChart draws a series segment by segment and
     * starts the dash pattern again on each, so a curve of many short segments comes out solid
     * while its legend shows dashes; keeping only points at least {@code minPx} apart on the
     * screen (a whole dash and gap) makes the line dashed as well. NaN (a gap) is kept.
     *
     * @param xSpan the x axis range shown, in data units
     * @param yLo the lower end of the y axis shown (> 0 on a log axis)
     * @param yHi the upper end
     * @param plotW the plot area's width in pixels (about)
     * @param plotH its height
     * @return {x, y}
     */
    public static double[][] thinForDashes(double[] x, double[] y, double xSpan, double yLo, double yHi, boolean logY,
            double plotW, double plotH, double minPx) {
        double ySpan = logY ? Math.log10(yHi) - Math.log10(yLo) : yHi - yLo;
        java.util.List<double[]> kept = new java.util.ArrayList<>();
        double lastPx = Double.NaN;
        double lastPy = Double.NaN;
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(y[i])) {
                kept.add(new double[] {x[i], Double.NaN});
                lastPx = Double.NaN;
                continue;
            }
            double px = x[i] / xSpan * plotW;
            double py = (logY ? Math.log10(y[i]) : y[i]) / ySpan * plotH;
            boolean last = i == x.length - 1 || !Double.isFinite(y[i + 1]);
            if (Double.isNaN(lastPx) || Math.hypot(px - lastPx, py - lastPy) >= minPx || last) {
                kept.add(new double[] {x[i], y[i]});
                lastPx = px;
                lastPy = py;
            }
        }
        double[][] out = new double[2][kept.size()];
        for (int i = 0; i < kept.size(); i++) {
            out[0][i] = kept.get(i)[0];
            out[1][i] = kept.get(i)[1];
        }
        return out;
    }

    /** The length of one dash and gap of the dashed strokes, in pixels. */
    public static final float DASH_PERIOD_PX = 12f;

    /** Adds a solid line in member colour i. */
    public static XYSeries line(XYChart chart, String name, double[] x, double[] y, int colour) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(ChartPalette.member(colour));
        s.setLineStyle(new BasicStroke(2.2f));
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** Adds a dashed grey guide line. */
    public static XYSeries guide(XYChart chart, String name, double[] x, double[] y) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(ChartPalette.GUIDE);
        s.setLineStyle(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {7f, 5f}, 0f));
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** Adds points (no line) in member colour i. */
    public static XYSeries points(XYChart chart, String name, double[] x, double[] y, int colour, int size) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarkerColor(ChartPalette.member(colour));
        s.setMarker(SeriesMarkers.CIRCLE);
        chart.getStyler().setMarkerSize(size);
        return s;
    }

    /** Writes several charts side by side as one PNG, to a temporary name first. */
    public static void savePng(Path file, XYChart... charts) {
        int w = 0;
        int h = 0;
        java.awt.image.BufferedImage[] parts = new java.awt.image.BufferedImage[charts.length];
        for (int i = 0; i < charts.length; i++) {
            labelTicks(charts[i]);
            parts[i] = BitmapEncoder.getBufferedImage(charts[i]);
            w += parts[i].getWidth();
            h = Math.max(h, parts[i].getHeight());
        }
        java.awt.image.BufferedImage all = new java.awt.image.BufferedImage(w, h, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = all.createGraphics();
        g.setColor(ChartPalette.PAPER);
        g.fillRect(0, 0, w, h);
        int x = 0;
        for (java.awt.image.BufferedImage p : parts) {
            g.drawImage(p, x, 0, null);
            x += p.getWidth();
        }
        g.dispose();
        write(all, file);
    }

    /**
     * Writes the chart with numbered notes in columns beneath it (the chart marks each place
     * with its number), so that many long labels never cover the data.
     */
    public static void savePng(XYChart chart, java.util.List<String> notes, Path file) {
        labelTicks(chart);
        java.awt.image.BufferedImage top = BitmapEncoder.getBufferedImage(chart);
        int columns = 3;
        int rowPx = 19;
        int rows = (notes.size() + columns - 1) / columns;
        int pad = notes.isEmpty() ? 0 : 14;
        int w = top.getWidth();
        int h = top.getHeight() + rows * rowPx + 2 * pad;
        java.awt.image.BufferedImage all = new java.awt.image.BufferedImage(w, h, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = all.createGraphics();
        g.setRenderingHint(java.awt.RenderingHints.KEY_TEXT_ANTIALIASING, java.awt.RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(ChartPalette.PAPER);
        g.fillRect(0, 0, w, h);
        g.drawImage(top, 0, 0, null);
        g.setFont(TICKS);
        g.setColor(ChartPalette.INK);
        int columnPx = (w - 2 * 60) / columns;
        for (int i = 0; i < notes.size(); i++) {
            int col = i / Math.max(rows, 1);
            int row = i % Math.max(rows, 1);
            g.drawString(notes.get(i), 60 + col * columnPx, top.getHeight() + pad + (row + 1) * rowPx - 5);
        }
        g.dispose();
        write(all, file);
    }

    /** Writes an image as PNG under a temporary name, then renames it; nothing half-written stays. */
    private static void write(java.awt.image.BufferedImage image, Path file) {
        Path dir = file.toAbsolutePath().getParent();
        Path tmp = dir.resolve(file.getFileName() + ".part");
        try {
            Files.createDirectories(dir);
            javax.imageio.ImageIO.write(image, "png", tmp.toFile());
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException | RuntimeException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the first failure is the one to report
            }
            if (e instanceof IOException io) {
                throw new UncheckedIOException("cannot write " + file, io);
            }
            throw (RuntimeException) e;
        }
    }

    /** Writes the chart as PNG, to a temporary name first. */
    public static void savePng(XYChart chart, Path file) {
        savePng(chart, java.util.List.of(), file);
    }
}
