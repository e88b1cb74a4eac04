package org.holdfast.render;

import java.util.Arrays;

/**
 * The trail segments and galaxy-centre markers of one frame, projected once on the caller's
 * thread and then drawn band by band, so that each band of rows can be finished (and
 * stretched) by the task that owns it. A band draws, in the order they were added, first the
 * segments and then the centres whose footprint reaches its rows, each clipped to those rows.
 * After the band's splats that gives every pixel the same float additions, in the same order,
 * as drawing the splats, then all segments, then all centres over the whole frame.
 *
 * <p>Which band a primitive reaches is decided from its end points with rows to spare; the
 * exact clip is made per pixel by {@link TrailPainter} and {@link SplatKernel}, so a margin
 * costs time only, never a pixel. All lists grow when a frame needs more room and are kept.
 */
final class MarkerLayer {

    /** End points beyond this many pixels from the origin make a segment visit every band. */
    private static final double FAR_PX = 1e7;
    /** Rows either side of a segment's end points that a band test counts as reached. */
    private static final int SPARE_ROWS = 2;

    private final SplatKernel centreKernel;
    private final int height;
    /** Segment s: x0, y0, x1, y1 at 4s; light per pixel of length at 3s. */
    private double[] segmentXy = new double[4 * 16];
    private float[] segmentRgb = new float[3 * 16];
    private int segments;
    /** Centre c: x, y at 2c; light at 3c. */
    private double[] centreXy = new double[2 * 16];
    private float[] centreRgb = new float[3 * 16];
    private int centres;
    private final BandIndex segmentsOfBand;
    private final BandIndex centresOfBand;

    MarkerLayer(SplatKernel centreKernel, int height) {
        this.centreKernel = centreKernel;
        this.height = height;
        this.segmentsOfBand = new BandIndex(SplatLayer.bands(height));
        this.centresOfBand = new BandIndex(SplatLayer.bands(height));
    }

    /** Forgets the last frame's segments and centres. */
    void clear() {
        segments = 0;
        centres = 0;
        segmentsOfBand.clear();
        centresOfBand.clear();
    }

    /** Adds a trail segment, as {@link TrailPainter#line} takes it. */
    void addSegment(double x0, double y0, double x1, double y1, float r, float g, float b) {
        if (4 * segments + 4 > segmentXy.length) {
            segmentXy = Arrays.copyOf(segmentXy, 2 * segmentXy.length);
            segmentRgb = Arrays.copyOf(segmentRgb, 2 * segmentRgb.length);
        }
        int s = segments++;
        segmentXy[4 * s] = x0;
        segmentXy[4 * s + 1] = y0;
        segmentXy[4 * s + 2] = x1;
        segmentXy[4 * s + 3] = y1;
        segmentRgb[3 * s] = r;
        segmentRgb[3 * s + 1] = g;
        segmentRgb[3 * s + 2] = b;
        double lo = Math.min(y0, y1);
        double hi = Math.max(y0, y1);
        boolean near = Math.abs(x0) < FAR_PX && Math.abs(x1) < FAR_PX && Math.abs(lo) < FAR_PX
                && Math.abs(hi) < FAR_PX;
        if (near) {
            // a line's light lies within a row of its end points' rows
            segmentsOfBand.addRows((int) Math.floor(lo) - SPARE_ROWS, (int) Math.floor(hi) + SPARE_ROWS, s);
        } else {
            // NaN or far-off end points: let every band draw its share, as the whole line would
            segmentsOfBand.addRows(0, height - 1, s);
        }
    }

    /** Adds a galaxy-centre marker, as {@link SplatKernel#draw} takes it. */
    void addCentre(double x, double y, float r, float g, float b) {
        if (2 * centres + 2 > centreXy.length) {
            centreXy = Arrays.copyOf(centreXy, 2 * centreXy.length);
            centreRgb = Arrays.copyOf(centreRgb, 2 * centreRgb.length);
        }
        int c = centres++;
        centreXy[2 * c] = x;
        centreXy[2 * c + 1] = y;
        centreRgb[3 * c] = r;
        centreRgb[3 * c + 1] = g;
        centreRgb[3 * c + 2] = b;
        // the footprint's rows, in the kernel's own integer arithmetic
        long top = centreKernel.topRow(y);
        long bottom = top + 2L * centreKernel.radius();
        centresOfBand.addRows((int) Math.max(-1, top), (int) Math.min(height, bottom), c);
    }

    /** Draws the segments, then the centres, that reach band {@code band}, clipped to its rows. */
    void drawBand(int band, LightBuffer light) {
        int rowFrom = band * SplatLayer.BAND_ROWS;
        int rowTo = Math.min(height, rowFrom + SplatLayer.BAND_ROWS);
        int[] list = segmentsOfBand.items[band];
        for (int k = 0, end = segmentsOfBand.used[band]; k < end; k++) {
            int s = list[k];
            TrailPainter.line(light, segmentXy[4 * s], segmentXy[4 * s + 1], segmentXy[4 * s + 2],
                    segmentXy[4 * s + 3], segmentRgb[3 * s], segmentRgb[3 * s + 1], segmentRgb[3 * s + 2], rowFrom,
                    rowTo);
        }
        list = centresOfBand.items[band];
        for (int k = 0, end = centresOfBand.used[band]; k < end; k++) {
            int c = list[k];
            centreKernel.draw(light, centreXy[2 * c], centreXy[2 * c + 1], centreRgb[3 * c], centreRgb[3 * c + 1],
                    centreRgb[3 * c + 2], rowFrom, rowTo);
        }
    }

    /** Per band, the indices of the primitives that reach it, in the order they were added. */
    private static final class BandIndex {

        final int[][] items;
        final int[] used;

        BandIndex(int bands) {
            items = new int[bands][8];
            used = new int[bands];
        }

        void clear() {
            Arrays.fill(used, 0);
        }

        /** Lists {@code item} in every band that holds a row of [rowFirst, rowLast], clamped to the frame. */
        void addRows(int rowFirst, int rowLast, int item) {
            int last = items.length - 1;
            if (rowLast < 0 || rowFirst > last * SplatLayer.BAND_ROWS + SplatLayer.BAND_ROWS - 1) {
                return;
            }
            int b0 = Math.max(0, rowFirst) / SplatLayer.BAND_ROWS;
            int b1 = Math.min(last, rowLast / SplatLayer.BAND_ROWS);
            for (int b = b0; b <= b1; b++) {
                int k = used[b];
                if (k == items[b].length) {
                    items[b] = Arrays.copyOf(items[b], 2 * k);
                }
                items[b][k] = item;
                used[b] = k + 1;
            }
        }
    }
}
