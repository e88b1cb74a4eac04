package org.holdfast.output;

import java.awt.Color;

/**
 * holdfast's chart colours. Member i has the same hue here as in films (the renderer's palette
 * for a black sky: amber, azure, citron, orchid, teal, coral, pearl, cobalt), darkened to read
 * on paper, so that a member keeps its colour from a chart to a film frame.
 */
public final class ChartPalette {

    /** Member colours, in the order members are listed. */
    private static final int[] MEMBERS_RGB = {
        0xC7821A, // amber
        0x2F7FB8, // azure
        0xA89A1F, // citron
        0xA4509A, // orchid
        0x1F9A80, // teal
        0xC9473B, // coral
        0x6B675E, // pearl (a warm grey on paper)
        0x2A4BB0, // cobalt
    };

    /** Background of charts: a warm off-white. */
    public static final Color PAPER = new Color(0xFAF8F3);

    /** Text and axes. */
    public static final Color INK = new Color(0x23262E);

    /** Grid lines. */
    public static final Color GRID = new Color(0xE2DED4);

    /** Guide lines (zero-gravity radius, zero-velocity radius). */
    public static final Color GUIDE = new Color(0x8C8A84);

    private ChartPalette() {
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
