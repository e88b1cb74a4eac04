package org.holdfast.film;

import java.util.List;

import org.holdfast.render.CameraPose;
import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.render.SceneFrame;
import org.joml.Vector3d;

/**
 * The member a film's camera rides with ({@code follow} in {@code [film]}): each frame's pose,
 * built by the camera track around the origin, is moved by that member's centre in the frame.
 * Once the member has merged, the camera rides with the galaxy that took it in; a frame where
 * neither is found (before the first one is known) keeps the last shift. Reused frame after
 * frame, without allocating.
 */
final class FollowTarget {

    private final String name;
    private final List<FateEvent> events;
    private final Vector3d shift = new Vector3d();
    private final Vector3d eye = new Vector3d();

    FollowTarget(String name, List<FateEvent> events) {
        this.name = name;
        this.events = events;
    }

    /** Moves {@code pose} (made around the origin) to ride with the member in {@code frame}. */
    CameraPose shift(SceneFrame frame, CameraPose pose) {
        String who = name;
        for (int hop = 0; hop <= events.size(); hop++) {
            int g = indexOf(frame, who);
            if (g >= 0) {
                shift.set(frame.galaxyX(g), frame.galaxyY(g), frame.galaxyZ(g));
                break;
            }
            String survivor = survivorOf(who);
            if (survivor == null) {
                break;
            }
            who = survivor;
        }
        eye.set(pose.eyeKpc()).add(shift);
        return pose.set(eye, pose.orientation(), pose.fovDeg());
    }

    private static int indexOf(SceneFrame frame, String member) {
        for (int g = 0; g < frame.galaxyCount(); g++) {
            if (frame.name(g).equals(member)) {
                return g;
            }
        }
        return -1;
    }

    /** The galaxy that took {@code member} in by a merger, or null. */
    private String survivorOf(String member) {
        for (FateEvent e : events) {
            if (e.kind() == RunEvent.Kind.MERGED && e.members().indexOf(member) > 0) {
                return e.members().get(0);
            }
        }
        return null;
    }
}
