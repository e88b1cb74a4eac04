package org.holdfast.render;

/**
 * Places galaxy names so that they do not pile up. Each label, in the order given, tries a few
 * spots around its galaxy in a fixed order (upper right first, then upper left, lower right,
 * lower left, right, left, above, below) and takes the first one that lies inside the frame,
 * overlaps no label placed before it and covers no other galaxy's centre; failing that, the
 * first that only keeps clear of the labels; a label with neither is left out. The result
 * depends only on the positions and sizes given, so a frame always gets the same labels.
 *
 * <p>Greedy placement over a few candidate spots per label is common practice in map
 * labelling; this is a simple form of it (from memory). The boxes live in reused arrays.
 */
final class LabelPlacer {

    /** Candidate spots: which side of the centre the box goes, horizontally and vertically. */
    private static final int[][] SPOTS = {
        {1, -1}, {-1, -1}, {1, 1}, {-1, 1}, {1, 0}, {-1, 0}, {0, -1}, {0, 1}
    };

    /** Placed boxes with their padding, 4 ints each: left, top, right, bottom (exclusive). */
    private int[] boxes = new int[0];
    private int placed;

    /**
     * Places labels in order; text whose baseline is at {@code y} covers rows
     * {@code y - ascentPx} to {@code y + descentPx}.
     *
     * @param n number of labels
     * @param centrePx x, y pairs of the galaxy centres, NaN where not in view
     * @param widthPx width of each label
     * @param gapPx space between a centre and its label
     * @param frameW frame width (likewise frameH)
     * @param outXY receives each placed label's text origin: x and baseline y
     * @param outPlaced receives whether each label was placed
     */
    void place(int n, double[] centrePx, int[] widthPx, int ascentPx, int descentPx, int gapPx, int frameW,
            int frameH, int[] outXY, boolean[] outPlaced) {
        if (boxes.length < 4 * n) {
            boxes = new int[4 * n];
        }
        placed = 0;
        int pad = Math.max(1, gapPx / 2);
        int h = ascentPx + descentPx;
        for (int i = 0; i < n; i++) {
            outPlaced[i] = false;
            double cx = centrePx[2 * i];
            double cy = centrePx[2 * i + 1];
            if (Double.isNaN(cx) || Double.isNaN(cy)) {
                continue;
            }
            int x = (int) Math.round(cx);
            int y = (int) Math.round(cy);
            int w = widthPx[i];
            for (int pass = 0; pass < 2 && !outPlaced[i]; pass++) {
                for (int[] s : SPOTS) {
                    int left = s[0] > 0 ? x + gapPx : s[0] < 0 ? x - gapPx - w : x - w / 2;
                    int top = s[1] < 0 ? y - gapPx - ascentPx : s[1] > 0 ? y + gapPx : y - h / 2;
                    if (fits(left, top, w, h, frameW, frameH) && clearOfLabels(left, top, w, h)
                            && (pass == 1 || clearOfCentres(left, top, w, h, pad, i, n, centrePx))) {
                        int k = 4 * placed++;
                        boxes[k] = left - pad;
                        boxes[k + 1] = top - pad;
                        boxes[k + 2] = left + w + pad;
                        boxes[k + 3] = top + h + pad;
                        outXY[2 * i] = left;
                        outXY[2 * i + 1] = top + ascentPx;
                        outPlaced[i] = true;
                        break;
                    }
                }
            }
        }
    }

    private static boolean fits(int left, int top, int w, int h, int frameW, int frameH) {
        return left >= 0 && top >= 0 && left + w <= frameW && top + h <= frameH;
    }

    private boolean clearOfLabels(int left, int top, int w, int h) {
        for (int k = 0; k < 4 * placed; k += 4) {
            if (left < boxes[k + 2] && left + w > boxes[k] && top < boxes[k + 3] && top + h > boxes[k + 1]) {
                return false;
            }
        }
        return true;
    }

    private static boolean clearOfCentres(int left, int top, int w, int h, int pad, int self, int n,
            double[] centrePx) {
        for (int j = 0; j < n; j++) {
            double x = centrePx[2 * j];
            double y = centrePx[2 * j + 1];
            if (j != self && x >= left - pad && x < left + w + pad && y >= top - pad && y < top + h + pad) {
                return false;
            }
        }
        return true;
    }
}
