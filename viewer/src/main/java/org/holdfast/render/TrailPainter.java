package org.holdfast.render;

/**
 * Anti-aliased lines of light after Wu (1991, Computer Graphics 25(4), "An efficient
 * antialiasing technique"): along the major axis, each pixel column (or row) gets the line's
 * light split between the two pixels nearest the line, in proportion to closeness. Light is
 * added per unit length, so a line of length L and brightness b deposits L x b in all, and the
 * light-weighted centre of each column lies on the line.
 */
public final class TrailPainter {

    private TrailPainter() {
    }

    /**
     * Adds a line from (x0, y0) to (x1, y1), in continuous pixel coordinates, with light
     * {@code r, g, b} per pixel of length. Covers the pixel centres with major-axis coordinate
     * in [min, max), so chained segments do not light their joints twice.
     */
    public static void line(LightBuffer buf, double x0, double y0, double x1, double y1, float r, float g,
            float b) {
        line(buf, x0, y0, x1, y1, r, g, b, 0, buf.height());
    }

    /**
     * As {@link #line(LightBuffer, double, double, double, double, float, float, float)}, but
     * touching only rows in [rowFrom, rowTo) (a band owned by the caller). Each pixel gets the
     * very value the whole line would give it, so drawing a line band by band over all bands
     * equals drawing it once.
     */
    public static void line(LightBuffer buf, double x0, double y0, double x1, double y1, float r, float g,
            float b, int rowFrom, int rowTo) {
        boolean steep = Math.abs(y1 - y0) > Math.abs(x1 - x0);
        if (steep) {
            double t = x0;
            x0 = y0;
            y0 = t;
            t = x1;
            x1 = y1;
            y1 = t;
        }
        if (x0 > x1) {
            double t = x0;
            x0 = x1;
            x1 = t;
            t = y0;
            y0 = y1;
            y1 = t;
        }
        double dx = x1 - x0;
        if (dx == 0) {
            return;
        }
        double gradient = (y1 - y0) / dx;
        double perColumn = Math.sqrt(1 + gradient * gradient);
        float cr = (float) (r * perColumn);
        float cg = (float) (g * perColumn);
        float cb = (float) (b * perColumn);
        int major = steep ? buf.height() : buf.width();
        int from = Math.max(0, (int) Math.ceil(x0 - 0.5));
        int to = Math.min(major, (int) Math.ceil(x1 - 0.5));
        if (steep) {
            // the major axis is the row: clip it to the band
            from = Math.max(from, rowFrom);
            to = Math.min(to, rowTo);
            for (int i = from; i < to; i++) {
                double y = y0 + gradient * (i + 0.5 - x0) - 0.5;
                int j = (int) Math.floor(y);
                float frac = (float) (y - j);
                float near = 1 - frac;
                buf.add(j, i, cr * near, cg * near, cb * near);
                buf.add(j + 1, i, cr * frac, cg * frac, cb * frac);
            }
            return;
        }
        if (gradient != 0) {
            // skip columns whose rows j, j + 1 lie well away from the band (one row to spare
            // either side, far more than the rounding of y); the test per pixel below decides
            double a = x0 - 0.5 + (rowFrom - 1.5 - y0) / gradient;
            double c = x0 - 0.5 + (rowTo + 1.5 - y0) / gradient;
            double lo = Math.floor(Math.min(a, c)) - 1;
            double hi = Math.ceil(Math.max(a, c)) + 2;
            if (lo > from) {
                from = (int) Math.min(to, lo);
            }
            if (hi < to) {
                to = (int) Math.max(from, hi);
            }
        }
        for (int i = from; i < to; i++) {
            double y = y0 + gradient * (i + 0.5 - x0) - 0.5;
            int j = (int) Math.floor(y);
            float frac = (float) (y - j);
            float near = 1 - frac;
            if (j >= rowFrom && j < rowTo) {
                buf.add(i, j, cr * near, cg * near, cb * near);
            }
            if (j + 1 >= rowFrom && j + 1 < rowTo) {
                buf.add(i, j + 1, cr * frac, cg * frac, cb * frac);
            }
        }
    }
}
