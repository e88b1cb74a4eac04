package org.holdfast.render;

/**
 * The colours galaxies are drawn in: sixteen of our own, chosen on a black sky to stay apart in
 * lightness and along the blue-yellow axis, which red-green colour-blind viewers keep (see
 * PaletteTest for the check), so that up to sixteen members each have their own. The first
 * eight are the main hues; the other eight were added one at a time, each the sRGB colour (on a
 * grid of 17 steps, at least L* = 45) farthest from all before it. Index i uses colour i mod 16.
 */
public final class Palette {

    /** Amber, azure, citron, orchid, teal, coral, pearl, cobalt, then lime, moss, mauve, magenta, violet, mint, spruce, olive, as 0xRRGGBB. */
    private static final int[] RGB = {
        0xF2A93B, 0x58A8F0, 0xE8E070, 0xE28FD8, 0x2FC7A8, 0xF26B5E, 0xF0EEE8, 0x3A62D8,
        0x99FF00, 0x448800, 0x886666, 0xCC00AA, 0x8833FF, 0x00FF99, 0x337788, 0x557744
    };

    /** The names of the colours, in order, for documentation and legends. */
    private static final String[] NAMES = {
        "amber", "azure", "citron", "orchid", "teal", "coral", "pearl", "cobalt",
        "lime", "moss", "mauve", "magenta", "violet", "mint", "spruce", "olive"
    };

    private Palette() {
    }

    /** Number of distinct colours. */
    public static int size() {
        return RGB.length;
    }

    /** Colour of a galaxy's colour index as 0xRRGGBB (negative indices wrap too). */
    public static int rgb(int index) {
        return RGB[Math.floorMod(index, RGB.length)];
    }

    /** Name of a colour. */
    public static String name(int index) {
        return NAMES[Math.floorMod(index, NAMES.length)];
    }

    /** Red component of a colour in [0, 1]. */
    public static float red(int index) {
        return ((rgb(index) >> 16) & 0xFF) / 255f;
    }

    public static float green(int index) {
        return ((rgb(index) >> 8) & 0xFF) / 255f;
    }

    public static float blue(int index) {
        return (rgb(index) & 0xFF) / 255f;
    }
}
