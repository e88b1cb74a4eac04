package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.render.CameraPose;
import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.render.SceneFrame;
import org.joml.Quaterniond;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/** A following camera is its track's pose moved by the member's centre, orientation unchanged. */
class FollowTargetTest {

    private static SceneFrame frame(double t, String[] names, double[] x) {
        int n = names.length;
        return new SceneFrame().setClock(t, 1).setGalaxies(n, names, new int[n], x, new double[n], new double[n]);
    }

    private static CameraPose aroundOrigin() {
        return new CameraPose().lookAt(new Vector3d(0, -300, 100), new Vector3d(), new Vector3d(0, 0, 1), 40);
    }

    @Test
    void thePoseRidesWithTheMember() {
        FollowTarget f = new FollowTarget("Vell", List.of());
        CameraPose pose = aroundOrigin();
        Quaterniond before = new Quaterniond(pose.orientation());
        f.shift(frame(1, new String[] {"Ombrine", "Vell"}, new double[] {-50, 700}), pose);
        assertEquals(700, pose.eyeKpc().x(), 0);
        assertEquals(-300, pose.eyeKpc().y(), 0);
        assertEquals(100, pose.eyeKpc().z(), 0);
        // the same orientation, up to the rounding of re-normalising a unit quaternion
        assertTrue(before.equals(pose.orientation(), 1e-15), "looks the same way, at the member now");
        assertEquals(40, pose.fovDeg(), 0);
    }

    @Test
    void afterAMergerItRidesWithTheSurvivorAndWithoutAnyoneItHoldsItsLastShift() {
        FateEvent merger = new FateEvent(2, RunEvent.Kind.MERGED, List.of("Ombrine", "Vell"));
        FollowTarget f = new FollowTarget("Vell", List.of(merger));
        f.shift(frame(1, new String[] {"Ombrine", "Vell"}, new double[] {-50, 700}), aroundOrigin());
        CameraPose after = f.shift(frame(3, new String[] {"Ombrine"}, new double[] {40}), aroundOrigin());
        assertEquals(40, after.eyeKpc().x(), 0, "Vell merged into Ombrine: ride with Ombrine");
        FollowTarget lone = new FollowTarget("Vell", List.of());
        lone.shift(frame(1, new String[] {"Vell"}, new double[] {25}), aroundOrigin());
        CameraPose held = lone.shift(frame(2, new String[] {"Ombrine"}, new double[] {40}), aroundOrigin());
        assertEquals(25, held.eyeKpc().x(), 0, "nobody to ride with: the last shift holds");
    }
}
