package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.render.CameraPose;
import org.holdfast.render.projection.FlatProjection;
import org.joml.Quaterniond;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/**
 * Camera tracks. Keyframes: Catmull-Rom positions (Catmull and Rom 1974, in Barnhill and
 * Riesenfeld, Computer Aided Geometric Design, Academic Press; pages not checked) pass through every keyframe
 * with a continuous velocity; slerp (Shoemake 1985, SIGGRAPH Computer Graphics 19(3), 245)
 * turns at a constant rate, so halfway in time is halfway in angle.
 */
class CameraTrackTest {

    static final Vector3d Z = new Vector3d(0, 0, 1);

    static List<Keyframe> keys() {
        return List.of(
                new Keyframe(0, new Vector3d(500, 0, 100), new Vector3d(), Z, 50),
                new Keyframe(4, new Vector3d(0, 400, 150), new Vector3d(), Z, 40),
                new Keyframe(10, new Vector3d(-300, 0, 50), new Vector3d(10, 0, 0), Z, 60),
                new Keyframe(12, new Vector3d(-100, -200, 20), new Vector3d(), Z, 45));
    }

    /** Pixel where the world point lands for a pose (flat, 200 x 100). */
    static double[] onScreen(CameraPose pose, Vector3d world) {
        double[] m = pose.worldToCamera(new double[9]);
        Vector3d d = new Vector3d(world).sub(pose.eyeKpc());
        double[] out = new double[2];
        FlatProjection p = new FlatProjection(200, 100, pose.fovDeg());
        assertTrue(p.project(m[0] * d.x + m[1] * d.y + m[2] * d.z, m[3] * d.x + m[4] * d.y + m[5] * d.z,
                m[6] * d.x + m[7] * d.y + m[8] * d.z, out));
        return out;
    }

    @Test
    void passesThroughEveryKeyframeFacingItsTarget() {
        KeyframeTrack track = new KeyframeTrack(keys());
        CameraPose pose = new CameraPose();
        for (Keyframe k : keys()) {
            track.poseAt(k.atS(), pose);
            assertEquals(0, pose.eyeKpc().distance(k.eyeKpc()), 1e-9, "eye at " + k.atS() + " s");
            assertEquals(k.fovDeg(), pose.fovDeg(), 1e-12);
            double[] px = onScreen(pose, new Vector3d(k.targetKpc()));
            assertEquals(100, px[0], 1e-7, "target at the centre at " + k.atS() + " s");
            assertEquals(50, px[1], 1e-7);
        }
    }

    @Test
    void velocityIsContinuousAcrossKeyframes() {
        KeyframeTrack track = new KeyframeTrack(keys());
        CameraPose a = new CameraPose();
        CameraPose b = new CameraPose();
        double h = 1e-5;
        for (double at : new double[] {4, 10}) {
            Vector3d before = new Vector3d(track.poseAt(at, a).eyeKpc()).sub(track.poseAt(at - h, b).eyeKpc()).div(h);
            Vector3d after = new Vector3d(track.poseAt(at + h, a).eyeKpc()).sub(track.poseAt(at, b).eyeKpc()).div(h);
            // O(h) difference of one-sided quotients; the velocity itself is ~100 kpc/s here
            assertEquals(0, before.distance(after), 1e-2, "at " + at + " s: " + before + " vs " + after);
        }
    }

    @Test
    void halfwayInTimeIsHalfwayInAngle() {
        KeyframeTrack track = new KeyframeTrack(keys());
        CameraPose pose = new CameraPose();
        Quaterniond q0 = new Quaterniond(track.poseAt(0, pose).orientation());
        Quaterniond q1 = new Quaterniond(track.poseAt(4, pose).orientation());
        Quaterniond mid = new Quaterniond(track.poseAt(2, pose).orientation());
        double whole = angle(q0, q1);
        assertTrue(whole > 0.5, "the keyframes differ in orientation");
        assertEquals(whole / 2, angle(q0, mid), 1e-9);
        assertEquals(whole / 2, angle(mid, q1), 1e-9);
    }

    private static double angle(Quaterniond a, Quaterniond b) {
        return 2 * Math.acos(Math.min(1, Math.abs(a.dot(b))));
    }

    @Test
    void holdsStillOutsideTheKeyframes() {
        KeyframeTrack track = new KeyframeTrack(keys());
        CameraPose pose = new CameraPose();
        assertEquals(0, track.poseAt(-3, pose).eyeKpc().distance(new Vector3d(500, 0, 100)), 1e-12);
        assertEquals(0, track.poseAt(99, pose).eyeKpc().distance(new Vector3d(-100, -200, 20)), 1e-12);
    }

    @Test
    void orbitCirclesAtAFixedDistanceFacingTheCentre() {
        Vector3d centre = new Vector3d(10, -5, 3);
        OrbitTrack orbit = new OrbitTrack(centre, Z, 800, 150, 1, 20, 45);
        CameraPose pose = new CameraPose();
        double expected = Math.hypot(800, 150);
        for (double s = 0; s <= 20; s += 1.3) {
            orbit.poseAt(s, pose);
            assertEquals(expected, pose.eyeKpc().distance(centre), 1e-9);
            assertEquals(150, pose.eyeKpc().z() - centre.z, 1e-9, "steady height");
            double[] px = onScreen(pose, centre);
            assertEquals(100, px[0], 1e-7);
            assertEquals(50, px[1], 1e-7);
        }
        assertEquals(0, orbit.poseAt(0, pose).eyeKpc().distance(new Vector3d(orbit.poseAt(20, new CameraPose()).eyeKpc())),
                1e-9, "one full turn comes back to the start");
    }

    @Test
    void approachEasesInAndOut() {
        Vector3d from = new Vector3d(0, -2000, 400);
        Vector3d to = new Vector3d(0, -300, 60);
        ApproachTrack approach = new ApproachTrack(from, to, new Vector3d(), Z, 15, 50);
        CameraPose a = new CameraPose();
        CameraPose b = new CameraPose();
        assertEquals(0, approach.poseAt(0, a).eyeKpc().distance(from), 1e-12);
        assertEquals(0, approach.poseAt(15, a).eyeKpc().distance(to), 1e-9);
        double h = 1e-4;
        double startSpeed = approach.poseAt(h, a).eyeKpc().distance(approach.poseAt(0, b).eyeKpc()) / h;
        double midSpeed = approach.poseAt(7.5 + h, a).eyeKpc().distance(approach.poseAt(7.5, b).eyeKpc()) / h;
        assertTrue(startSpeed < 1e-3 * midSpeed, "starts at rest: " + startSpeed + " vs " + midSpeed);
        // smoothstep peaks at 1.5 x the mean speed in the middle
        assertEquals(1.5 * from.distance(to) / 15, midSpeed, 1e-3 * midSpeed);
    }
}
