package org.holdfast.output;

import java.awt.Color;

/**
 * holdfast's colours, shared by charts and films. Eight hues chosen to differ in lightness as
 * well as hue, so that neighbours stay apart for the common forms of colour blindness; the
 * first two (harbour blue and ember orange) are the pair used when only two are needed.
 */
public final class Palette {

    /** Member colours, in the order members are listed. */
    private static final int[] MEMBERS_RGB = {
        0x2F7FB8, // harbour blue
        0xE8891C, // ember orange
        0x9A4FB0, // heather violet
        0x5FB86A, // lichen green
        0xC23B4E, // brick rose
        0x49C3D1, // glacier cyan
        0xD9C23F, // straw yellow
        0x7A6A58, // driftwood
    };

    /** Background of charts: a warm off-white. */
    public static final Color PAPER = new Color(0xFAF8F3);

    /** Text and axes. */
    public static final Color INK = new Color(0x23262E);

    /** Grid lines. */
    public static final Color GRID = new Color(0xE2DED4);

    /** Guide lines (zero-gravity radius, zero-velocity radius). */
    public static final Color GUIDE = new Color(0x8C8A84);

    private Palette() {
    }

    /** The colour of member i (cycling after eight). */
    public static Color member(int i) {
        return new Color(memberRgb(i));
    }

    /** The 0xRRGGBB colour of member i (cycling after eight). */
    public static int memberRgb(int i) {
        return MEMBERS_RGB[Math.floorMod(i, MEMBERS_RGB.length)];
    }

    /** Number of distinct member colours. */
    public static int size() {
        return MEMBERS_RGB.length;
    }
}
