package org.holdfast.window;

import static org.lwjgl.glfw.GLFW.GLFW_MOD_SHIFT;
import static org.lwjgl.glfw.GLFW.GLFW_MOUSE_BUTTON_LEFT;

import org.holdfast.render.Camera;
import org.holdfast.window.Clock;
import org.holdfast.window.FrameSource;
import org.holdfast.window.Layer;
import org.holdfast.render.ProjectionKind;
import org.holdfast.window.ViewState;
import org.holdfast.window.input.Action;
import org.holdfast.window.input.Bindings;
import org.holdfast.window.input.Request;

/**
 * Turns key presses, mouse drags, wheel turns and the passing of wall time into a new
 * {@link ViewState}. Holds the current state and the drag in progress; knows the source's span,
 * events and member positions, but nothing of windows, so tests drive it with plain events.
 */
public final class Controls {

    /** Camera turn per pixel dragged, degrees. */
    public static final double ORBIT_DEG_PER_PIXEL = 0.25;
    /** Distance factor per wheel notch or zoom key press. */
    public static final double ZOOM_STEP = 1.15;
    /** Field-of-view factor per key press. */
    public static final double FOV_STEP = 1.1;
    /** Fraction of the run one scrub step moves; a nudge moves a tenth of that. */
    public static final double SCRUB_FRACTION = 0.01;

    private final FrameSource source;
    private final int memberCount;
    private final double[] xyz = new double[3];

    private ViewState state;
    private boolean dragging;
    private double lastX;
    private double lastY;

    /** Controls starting from {@code initial} over the span and members of {@code source}. */
    public Controls(FrameSource source, ViewState initial) {
        this.source = source;
        this.memberCount = source.memberNames().size();
        this.state = initial;
        settle();
    }

    /** The view as it stands now. */
    public ViewState state() {
        return state;
    }

    /** Applies a key press (or auto-repeat); GLFW key code and modifier bits. */
    public Request keyPressed(int key, int mods) {
        return Bindings.actionFor(key, (mods & GLFW_MOD_SHIFT) != 0).map(this::apply).orElse(Request.NONE);
    }

    /** Applies one action and says what else the window must do. */
    public Request apply(Action action) {
        Request r = switch (action) {
            case SCREENSHOT -> Request.SCREENSHOT;
            case SCREENSHOT_LARGE -> Request.SCREENSHOT_LARGE;
            case QUIT -> Request.QUIT;
            case WHOLE_SCREEN -> Request.WHOLE_SCREEN;
            default -> {
                applyViewAction(action);
                yield Request.NONE;
            }
        };
        settle();
        return r;
    }

    private void applyViewAction(Action action) {
        Clock clock = state.clock();
        Camera cam = state.camera();
        double startGyr = source.startGyr();
        double endGyr = source.endGyr();
        // a run still growing scrubs in steps of its whole planned length
        double span = Math.max(endGyr - startGyr, Math.abs(source.runEndGyr() - source.runStartGyr()));
        switch (action) {
            case PLAY_PAUSE -> state = state.with(replayFromEnd(clock).withPlaying(!clock.playing()));
            case FASTER -> state = state.with(clock.scaleRate(2.0));
            case SLOWER -> state = state.with(clock.scaleRate(0.5));
            case REVERSE -> state = state.with(clock.withForward(!clock.forward()));
            case SCRUB_LATER -> moveClock(clock.tGyr() + SCRUB_FRACTION * span);
            case SCRUB_EARLIER -> moveClock(clock.tGyr() - SCRUB_FRACTION * span);
            case NUDGE_LATER -> moveClock(clock.tGyr() + 0.1 * SCRUB_FRACTION * span);
            case NUDGE_EARLIER -> moveClock(clock.tGyr() - 0.1 * SCRUB_FRACTION * span);
            case NEXT_EVENT -> jumpToEvent(clock.forward());
            case PREVIOUS_EVENT -> jumpToEvent(!clock.forward());
            case TO_START -> moveClock(startGyr);
            case TO_END -> moveClock(endGyr);
            case CHOOSE_NEXT -> choose(+1);
            case CHOOSE_PREVIOUS -> choose(-1);
            case FOLLOW_CHOSEN -> {
                if (state.chosenMember() >= 0) {
                    state = state.choosing(state.chosenMember(), true);
                }
            }
            case CENTRE_GROUP -> centreOnGroup();
            case SWITCH_DOME -> state = state.with(cam.withProjection(
                    cam.projection() == ProjectionKind.FLAT ? ProjectionKind.DOME : ProjectionKind.FLAT));
            case CLOSER -> state = state.with(cam.zoom(1.0 / ZOOM_STEP));
            case FARTHER -> state = state.with(cam.zoom(ZOOM_STEP));
            case NARROWER -> state = state.with(cam.widen(1.0 / FOV_STEP));
            case WIDER -> state = state.with(cam.widen(FOV_STEP));
            case SHOW_TRAILS -> toggle(Layer.TRAILS);
            case SHOW_NAMES -> toggle(Layer.NAMES);
            case SHOW_STARS -> toggle(Layer.STARS);
            case SHOW_TRACERS -> toggle(Layer.TRACERS);
            case SHOW_CLOCK -> toggle(Layer.CLOCK);
            case SHOW_EVENTS -> toggle(Layer.EVENTS);
            case SHOW_HELP -> toggle(Layer.HELP);
            default -> throw new IllegalStateException("not a view action: " + action);
        }
    }

    /** A mouse button went down at (x, y) window pixels. */
    public void buttonPressed(int button, double x, double y) {
        if (button == GLFW_MOUSE_BUTTON_LEFT) {
            dragging = true;
            lastX = x;
            lastY = y;
        }
    }

    /** A mouse button came up. */
    public void buttonReleased(int button) {
        if (button == GLFW_MOUSE_BUTTON_LEFT) {
            dragging = false;
        }
    }

    /**
     * The pointer moved to (x, y) window pixels (y grows downwards). While the left button is
     * held, dragging right turns the camera to the left round the target (the group appears to
     * turn with the hand) and dragging down raises the camera.
     */
    public void pointerMoved(double x, double y) {
        if (dragging) {
            double dx = x - lastX;
            double dy = y - lastY;
            state = state.with(state.camera().orbit(-dx * ORBIT_DEG_PER_PIXEL, dy * ORBIT_DEG_PER_PIXEL));
        }
        lastX = x;
        lastY = y;
    }

    /** The wheel turned by {@code notches} (positive away from the user: closer). */
    public void scrolled(double notches) {
        state = state.with(state.camera().zoom(Math.pow(ZOOM_STEP, -notches)));
    }

    /**
     * Wall time passed: the clock runs and a followed member is kept in the centre. While the
     * source is still growing, the clock waits at the end the run is growing towards, playing,
     * for the run to go on.
     */
    public void tick(double dtSeconds) {
        Clock before = state.clock();
        Clock after = before.advance(dtSeconds, source.startGyr(), source.endGyr());
        boolean towardRunEnd = before.forward() == (source.runEndGyr() >= source.runStartGyr());
        if (before.playing() && !after.playing() && towardRunEnd && source.growing()) {
            after = after.withPlaying(true);
        }
        state = state.with(after);
        settle();
    }

    /** Playing again from the end the clock stopped at starts over from the other end. */
    private Clock replayFromEnd(Clock clock) {
        double startGyr = source.startGyr();
        double endGyr = source.endGyr();
        if (clock.playing() || source.growing()) {
            return clock;
        }
        if (clock.forward() && clock.tGyr() >= endGyr) {
            return clock.at(startGyr, startGyr, endGyr);
        }
        if (!clock.forward() && clock.tGyr() <= startGyr) {
            return clock.at(endGyr, startGyr, endGyr);
        }
        return clock;
    }

    private void moveClock(double tGyr) {
        state = state.with(state.clock().at(tGyr, source.startGyr(), source.endGyr()));
    }

    private void jumpToEvent(boolean later) {
        double startGyr = source.startGyr();
        double endGyr = source.endGyr();
        double[] eventsGyr = source.eventTimesGyr();
        java.util.Arrays.sort(eventsGyr);
        double t = state.clock().tGyr();
        double eps = 1e-9 * Math.max(1.0, Math.abs(endGyr - startGyr));
        if (later) {
            for (double e : eventsGyr) {
                if (e > t + eps && e <= endGyr) {
                    moveClock(e);
                    return;
                }
            }
        } else {
            for (int i = eventsGyr.length - 1; i >= 0; i--) {
                if (eventsGyr[i] < t - eps && eventsGyr[i] >= startGyr) {
                    moveClock(eventsGyr[i]);
                    return;
                }
            }
        }
    }

    private void choose(int step) {
        if (memberCount == 0) {
            return;
        }
        int c = state.chosenMember();
        int next = c < 0 ? (step > 0 ? 0 : memberCount - 1) : Math.floorMod(c + step, memberCount);
        state = state.choosing(next, state.following());
    }

    private void centreOnGroup() {
        double sx = 0;
        double sy = 0;
        double sz = 0;
        int n = 0;
        for (int i = 0; i < memberCount; i++) {
            if (source.memberCentreKpc(i, state.clock().tGyr(), xyz)) {
                sx += xyz[0];
                sy += xyz[1];
                sz += xyz[2];
                n++;
            }
        }
        Camera cam = state.camera();
        cam = n == 0 ? cam.withTarget(0, 0, 0) : cam.withTarget(sx / n, sy / n, sz / n);
        state = new ViewState(cam, state.clock(), state.layers(), state.chosenMember(), false);
    }

    private void toggle(Layer layer) {
        state = state.with(state.layers().toggle(layer));
    }

    /** Keeps the camera on a followed member whose position is known. */
    private void settle() {
        if (state.following()
                && source.memberCentreKpc(state.chosenMember(), state.clock().tGyr(), xyz)) {
            state = state.with(state.camera().withTarget(xyz[0], xyz[1], xyz[2]));
        }
    }
}
