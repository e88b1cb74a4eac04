package org.holdfast.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.GraphicsEnvironment;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * Draws the text and marks over a finished frame with Java2D (headless). The look: a condensed
 * sans-serif in warm paper white with a soft dark shadow, secondary figures in slate grey, fate
 * events in a pale gold, galaxy names in their own palette colour, placed so that they do not
 * overlap ({@link LabelPlacer}). On flat and panorama frames
 * the clock sits at the lower left, events at the upper left and the scale bar at the lower
 * right; on a dome everything is centred inside the disc, the clock near the lower rim and
 * events near the upper rim, where a seated audience looks.
 */
final class OverlayPainter {

    private static final Color PAPER = new Color(0xEDE6D6);
    /** The second clock line: cool and light, well clear of the sky (it was a dim slate). */
    private static final Color SLATE = new Color(0xC8D0DE);
    private static final Color GOLD = new Color(0xF6D58E);
    private static final Color SHADOW = new Color(0, 0, 0, 170);
    private static final int MAX_EVENTS = 4;

    private final Set<Overlay> overlays;
    private final boolean dome;
    private final Font large;
    private final Font small;
    private final LabelPlacer labels = new LabelPlacer();
    private int[] labelWidth = new int[0];
    private int[] labelXY = new int[0];
    private boolean[] labelPlaced = new boolean[0];

    /** Where dome text sits: radii from the centre as fractions of the disc's radius (below: +). */
    private final double clockRadius;
    private final double eventsRadius;

    OverlayPainter(Set<Overlay> overlays, boolean dome, int height) {
        this(overlays, dome, height, Double.NaN, false);
    }

    /**
     * @param domeTextPx on a dome, the clock's first line in pixels (NaN: from the height)
     * @param concentric on a dome, text round the zenith rather than in the front sweet spot
     */
    OverlayPainter(Set<Overlay> overlays, boolean dome, int height, double domeTextPx, boolean concentric) {
        this.overlays = overlays;
        this.dome = dome;
        String family = pickFamily();
        boolean sized = dome && Double.isFinite(domeTextPx);
        int size = sized ? (int) Math.round(domeTextPx) : Math.max(11, Math.round(height / 34f));
        this.large = new Font(family, Font.PLAIN, size);
        // the second line and the events: 0.8 of the first, never below 12 px
        this.small = new Font(family, Font.PLAIN, Math.max(12, Math.round(size * (sized ? 0.8f : 0.72f))));
        // unidirectional: the clock about 25 degrees and the events 40-50 degrees above the front
        // horizon of a 180-degree dome, where a seated audience looks (common practice); the
        // older default put events near the upper rim, behind the audience. Concentric: both
        // round the zenith, which every seat faces equally.
        this.clockRadius = !sized ? 0.72 : concentric ? 0.16 : 0.72;
        this.eventsRadius = !sized ? -0.68 : concentric ? -0.10 : 0.42;
    }

    private static String pickFamily() {
        try {
            String[] names = GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames();
            if (Arrays.asList(names).contains("DejaVu Sans Condensed")) {
                return "DejaVu Sans Condensed";
            }
        } catch (RuntimeException | Error e) {
            // no font configuration at all: fall back to the logical font
        }
        return Font.SANS_SERIF;
    }

    boolean any() {
        return !overlays.isEmpty();
    }

    /**
     * @param galaxyPx projected galaxy centres (x, y pairs), NaN where not in view
     * @param kpcPerPx size of a pixel at the group's distance, or NaN when no scale bar applies
     */
    void paint(BufferedImage image, SceneFrame scene, double[] galaxyPx, double kpcPerPx) {
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            int w = image.getWidth();
            int h = image.getHeight();
            int margin = Math.max(6, h / 30);
            if (overlays.contains(Overlay.NAMES)) {
                paintNames(g, scene, galaxyPx, w, h);
            }
            paintClock(g, scene, w, h, margin);
            if (overlays.contains(Overlay.EVENTS)) {
                paintEvents(g, scene, w, h, margin);
            }
            if (overlays.contains(Overlay.SCALE_BAR) && Double.isFinite(kpcPerPx) && kpcPerPx > 0) {
                paintScaleBar(g, kpcPerPx, w, h, margin);
            }
        } finally {
            g.dispose();
        }
    }

    /**
     * Names beside their galaxies, placed by {@link LabelPlacer} in the scene's order of galaxies
     * (the run's order of members), so that they never overlap; a name with no free spot is left
     * out.
     */
    private void paintNames(Graphics2D g, SceneFrame scene, double[] px, int w, int h) {
        g.setFont(small);
        FontMetrics fm = g.getFontMetrics(small);
        int gap = Math.max(4, small.getSize() / 2);
        int n = scene.galaxyCount();
        if (labelWidth.length < n) {
            labelWidth = new int[n];
            labelXY = new int[2 * n];
            labelPlaced = new boolean[n];
        }
        for (int i = 0; i < n; i++) {
            labelWidth[i] = fm.stringWidth(scene.name(i)) + 1; // + 1: the shadow
        }
        labels.place(n, px, labelWidth, fm.getAscent(), fm.getDescent() + 1, gap, w, h, labelXY, labelPlaced);
        for (int i = 0; i < n; i++) {
            if (labelPlaced[i]) {
                text(g, scene.name(i), labelXY[2 * i], labelXY[2 * i + 1], new Color(Palette.rgb(scene.colourIndex(i))));
            }
        }
    }

    private void paintClock(Graphics2D g, SceneFrame scene, int w, int h, int margin) {
        boolean clock = overlays.contains(Overlay.CLOCK);
        boolean factor = overlays.contains(Overlay.SCALE_FACTOR);
        if (!clock && !factor) {
            return;
        }
        FontMetrics fl = g.getFontMetrics(large);
        FontMetrics fs = g.getFontMetrics(small);
        String second = clock && factor ? ClockText.gyr(scene.tGyr()) + "   " + ClockText.scaleFactor(scene.scaleFactor())
                : clock ? ClockText.gyr(scene.tGyr()) : ClockText.scaleFactor(scene.scaleFactor());
        int y2 = dome ? (int) (h * (0.5 + 0.5 * clockRadius)) : h - margin;
        int y1 = y2 - fs.getHeight();
        if (clock) {
            String first = ClockText.headline(scene.tGyr(), scene.ripGyr());
            g.setFont(large);
            text(g, first, dome ? (w - fl.stringWidth(first)) / 2 : margin, y1, PAPER);
        }
        g.setFont(small);
        text(g, second, dome ? (w - fs.stringWidth(second)) / 2 : margin, y2, SLATE);
    }

    private void paintEvents(Graphics2D g, SceneFrame scene, int w, int h, int margin) {
        List<FateEvent> events = scene.events();
        int last = events.size();
        while (last > 0 && events.get(last - 1).tGyr() > scene.tGyr()) {
            last--;
        }
        int first = Math.max(0, last - MAX_EVENTS);
        g.setFont(small);
        FontMetrics fs = g.getFontMetrics(small);
        int lines = Math.min(MAX_EVENTS, last - first);
        int y = !dome ? margin + fs.getAscent()
                : eventsRadius < 0 ? (int) (h * (0.5 + 0.5 * eventsRadius)) - (lines - 1) * fs.getHeight()
                : (int) (h * (0.5 + 0.5 * eventsRadius));
        for (int k = first; k < last; k++) {
            FateEvent e = events.get(k);
            String line = e.describe() + "  \u00b7  at " + ClockText.gyrShort(e.tGyr());
            Color c = k == last - 1 ? GOLD : GOLD.darker();
            text(g, line, dome ? (w - fs.stringWidth(line)) / 2 : margin, y, c);
            y += fs.getHeight();
        }
        List<String> notes = scene.notes();
        for (int k = Math.max(0, notes.size() - 2); k < notes.size(); k++) {
            String line = notes.get(k);
            text(g, line, dome ? (w - fs.stringWidth(line)) / 2 : margin, y, k == notes.size() - 1 ? PAPER : SLATE);
            y += fs.getHeight();
        }
    }

    private void paintScaleBar(Graphics2D g, double kpcPerPx, int w, int h, int margin) {
        double lengthKpc = ClockText.roundLength(0.18 * w * kpcPerPx);
        int len = (int) Math.round(lengthKpc / kpcPerPx);
        int x1 = w - margin;
        int x0 = x1 - len;
        int y = h - margin;
        int tick = Math.max(3, h / 120);
        g.setStroke(new BasicStroke(Math.max(1f, h / 540f)));
        g.setColor(SHADOW);
        g.drawLine(x0 + 1, y + 1, x1 + 1, y + 1);
        g.setColor(PAPER);
        g.drawLine(x0, y, x1, y);
        g.drawLine(x0, y - tick, x0, y + tick);
        g.drawLine(x1, y - tick, x1, y + tick);
        g.setFont(small);
        String label = ClockText.length(lengthKpc);
        int tw = g.getFontMetrics(small).stringWidth(label);
        text(g, label, x0 + (len - tw) / 2, y - tick - 3, PAPER);
    }

    private static void text(Graphics2D g, String s, int x, int y, Color c) {
        g.setColor(SHADOW);
        g.drawString(s, x + 1, y + 1);
        g.setColor(c);
        g.drawString(s, x, y);
    }
}
