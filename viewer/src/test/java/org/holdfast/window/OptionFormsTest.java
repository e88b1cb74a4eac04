package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import org.holdfast.render.ProjectionKind;
import org.holdfast.render.Camera;
import org.holdfast.render.CameraSpec;

/** The text forms of --camera and --size. */
class OptionFormsTest {

    @Test
    void cameraReadsThreeOrFourNumbers() {
        CameraSpec c = CameraSpec.parse("30,15,800");
        assertEquals(new CameraSpec(30, 15, 800, Camera.DEFAULT_FOV_DEG), c);
        assertEquals(40, CameraSpec.parse(" -30 , -15.5 , 2e3 , 40 ").fovDeg(), 0);
        assertEquals(-15.5, CameraSpec.parse(" -30 , -15.5 , 2e3 , 40 ").pitchDeg(), 0);
        Camera cam = c.camera(ProjectionKind.DOME);
        assertEquals(800, cam.distanceKpc(), 0);
        assertEquals(ProjectionKind.DOME, cam.projection());
    }

    @Test
    void cameraErrorsSayWhatIsWrong() {
        assertTrue(message(() -> CameraSpec.parse("30,15")).contains("YAW,PITCH,DISTANCE"));
        assertTrue(message(() -> CameraSpec.parse("30,abc,800")).contains("pitch 'abc'"));
        assertTrue(message(() -> CameraSpec.parse("30,95,800")).contains("pitch 95"));
        assertTrue(message(() -> CameraSpec.parse("30,15,-1")).contains("distance -1"));
        assertTrue(message(() -> CameraSpec.parse("30,15,100,200")).contains("field of view 200"));
        assertTrue(message(() -> CameraSpec.parse("30,15,NaN")).contains("distance 'NaN'"));
    }

    @Test
    void sizeReadsWidthByHeight() {
        assertEquals(new FrameSize(1280, 720), FrameSize.parse("1280x720"));
        assertEquals(new FrameSize(64, 48), FrameSize.parse("64X48"));
        assertTrue(message(() -> FrameSize.parse("1280*720")).contains("WIDTHxHEIGHT"));
        assertTrue(message(() -> FrameSize.parse("0x720")).contains("0x720"));
        assertTrue(message(() -> FrameSize.parse("99999x10")).contains("99999x10"));
    }

    private static String message(org.junit.jupiter.api.function.Executable e) {
        return assertThrows(IllegalArgumentException.class, e).getMessage();
    }
}
