package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.lwjgl.glfw.GLFW.*;

import org.holdfast.render.Camera;
import org.holdfast.window.Clock;
import org.holdfast.window.Layer;
import org.holdfast.window.Layers;
import org.holdfast.window.PatternSource;
import org.holdfast.render.ProjectionKind;
import org.holdfast.window.ViewState;
import org.holdfast.window.Controls;
import org.holdfast.window.input.Request;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** Events in, camera and clock out: the controls without a window. */
class ControlsTest {

    private PatternSource source;
    private Controls controls;

    @BeforeEach
    void setUp() {
        source = new PatternSource();
        controls = new Controls(source, ViewState.of(Camera.looking(30, 10, 500), Clock.pausedAt(1.0, 0.5)));
    }

    private ViewState press(int key) {
        assertEquals(Request.NONE, controls.keyPressed(key, 0));
        return controls.state();
    }

    @Test
    void spacePlaysAndTimePassesAtTheRate() {
        controls.tick(1.0);
        assertEquals(1.0, controls.state().clock().tGyr(), 0, "paused clock must not move");
        assertTrue(press(GLFW_KEY_SPACE).clock().playing());
        controls.tick(2.0);
        assertEquals(2.0, controls.state().clock().tGyr(), 1e-15);
        assertFalse(press(GLFW_KEY_SPACE).clock().playing());
    }

    @Test
    void fasterSlowerAndReverse() {
        assertEquals(1.0, press(GLFW_KEY_UP).clock().rateGyrPerS(), 0);
        assertEquals(0.5, press(GLFW_KEY_DOWN).clock().rateGyrPerS(), 0);
        press(GLFW_KEY_R);
        press(GLFW_KEY_SPACE);
        controls.tick(1.0);
        assertEquals(0.5, controls.state().clock().tGyr(), 1e-15);
    }

    @Test
    void scrubStepsAreFractionsOfTheRun() {
        double span = PatternSource.END_GYR - PatternSource.START_GYR;
        assertEquals(1.0 + 0.01 * span, press(GLFW_KEY_RIGHT).clock().tGyr(), 1e-12);
        assertEquals(1.0, press(GLFW_KEY_LEFT).clock().tGyr(), 1e-12);
        controls.keyPressed(GLFW_KEY_RIGHT, GLFW_MOD_SHIFT);
        assertEquals(1.0 + 0.001 * span, controls.state().clock().tGyr(), 1e-12);
        assertEquals(PatternSource.END_GYR, press(GLFW_KEY_END).clock().tGyr(), 0);
        assertEquals(PatternSource.END_GYR, press(GLFW_KEY_RIGHT).clock().tGyr(), 0, "scrub stops at the end");
        assertEquals(PatternSource.START_GYR, press(GLFW_KEY_HOME).clock().tGyr(), 0);
    }

    @Test
    void nextEventFollowsTheClocksDirection() {
        assertEquals(2.0, press(GLFW_KEY_N).clock().tGyr(), 0);
        assertEquals(5.5, press(GLFW_KEY_N).clock().tGyr(), 0);
        assertEquals(7.25, press(GLFW_KEY_N).clock().tGyr(), 0);
        assertEquals(7.25, press(GLFW_KEY_N).clock().tGyr(), 0, "no event later: the clock stays");
        assertEquals(5.5, press(GLFW_KEY_B).clock().tGyr(), 0);
        press(GLFW_KEY_R);
        assertEquals(2.0, press(GLFW_KEY_N).clock().tGyr(), 0, "running backwards, next is earlier");
        assertEquals(5.5, press(GLFW_KEY_B).clock().tGyr(), 0);
    }

    @Test
    void playingAgainAtTheEndStartsOver() {
        press(GLFW_KEY_END);
        ViewState v = press(GLFW_KEY_SPACE);
        assertEquals(PatternSource.START_GYR, v.clock().tGyr(), 0);
        assertTrue(v.clock().playing());
    }

    @Test
    void dragOrbitsAndWheelZooms() {
        controls.buttonPressed(GLFW_MOUSE_BUTTON_LEFT, 100, 100);
        controls.pointerMoved(140, 80);
        Camera c = controls.state().camera();
        assertEquals(30 - 40 * Controls.ORBIT_DEG_PER_PIXEL, c.yawDeg(), 1e-12);
        assertEquals(10 - 20 * Controls.ORBIT_DEG_PER_PIXEL, c.pitchDeg(), 1e-12);
        controls.buttonReleased(GLFW_MOUSE_BUTTON_LEFT);
        controls.pointerMoved(500, 500);
        assertEquals(c, controls.state().camera(), "moving without the button held changes nothing");
        controls.scrolled(2);
        assertEquals(500 / (Controls.ZOOM_STEP * Controls.ZOOM_STEP), controls.state().camera().distanceKpc(), 1e-9);
        controls.scrolled(-2);
        assertEquals(500, controls.state().camera().distanceKpc(), 1e-9);
        controls.buttonPressed(GLFW_MOUSE_BUTTON_RIGHT, 0, 0);
        controls.pointerMoved(300, 300);
        assertEquals(c.yawDeg(), controls.state().camera().yawDeg(), 0, "only the left button turns");
    }

    @Test
    void chooseAndFollowAMember() {
        assertEquals(0, press(GLFW_KEY_TAB).chosenMember());
        assertEquals(1, press(GLFW_KEY_TAB).chosenMember());
        controls.keyPressed(GLFW_KEY_TAB, GLFW_MOD_SHIFT);
        controls.keyPressed(GLFW_KEY_TAB, GLFW_MOD_SHIFT);
        assertEquals(2, controls.state().chosenMember(), "choosing wraps round");
        ViewState v = press(GLFW_KEY_C);
        assertTrue(v.following());
        double[] at = new double[3];
        source.memberCentreKpc(2, 1.0, at);
        assertEquals(at[0], v.camera().targetXKpc(), 0);
        assertEquals(at[1], v.camera().targetYKpc(), 0);
        assertEquals(at[2], v.camera().targetZKpc(), 0);
        press(GLFW_KEY_SPACE);
        controls.tick(1.0);
        source.memberCentreKpc(2, 1.5, at);
        assertEquals(at[0], controls.state().camera().targetXKpc(), 1e-12, "camera rides along");
        assertEquals(at[1], controls.state().camera().targetYKpc(), 1e-12);
        ViewState g = press(GLFW_KEY_G);
        assertFalse(g.following());
        // Three members 120 degrees apart on a circle: their mean lies on the axis (common practice).
        assertEquals(0, g.camera().targetXKpc(), 1e-12);
        assertEquals(0, g.camera().targetYKpc(), 1e-12);
        assertEquals(10.0, g.camera().targetZKpc(), 1e-12);
    }

    @Test
    void domeAndFieldOfViewKeys() {
        assertEquals(ProjectionKind.DOME, press(GLFW_KEY_V).camera().projection());
        assertEquals(ProjectionKind.FLAT, press(GLFW_KEY_V).camera().projection());
        assertEquals(50 * Controls.FOV_STEP, press(GLFW_KEY_RIGHT_BRACKET).camera().fovDeg(), 1e-12);
        assertEquals(50, press(GLFW_KEY_LEFT_BRACKET).camera().fovDeg(), 1e-12);
        assertEquals(500 / Controls.ZOOM_STEP, press(GLFW_KEY_EQUAL).camera().distanceKpc(), 1e-9);
        assertEquals(500, press(GLFW_KEY_MINUS).camera().distanceKpc(), 1e-9);
    }

    @Test
    void numberKeysSwitchLayers() {
        int[] keys = {GLFW_KEY_1, GLFW_KEY_2, GLFW_KEY_3, GLFW_KEY_4, GLFW_KEY_5, GLFW_KEY_6, GLFW_KEY_H};
        Layer[] layers = {Layer.TRAILS, Layer.NAMES, Layer.STARS, Layer.TRACERS, Layer.CLOCK, Layer.EVENTS, Layer.HELP};
        for (int i = 0; i < keys.length; i++) {
            Layers before = controls.state().layers();
            Layers after = press(keys[i]).layers();
            assertEquals(before.toggle(layers[i]), after, "only " + layers[i] + " changes");
            assertEquals(!before.has(layers[i]), after.has(layers[i]), layers[i].name());
        }
        assertTrue(controls.state().layers().has(Layer.HELP), "help starts off, one press shows it");
        assertFalse(controls.state().layers().has(Layer.TRAILS));
    }

    @Test
    void requestKeysAskTheWindow() {
        assertEquals(Request.SCREENSHOT, controls.keyPressed(GLFW_KEY_P, 0));
        assertEquals(Request.SCREENSHOT_LARGE, controls.keyPressed(GLFW_KEY_P, GLFW_MOD_SHIFT));
        assertEquals(Request.QUIT, controls.keyPressed(GLFW_KEY_ESCAPE, 0));
        assertEquals(Request.QUIT, controls.keyPressed(GLFW_KEY_Q, 0));
        ViewState before = controls.state();
        assertEquals(Request.NONE, controls.keyPressed(GLFW_KEY_F12, 0));
        assertEquals(before, controls.state(), "an unbound key changes nothing");
    }

    /** A pattern whose span grows while a run is said to be still going. */
    private static final class GrowingSource extends PatternSource {
        double end = 2.0;
        boolean growing = true;

        @Override
        public double endGyr() {
            return end;
        }

        @Override
        public boolean growing() {
            return growing;
        }

        @Override
        public double runEndGyr() {
            return END_GYR;
        }
    }

    @Test
    void theClockWaitsAtTheEndOfARunStillGrowing() {
        GrowingSource g = new GrowingSource();
        Controls c = new Controls(g, ViewState.of(Camera.looking(30, 10, 500), new Clock(1.0, 1.0, true, true)));
        c.tick(3.0);
        assertEquals(2.0, c.state().clock().tGyr(), 0, "held at the end reached so far");
        assertTrue(c.state().clock().playing(), "still playing, waiting for the run");
        g.end = 5.0;
        c.tick(1.5);
        assertEquals(3.5, c.state().clock().tGyr(), 1e-12, "goes on once the run has gone on");
        g.growing = false;
        c.tick(5.0);
        assertEquals(5.0, c.state().clock().tGyr(), 0);
        assertFalse(c.state().clock().playing(), "a finished run stops the clock at its end");
    }

    @Test
    void playingBackwardsIntoTheStartOfAGrowingRunStillStops() {
        GrowingSource g = new GrowingSource();
        Controls c = new Controls(g, ViewState.of(Camera.looking(30, 10, 500), new Clock(1.0, 1.0, false, true)));
        c.tick(3.0);
        assertEquals(PatternSource.START_GYR, c.state().clock().tGyr(), 0);
        assertFalse(c.state().clock().playing(), "only the growing end holds the clock");
    }

    @Test
    void scrubStepsOfAGrowingRunAreFractionsOfItsPlannedLength() {
        GrowingSource g = new GrowingSource();
        Controls c = new Controls(g, ViewState.of(Camera.looking(30, 10, 500), Clock.pausedAt(1.0, 0.5)));
        c.keyPressed(GLFW_KEY_RIGHT, 0);
        assertEquals(1.0 + Controls.SCRUB_FRACTION * (PatternSource.END_GYR - PatternSource.START_GYR),
                c.state().clock().tGyr(), 1e-12);
        c.keyPressed(GLFW_KEY_END, 0);
        assertEquals(2.0, c.state().clock().tGyr(), 0, "the end is where the run has got to");
    }
}
