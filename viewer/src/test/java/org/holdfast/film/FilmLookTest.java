package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.awt.image.DataBuffer;

import org.holdfast.render.CameraPose;
import org.holdfast.render.FrameRenderer;
import org.holdfast.render.Overlay;
import org.holdfast.render.RenderSettings;
import org.holdfast.render.SceneFrame;
import org.holdfast.schema.ScenarioException;
import org.junit.jupiter.api.Test;

/** The production keys of [film]: defaults, camera without a table, glows, dome text, layers. */
class FilmLookTest {

    private static final String BARE = """
            [film]
            length_s = 10
            to_gyr = 5
            """;

    @Test
    void aFilmWithoutCameraIsTheDefaultOrbit() {
        FilmSpec spec = FilmReaderTest.read(BARE);
        CameraPose start = spec.camera().poseAt(0, new CameraPose());
        CameraPose end = spec.camera().poseAt(10, new CameraPose());
        // the default film's orbit: the overview distance seen from 20 degrees up, a quarter turn
        double d = FilmReader.DEFAULT_OVERVIEW_KPC;
        assertEquals(d, start.eyeKpc().length(), 1e-6 * d);
        assertEquals(d * Math.sin(Math.toRadians(20)), start.eyeKpc().z(), 1e-6 * d);
        double turned = Math.toDegrees(Math.atan2(end.eyeKpc().y(), end.eyeKpc().x())
                - Math.atan2(start.eyeKpc().y(), start.eyeKpc().x()));
        assertEquals(90, Math.abs(turned), 1e-6);
        assertEquals(d, start.focusKpc(), 1e-6 * d);
        FilmLook look = spec.look();
        assertTrue(look.trails());
        assertFalse(look.deep() || look.overlayLayer() || look.ladder());
    }

    @Test
    void anOrbitTableMayLeaveEveryKeyOut() {
        FilmSpec spec = FilmReaderTest.read(BARE + "[film.orbit]\nturns = 0.5\n");
        assertEquals(FilmReader.DEFAULT_OVERVIEW_KPC, spec.camera().poseAt(0, new CameraPose()).eyeKpc().length(), 1e-6);
    }

    @Test
    void theLastFrameShowsTheCameraAtTheEndOfItsTrack() {
        FilmSpec spec = FilmReaderTest.read(BARE);
        int n = spec.frameCount();
        assertEquals(300, n);
        assertEquals(10, spec.cameraSecondOf(n), 0);
        assertEquals(0, spec.cameraSecondOf(1), 0);
        // a still at the last frame's film second sees the same camera
        assertEquals(10, spec.cameraSecondAt(spec.filmSecondOf(n)), 1e-12);
    }

    @Test
    void glowsAreAnglesSoAPreviewLooksLikeTheMaster() {
        FilmSpec small = FilmReaderTest.read(BARE.replace("to_gyr = 5", "to_gyr = 5\nview = \"dome\"\nframe_px = [1024, 1024]"));
        FilmSpec large = FilmReaderTest.read(BARE.replace("to_gyr = 5", "to_gyr = 5\nview = \"dome\"\nframe_px = [4096, 4096]"));
        RenderSettings s = small.renderSettings();
        RenderSettings l = large.renderSettings();
        assertEquals(4, l.galaxySigmaPx() / s.galaxySigmaPx(), 1e-9);
        // dome text from degrees: 3 degrees of a 180-degree dome on 4096 px
        assertEquals(3 * 4096 / 180.0, l.domeTextPx(), 1e-9);
        assertFalse(l.concentric());
        // the old look at 1920x1080 flat is kept: 0.5 px stars, 1.6 px galaxy centres
        RenderSettings flat = FilmReaderTest.read(BARE).renderSettings();
        assertEquals(0.5, flat.splatSigmaPx(), 1e-9);
        assertEquals(1.6, flat.galaxySigmaPx(), 1e-9);
    }

    /** The scale bar's depth is the distance to the point looked at, along keyframes too. */
    @Test
    void keyframesCarryTheDistanceToThePointLookedAt() {
        FilmSpec spec = FilmReaderTest.read(BARE + """
                [[film.keyframe]]
                at_s = 0
                eye_kpc = [0, -300, 0]
                [[film.keyframe]]
                at_s = 10
                eye_kpc = [0, -900, 0]
                """);
        assertEquals(300, spec.camera().poseAt(0, new CameraPose()).focusKpc(), 1e-9);
        assertEquals(900, spec.camera().poseAt(10, new CameraPose()).focusKpc(), 1e-9);
        assertEquals(600, spec.camera().poseAt(5, new CameraPose()).focusKpc(), 1e-9);
    }

    @Test
    void trailsSwitchOffInShow() {
        FilmSpec spec = FilmReaderTest.read(BARE + "[film.show]\ntrails = false\n");
        assertFalse(spec.look().trails());
        assertEquals(0, spec.renderSettings().trailBrightness());
    }

    @Test
    void badProductionKeysNameThemselves() {
        ScenarioException e = FilmReaderTest.fails(BARE + "png_bits = 12\n");
        assertTrue(e.getMessage().contains("png_bits"), e.getMessage());
        e = FilmReaderTest.fails(BARE + "text_placement = \"sideways\"\n");
        assertTrue(e.getMessage().contains("text_placement"), e.getMessage());
        e = FilmReaderTest.fails(BARE + "text_deg = 0\n");
        assertTrue(e.getMessage().contains("text_deg"), e.getMessage());
    }

    @Test
    void deepFramesAndTheOverlayLayer() {
        FilmSpec spec = FilmReaderTest.read(BARE.replace("to_gyr = 5", "to_gyr = 5\nframe_px = [64, 36]\npng_bits = 16"
                + "\noverlay_layer = true"));
        assertTrue(spec.look().deep() && spec.look().overlayLayer());
        SceneFrame scene = new SceneFrame().setClock(1.0, 1.2);
        scene.setGalaxies(1, new String[] {"Quill"}, new int[] {0}, new double[] {0}, new double[] {0},
                new double[] {0});
        RenderSettings rs = spec.renderSettings().threads(1);
        try (FrameRenderer r = new FrameRenderer(spec.projection(), rs)) {
            CameraPose pose = spec.camera().poseAt(0, new CameraPose());
            BufferedImage deep = r.renderDeep(scene, pose, false);
            assertEquals(DataBuffer.TYPE_USHORT, deep.getRaster().getDataBuffer().getDataType());
            BufferedImage eight = r.renderPicture(scene, pose);
            // the 16-bit picture rounds to the 8-bit one
            int differ = 0;
            for (int y = 0; y < 36; y++) {
                for (int x = 0; x < 64; x++) {
                    int v16 = deep.getRaster().getSample(x, y, 0);
                    int v8 = (eight.getRGB(x, y) >> 16) & 0xFF;
                    differ += Math.abs(Math.round(v16 / 257.0) - v8) > 1 ? 1 : 0;
                }
            }
            assertEquals(0, differ);
            BufferedImage layer = r.overlayLayer(scene, pose);
            assertTrue(layer.getColorModel().hasAlpha());
            int clear = 0;
            int drawn = 0;
            for (int y = 0; y < 36; y++) {
                for (int x = 0; x < 64; x++) {
                    int a = layer.getRGB(x, y) >>> 24;
                    clear += a == 0 ? 1 : 0;
                    drawn += a > 0 ? 1 : 0;
                }
            }
            assertTrue(clear > 0 && drawn > 0, "the layer is transparent but for its text: " + drawn);
        }
        assertTrue(spec.overlays().contains(Overlay.CLOCK));
    }
}
