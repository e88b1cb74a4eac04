package org.holdfast.window;

import org.holdfast.render.Camera;

/**
 * Everything a frame depends on besides the run itself: the camera, the clock, the layers shown
 * and which member is chosen. Immutable; the controls replace it as keys and the mouse act.
 *
 * @param camera        where the camera is and how it projects
 * @param clock         the time shown and how it runs
 * @param layers        what the renderer draws
 * @param chosenMember  index into {@link FrameSource#memberNames()} of the chosen member, or -1
 * @param following     true while the camera target rides along with the chosen member
 */
public record ViewState(Camera camera, Clock clock, Layers layers, int chosenMember, boolean following) {

    public ViewState {
        if (camera == null || clock == null || layers == null) {
            throw new IllegalArgumentException("camera, clock and layers must be given");
        }
        if (chosenMember < -1) {
            throw new IllegalArgumentException("chosen member " + chosenMember);
        }
        if (following && chosenMember < 0) {
            throw new IllegalArgumentException("cannot follow without a chosen member");
        }
    }

    /** A view with no member chosen and the default layers. */
    public static ViewState of(Camera camera, Clock clock) {
        return new ViewState(camera, clock, Layers.DEFAULT, -1, false);
    }

    public ViewState with(Camera c) {
        return new ViewState(c, clock, layers, chosenMember, following);
    }

    public ViewState with(Clock c) {
        return new ViewState(camera, c, layers, chosenMember, following);
    }

    public ViewState with(Layers l) {
        return new ViewState(camera, clock, l, chosenMember, following);
    }

    public ViewState choosing(int member, boolean follow) {
        return new ViewState(camera, clock, layers, member, follow);
    }
}
