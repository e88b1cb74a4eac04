package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.holdfast.render.CameraPose;
import org.holdfast.render.Overlay;
import org.holdfast.render.projection.DomeProjection;
import org.holdfast.schema.Node;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.junit.jupiter.api.Test;

class FilmReaderTest {

    static final Path FILE = Path.of("quillon-group.toml");

    static FilmSpec read(String toml) {
        Node root = org.holdfast.schema.ScenarioFile.parse(FILE, toml, Overrides.none(), NumberReader.PLAIN);
        return FilmReader.read(root);
    }

    static ScenarioException fails(String toml) {
        return assertThrows(ScenarioException.class, () -> read(toml));
    }

    static final String DOME = """
            [film]
            length_s = 30
            frame_rate = 24
            view = "dome"
            frame_px = [1024, 1024]
            dome_span_deg = 210
            dome_tilt_deg = 30
            clock = "countdown"
            from_gyr = 5
            to_gyr = 40
            final_gyr = 41
            camera = "orbit"

            [film.show]
            scale_bar = false
            names = false

            [film.orbit]
            centre_kpc = [0, 0, 0]
            radius_kpc = 600
            rise_kpc = 100
            turns = 0.5
            """;

    @Test
    void readsADomeCountdownOrbit() {
        FilmSpec spec = read(DOME);
        assertEquals(720, spec.frameCount());
        assertEquals(1.0 / 24, spec.filmSecondOf(2), 1e-15);
        assertTrue(spec.projection() instanceof DomeProjection d && d.spanDeg() == 210 && d.tiltDeg() == 30);
        assertEquals(1024, spec.projection().width());
        assertEquals(5, spec.clock().simGyr(0), 1e-12);
        assertEquals(40, spec.clock().simGyr(30), 1e-9);
        assertFalse(spec.overlays().contains(Overlay.SCALE_BAR));
        assertTrue(spec.overlays().contains(Overlay.CLOCK));
        CameraPose pose = spec.camera().poseAt(0, new CameraPose());
        assertEquals(Math.hypot(600, 100), pose.eyeKpc().length(), 1e-9);
    }

    /** The frames' times, first to last. */
    private static double[] frameTimes(FilmSpec spec) {
        double[] t = new double[spec.frameCount()];
        for (int i = 1; i <= t.length; i++) {
            t[i - 1] = spec.clock().simGyr(spec.filmSecondOf(i));
        }
        return t;
    }

    @Test
    void theFirstFrameShowsFromGyrAndTheLastToGyr() {
        String linear = """
                [film]
                length_s = 1
                frame_rate = 3
                from_gyr = 0
                to_gyr = 10
                camera = "orbit"
                [film.orbit]
                radius_kpc = 600
                """;
        assertArrayEquals(new double[] {0, 5, 10}, frameTimes(read(linear)), 1e-12);
        double[] countdown = frameTimes(read(DOME));
        assertEquals(720, countdown.length);
        assertEquals(5, countdown[0], 0);
        assertEquals(40, countdown[719], 0, "the last frame shows to_gyr, the last instant asked for");
        // equal ratios of the time left (1 Gyr before final_gyr = 41) from frame to frame
        double ratio = (41 - countdown[1]) / (41 - countdown[0]);
        assertEquals(Math.pow(1.0 / 36, 1.0 / 719), ratio, 1e-12);
        assertEquals(ratio, (41 - countdown[719]) / (41 - countdown[718]), 1e-9);
        String one = linear.replace("length_s = 1", "length_s = 0.2");
        assertArrayEquals(new double[] {0}, frameTimes(read(one)), 0, "a film of one frame shows its start");
    }

    @Test
    void readsKeyframesWithDefaults() {
        FilmSpec spec = read("""
                [film]
                length_s = 8
                to_gyr = -2.5

                [[film.keyframe]]
                at_s = 0
                eye_kpc = [0, -900, 200]

                [[film.keyframe]]
                at_s = 8
                eye_kpc = [0, -300, 80]
                fov_deg = 35
                """);
        assertEquals("flat", spec.view());
        assertEquals(1920, spec.widthPx());
        assertEquals(240, spec.frameCount());
        assertEquals(-2.5, spec.clock().simGyr(8), 1e-12);
        assertEquals(35, spec.camera().poseAt(8, new CameraPose()).fovDeg(), 1e-12);
    }

    @Test
    void unknownKeyIsNamedWithFileAndLine() {
        ScenarioException e = fails("""
                [film]
                length_s = 8
                to_gyr = 3
                frame_rat = 25
                """);
        assertEquals("quillon-group.toml:4", e.where());
        assertEquals("film.frame_rat", e.key());
        assertTrue(e.getMessage().contains("did you mean 'frame_rate'"), e.getMessage());
    }

    @Test
    void domeFramesMustBeSquare() {
        ScenarioException e = fails(DOME.replace("[1024, 1024]", "[1024, 768]"));
        assertEquals("film.frame_px", e.key());
        assertEquals("quillon-group.toml:5", e.where());
        assertTrue(e.getMessage().contains("square"), e.getMessage());
    }

    @Test
    void countdownNeedsAFinalTimeAfterTheFilm() {
        ScenarioException e = fails(DOME.replace("final_gyr = 41", "final_gyr = 30"));
        assertEquals("film.final_gyr", e.key());
        ScenarioException missing = fails(DOME.replace("final_gyr = 41\n", ""));
        assertTrue(missing.getMessage().contains("missing required key 'film.final_gyr'"), missing.getMessage());
    }

    @Test
    void domeSpanIsLimitedTo240() {
        ScenarioException e = fails(DOME.replace("dome_span_deg = 210", "dome_span_deg = 250"));
        assertEquals("film.dome_span_deg", e.key());
        assertEquals("quillon-group.toml:6", e.where());
    }

    @Test
    void keyframesAtTheSameSecondAreRejected() {
        ScenarioException e = fails("""
                [film]
                length_s = 8
                to_gyr = 3

                [[film.keyframe]]
                at_s = 2
                eye_kpc = [0, -900, 200]

                [[film.keyframe]]
                at_s = 2
                eye_kpc = [0, -300, 80]
                """);
        assertEquals("film.keyframe[1].at_s", e.key());
        assertEquals("quillon-group.toml:10", e.where());
    }

    @Test
    void upAlongTheViewIsRejected() {
        ScenarioException e = fails("""
                [film]
                length_s = 8
                to_gyr = 3
                camera = "approach"

                [film.approach]
                start_kpc = [0, 0, 900]
                end_kpc = [0, 0, 300]
                """);
        assertEquals("film.approach.up", e.key());
    }

    @Test
    void tablesForAnotherCameraAreRejected() {
        ScenarioException e = fails(DOME.replace("camera = \"orbit\"", "camera = \"approach\""));
        assertEquals("film.orbit", e.key());
    }
}
