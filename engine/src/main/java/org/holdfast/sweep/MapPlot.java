package org.holdfast.sweep;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.imageio.ImageIO;

import org.holdfast.output.ChartPalette;

/**
 * The two-key map: the fraction of runs with the chosen outcome at every grid point, one cell
 * per point (cells in grid order, labelled with the values), its 50% contour traced by marching
 * squares with linear interpolation between cell centres (common practice), and a ring in every
 * cell whose 95% Wilson interval contains one half, where the grid cannot tell the side.
 */
final class MapPlot {

    /** "Never" to "always": ember, cream, teal. */
    private static final Color[] RAMP = {
        new Color(0xC2, 0x5B, 0x3A), new Color(0xE3, 0xA0, 0x5C), new Color(0xF4, 0xEC, 0xD8),
        new Color(0x86, 0xC2, 0xB6), new Color(0x4A, 0x96, 0x92)
    };

    private static final int W = 1000;
    private static final int H = 760;
    private static final int LEFT = 110;
    private static final int TOP = 70;
    private static final int RIGHT = 170;
    private static final int BOTTOM = 90;

    private MapPlot() {
    }

    /** The fractions, lower and upper ends on the grid, [ix][iy], for the plan's chosen outcome. */
    static double[][][] grid(SweepPlan plan, List<Fractions.Row> rows) {
        int nx = plan.axes().get(0).size();
        int ny = plan.axes().get(1).size();
        double[][][] g = new double[3][nx][ny];
        for (Fractions.Row r : rows) {
            if (chosen(plan, r)) {
                int[] idx = plan.indicesAt(r.point());
                g[0][idx[0]][idx[1]] = r.fraction();
                g[1][idx[0]][idx[1]] = r.low();
                g[2][idx[0]][idx[1]] = r.high();
            }
        }
        return g;
    }

    private static boolean chosen(SweepPlan plan, Fractions.Row r) {
        String o = plan.outcome();
        if (o == null) {
            return r.level().equals("group") && r.outcome().equals("bound");
        }
        if (o.contains("+")) {
            return r.level().equals("pair") && r.name().equals(o);
        }
        return r.level().equals("member") && r.name().equals(o) && r.outcome().equals(MemberOutcome.TOGETHER);
    }

    static String title(SweepPlan plan) {
        String o = plan.outcome();
        if (o == null) {
            return "Fraction of runs in which the group stays bound";
        }
        if (o.contains("+")) {
            return "Fraction of runs in which " + o.replace("+", " and ") + " stay together";
        }
        return "Fraction of runs in which " + o + " ends together with the group";
    }

    static void save(SweepPlan plan, List<Fractions.Row> rows, Path file) throws IOException {
        BufferedImage img = draw(plan, rows);
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ImageIO.write(img, "png", buf);
        Outputs.writeAtomically(file, buf.toByteArray());
    }

    static BufferedImage draw(SweepPlan plan, List<Fractions.Row> rows) {
        Axis ax = plan.axes().get(0);
        Axis ay = plan.axes().get(1);
        double[][][] g = grid(plan, rows);
        int nx = ax.size();
        int ny = ay.size();
        BufferedImage img = new BufferedImage(W, H, BufferedImage.TYPE_INT_RGB);
        Graphics2D gr = img.createGraphics();
        gr.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        gr.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        gr.setColor(ChartPalette.PAPER);
        gr.fillRect(0, 0, W, H);
        double pw = W - LEFT - RIGHT;
        double ph = H - TOP - BOTTOM;
        double cw = pw / nx;
        double ch = ph / ny;
        Font small = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
        gr.setFont(small);
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                int x0 = (int) Math.round(LEFT + i * cw);
                int y0 = (int) Math.round(TOP + ph - (j + 1) * ch);
                int x1 = (int) Math.round(LEFT + (i + 1) * cw);
                int y1 = (int) Math.round(TOP + ph - j * ch);
                gr.setColor(ramp(g[0][i][j]));
                gr.fillRect(x0, y0, x1 - x0, y1 - y0);
                if (g[1][i][j] <= 0.5 && g[2][i][j] >= 0.5) {
                    gr.setColor(new Color(0x23, 0x26, 0x2E, 120));
                    gr.setStroke(new BasicStroke(1.2f));
                    int d = (int) Math.max(6, Math.min(cw, ch) * 0.55);
                    gr.drawOval((x0 + x1 - d) / 2, (y0 + y1 - d) / 2, d, d);
                }
                if (nx * ny <= 150 && cw > 34 && ch > 16) {
                    gr.setColor(ChartPalette.INK);
                    centred(gr, String.format(Locale.ROOT, "%.2f", g[0][i][j]), (x0 + x1) / 2, (y0 + y1) / 2 + 4);
                }
            }
        }
        gr.setColor(ChartPalette.INK);
        gr.setStroke(new BasicStroke(3.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (double[] s : contour(g[0], 0.5)) {
            gr.draw(new Line2D.Double(LEFT + (s[0] + 0.5) * cw, TOP + ph - (s[1] + 0.5) * ch,
                    LEFT + (s[2] + 0.5) * cw, TOP + ph - (s[3] + 0.5) * ch));
        }
        gr.setStroke(new BasicStroke(1f));
        gr.drawRect(LEFT, TOP, (int) pw, (int) ph);
        ticks(gr, ax, ay, cw, ch, ph);
        legend(gr, plan);
        gr.dispose();
        return img;
    }

    private static void ticks(Graphics2D gr, Axis ax, Axis ay, double cw, double ch, double ph) {
        gr.setColor(ChartPalette.INK);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        int everyX = Math.max(1, (int) Math.ceil(ax.size() / 12.0));
        for (int i = 0; i < ax.size(); i += everyX) {
            centred(gr, tick(ax.values().get(i)), (int) (LEFT + (i + 0.5) * cw), (int) (TOP + ph + 18));
        }
        int everyY = Math.max(1, (int) Math.ceil(ay.size() / 16.0));
        for (int j = 0; j < ay.size(); j += everyY) {
            String t = tick(ay.values().get(j));
            int tw = gr.getFontMetrics().stringWidth(t);
            gr.drawString(t, LEFT - 8 - tw, (int) (TOP + ph - (j + 0.5) * ch + 4));
        }
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        centred(gr, SweepPlots.label(ax.key()), (int) (LEFT + ax.size() * cw / 2), (int) (TOP + ph + 50));
        Graphics2D r = (Graphics2D) gr.create();
        r.rotate(-Math.PI / 2);
        centred(r, SweepPlots.label(ay.key()), (int) -(TOP + ph / 2), LEFT - 70);
        r.dispose();
    }

    private static void legend(Graphics2D gr, SweepPlan plan) {
        gr.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 17));
        gr.setColor(ChartPalette.INK);
        gr.drawString(title(plan) + " (" + plan.samples() + " runs per cell)", LEFT, TOP - 30);
        int bx = W - RIGHT + 30;
        int bh = H - TOP - BOTTOM - 120;
        for (int y = 0; y < bh; y++) {
            gr.setColor(ramp(1.0 - (double) y / (bh - 1)));
            gr.fillRect(bx, TOP + y, 22, 1);
        }
        gr.setColor(ChartPalette.INK);
        gr.drawRect(bx, TOP, 22, bh);
        gr.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        for (int k = 0; k <= 4; k++) {
            double v = k / 4.0;
            gr.drawString(String.format(Locale.ROOT, "%.2f", v), bx + 28, (int) (TOP + bh - v * bh + 4));
        }
        int ly = TOP + bh + 30;
        gr.setStroke(new BasicStroke(3.2f));
        gr.drawLine(bx - 10, ly, bx + 14, ly);
        gr.drawString("50% contour", bx + 20, ly + 4);
        gr.setStroke(new BasicStroke(1.2f));
        gr.drawOval(bx - 4, ly + 16, 12, 12);
        gr.drawString("95% interval", bx + 20, ly + 26);
        gr.drawString("holds 0.5", bx + 20, ly + 40);
    }

    private static void centred(Graphics2D g, String s, int cx, int baseline) {
        FontMetrics fm = g.getFontMetrics();
        g.drawString(s, cx - fm.stringWidth(s) / 2, baseline);
    }

    private static String tick(double v) {
        return String.format(Locale.ROOT, "%.4g", v).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }

    static Color ramp(double f) {
        double t = Math.max(0, Math.min(1, f)) * (RAMP.length - 1);
        int i = Math.min(RAMP.length - 2, (int) Math.floor(t));
        double u = t - i;
        Color a = RAMP[i];
        Color b = RAMP[i + 1];
        return new Color((int) Math.round(a.getRed() + u * (b.getRed() - a.getRed())),
                (int) Math.round(a.getGreen() + u * (b.getGreen() - a.getGreen())),
                (int) Math.round(a.getBlue() + u * (b.getBlue() - a.getBlue())));
    }

    /**
     * The level line of a grid of values by marching squares, in grid-index coordinates:
     * segments {x0, y0, x1, y1}, the crossing on each cell edge found by linear interpolation;
     * a saddle is resolved by the mean of its four corners.
     */
    static List<double[]> contour(double[][] v, double level) {
        List<double[]> out = new ArrayList<>();
        int nx = v.length;
        int ny = nx == 0 ? 0 : v[0].length;
        for (int i = 0; i + 1 < nx; i++) {
            for (int j = 0; j + 1 < ny; j++) {
                double[] c = {v[i][j], v[i + 1][j], v[i + 1][j + 1], v[i][j + 1]};
                double[][] corner = {{i, j}, {i + 1, j}, {i + 1, j + 1}, {i, j + 1}};
                List<double[]> cross = new ArrayList<>();
                for (int e = 0; e < 4; e++) {
                    int f = (e + 1) % 4;
                    boolean a = c[e] >= level;
                    boolean b = c[f] >= level;
                    if (a != b) {
                        double t = (level - c[e]) / (c[f] - c[e]);
                        cross.add(new double[] {corner[e][0] + t * (corner[f][0] - corner[e][0]),
                            corner[e][1] + t * (corner[f][1] - corner[e][1])});
                    }
                }
                if (cross.size() == 2) {
                    out.add(new double[] {cross.get(0)[0], cross.get(0)[1], cross.get(1)[0], cross.get(1)[1]});
                } else if (cross.size() == 4) {
                    boolean centreAbove = (c[0] + c[1] + c[2] + c[3]) / 4 >= level;
                    boolean firstAbove = c[0] >= level;
                    // crossings lie on edges 0-1, 1-2, 2-3, 3-0 in order; cut off the two corners
                    // on the other side than the centre (corner k lies between edges k-1 and k)
                    int s = centreAbove == firstAbove ? 0 : 1;
                    out.add(seg(cross.get(s), cross.get((s + 1) % 4)));
                    out.add(seg(cross.get((s + 2) % 4), cross.get((s + 3) % 4)));
                }
            }
        }
        return out;
    }

    private static double[] seg(double[] a, double[] b) {
        return new double[] {a[0], a[1], b[0], b[1]};
    }
}
