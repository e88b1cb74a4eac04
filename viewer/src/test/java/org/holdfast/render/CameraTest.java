package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.joml.Matrix4d;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

import org.holdfast.render.ProjectionKind;
import org.holdfast.render.Camera;

class CameraTest {

    private static final double EPS = 1e-12;

    @Test
    void eyeSitsAtSphericalPosition() {
        // Spherical to Cartesian with z up (common practice).
        Camera c = new Camera(1, 2, 3, 10, 90, 0, 50, ProjectionKind.FLAT);
        Vector3d eye = c.eyeKpc(new Vector3d());
        assertEquals(1, eye.x, 1e-12 * 10);
        assertEquals(12, eye.y, EPS * 10);
        assertEquals(3, eye.z, EPS * 10);
        Camera up = new Camera(0, 0, 0, 10, 0, 89, 50, ProjectionKind.FLAT);
        Vector3d e2 = up.eyeKpc(new Vector3d());
        assertEquals(10 * Math.sin(Math.toRadians(89)), e2.z, EPS * 10);
        assertEquals(10.0, e2.length(), EPS * 10);
    }

    @Test
    void viewMatrixPutsTargetStraightAheadAtTheDistance() {
        Camera c = new Camera(5, -7, 2, 250, 33, -20, 50, ProjectionKind.FLAT);
        Vector3d t = c.viewMatrix(new Matrix4d()).transformPosition(new Vector3d(5, -7, 2));
        assertEquals(0, t.x, 1e-9);
        assertEquals(0, t.y, 1e-9);
        assertEquals(-250, t.z, 1e-9);
        // World +z points up on screen (camera +y half-space) when the camera is level.
        Camera level = Camera.looking(0, 0, 100);
        Vector3d above = level.viewMatrix(new Matrix4d()).transformPosition(new Vector3d(0, 0, 1));
        assertEquals(1.0, above.y, 1e-12);
    }

    @Test
    void orbitWrapsYawAndStopsPitchAtTheLimit() {
        Camera c = Camera.looking(350, 80, 100).orbit(20, 30);
        assertEquals(10, c.yawDeg(), 1e-12);
        assertEquals(Camera.PITCH_LIMIT_DEG, c.pitchDeg(), 0);
        assertEquals(-Camera.PITCH_LIMIT_DEG, c.orbit(0, -500).pitchDeg(), 0);
        assertEquals(350, Camera.looking(-10, 0, 100).yawDeg(), 1e-12);
    }

    @Test
    void zoomAndWidenStayWithinLimits() {
        Camera c = Camera.looking(0, 0, 100);
        assertEquals(50, c.zoom(0.5).distanceKpc(), 1e-12);
        assertEquals(Camera.MIN_DISTANCE_KPC, c.zoom(1e-9).distanceKpc(), 0);
        assertEquals(Camera.MAX_DISTANCE_KPC, c.zoom(1e9).distanceKpc(), 0);
        assertEquals(Camera.MAX_FOV_DEG, c.widen(100).fovDeg(), 0);
        assertEquals(Camera.MIN_FOV_DEG, c.widen(0.001).fovDeg(), 0);
    }

    @Test
    void rejectsImpossibleCameras() {
        assertThrows(IllegalArgumentException.class, () -> Camera.looking(0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> Camera.looking(0, 90, 10));
        assertThrows(IllegalArgumentException.class, () -> Camera.looking(Double.NaN, 0, 10));
        assertThrows(IllegalArgumentException.class, () -> Camera.looking(0, 0, 10).withFov(179));
    }
}
