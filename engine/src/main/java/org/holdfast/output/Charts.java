package org.holdfast.output;

import java.awt.BasicStroke;
import java.awt.Font;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.BitmapEncoder.BitmapFormat;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler.LegendPosition;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts in holdfast's own look (XChart, headless): paper background, ink text, light grid,
 * the {@link Palette} for series. Every chart the project draws starts here.
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
        s.setChartBackgroundColor(Palette.PAPER);
        s.setPlotBackgroundColor(Palette.PAPER);
        s.setPlotBorderVisible(false);
        s.setPlotGridLinesColor(Palette.GRID);
        s.setChartFontColor(Palette.INK);
        s.setAxisTickLabelsColor(Palette.INK);
        s.setChartTitleFont(TITLE);
        s.setAxisTitleFont(AXIS);
        s.setAxisTickLabelsFont(TICKS);
        s.setLegendFont(TICKS);
        s.setLegendBackgroundColor(Palette.PAPER);
        s.setLegendBorderColor(Palette.GRID);
        s.setLegendPosition(LegendPosition.OutsideE);
        s.setMarkerSize(0);
        s.setAntiAlias(true);
        s.setChartTitleBoxVisible(false);
        s.setAnnotationTextFont(TICKS);
        s.setAnnotationTextFontColor(Palette.INK);
        s.setAnnotationLineColor(Palette.GUIDE);
        return chart;
    }

    /** Adds a solid line in member colour i. */
    public static XYSeries line(XYChart chart, String name, double[] x, double[] y, int colour) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(Palette.member(colour));
        s.setLineStyle(new BasicStroke(2.2f));
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** Adds a dashed grey guide line. */
    public static XYSeries guide(XYChart chart, String name, double[] x, double[] y) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(Palette.GUIDE);
        s.setLineStyle(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {7f, 5f}, 0f));
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** Adds points (no line) in member colour i. */
    public static XYSeries points(XYChart chart, String name, double[] x, double[] y, int colour, int size) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarkerColor(Palette.member(colour));
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
            parts[i] = BitmapEncoder.getBufferedImage(charts[i]);
            w += parts[i].getWidth();
            h = Math.max(h, parts[i].getHeight());
        }
        java.awt.image.BufferedImage all = new java.awt.image.BufferedImage(w, h, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = all.createGraphics();
        g.setColor(Palette.PAPER);
        g.fillRect(0, 0, w, h);
        int x = 0;
        for (java.awt.image.BufferedImage p : parts) {
            g.drawImage(p, x, 0, null);
            x += p.getWidth();
        }
        g.dispose();
        try {
            Path dir = file.toAbsolutePath().getParent();
            Files.createDirectories(dir);
            Path tmp = dir.resolve(file.getFileName() + ".part");
            javax.imageio.ImageIO.write(all, "png", tmp.toFile());
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    /** Writes the chart as PNG, to a temporary name first. */
    public static void savePng(XYChart chart, Path file) {
        Path dir = file.toAbsolutePath().getParent();
        String stem = file.getFileName().toString().replaceFirst("\\.png$", "");
        Path part = dir.resolve(stem + ".part.png");
        try {
            Files.createDirectories(dir);
            BitmapEncoder.saveBitmap(chart, dir.resolve(stem + ".part").toString(), BitmapFormat.PNG);
            Files.move(part, file, StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException | RuntimeException e) {
            try {
                Files.deleteIfExists(part);
            } catch (IOException ignored) {
                // the first failure is the one to report
            }
            if (e instanceof IOException io) {
                throw new UncheckedIOException("cannot write " + file, io);
            }
            throw (RuntimeException) e;
        }
    }
}
