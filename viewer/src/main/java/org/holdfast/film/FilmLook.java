package org.holdfast.film;

import java.util.List;

/**
 * The production choices of a film beyond its clock and camera: how big text is on a dome and
 * where it sits, how large the glows are, whether trails are drawn, the rip ladder's moments as
 * events, and how frames are written.
 *
 * @param textDeg height of the clock's first line in degrees of the dome's span (dome only;
 *        the second line and events are 0.8 of it): 3 degrees is 34 pixels on a 2K master
 * @param placement "unidirectional" (text in the front sweet spot, low in the dome master) or
 *        "concentric" (text round the zenith, which every seat sees)
 * @param glowDeg Gaussian sigma of a star's glow in degrees, so that a small preview looks like
 *        the large master; the galaxy centres' glow is 3.2 times it
 * @param trails whether the galaxies' recent paths are drawn
 * @param ladder whether the rungs of the rip ladder appear as events (overlay and cue sheet)
 * @param deep whether frames are 16-bit PNGs (48-bit colour) rather than 8-bit
 * @param overlayLayer whether the text and marks go into a separate RGBA PNG per frame
 *        ({@code overlay_NNNNNN.png}) instead of onto the picture
 */
public record FilmLook(double textDeg, String placement, double glowDeg, boolean trails, boolean ladder,
        boolean deep, boolean overlayLayer) {

    static final List<String> PLACEMENTS = List.of("unidirectional", "concentric");

    /** Star glow of the look holdfast had at 1920x1080, 50 degrees of field: 0.5 px there. */
    static final double DEFAULT_GLOW_DEG = org.holdfast.render.RenderSettings.DEFAULT_GLOW_DEG;

    /** The defaults: what a [film] table with none of these keys gets. */
    static FilmLook standard() {
        return new FilmLook(3.0, "unidirectional", DEFAULT_GLOW_DEG, true, false, false, false);
    }
}
