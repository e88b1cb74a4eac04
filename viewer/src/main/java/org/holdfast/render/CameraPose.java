package org.holdfast.render;

import org.joml.Matrix3d;
import org.joml.Quaterniond;
import org.joml.Quaterniondc;
import org.joml.Vector3d;
import org.joml.Vector3dc;

/**
 * Where the camera is, which way it faces and how wide it sees. The orientation is the
 * rotation that takes camera axes (x right, y up, looking along -z) into world axes. Mutable
 * and reusable, so a film can update one pose per frame without allocating.
 */
public final class CameraPose {

    private final Vector3d eyeKpc = new Vector3d(0, 0, 100);
    private final Quaterniond orientation = new Quaterniond();
    private double fovDeg = 50;
    /** Distance from the eye to the point looked at, kpc; NaN when the pose was set without one. */
    private double focusKpc = Double.NaN;
    private final Matrix3d scratch = new Matrix3d();

    /** Sets the pose from an eye position, a point to look at and an up direction. */
    public CameraPose lookAt(Vector3dc eyeKpc, Vector3dc targetKpc, Vector3dc up, double fovDeg) {
        orientationLookingAt(eyeKpc, targetKpc, up, orientation);
        this.eyeKpc.set(eyeKpc);
        this.fovDeg = fovDeg;
        this.focusKpc = eyeKpc.distance(targetKpc);
        return this;
    }

    /** Sets the distance to the point looked at (the scale bar's depth), kpc. */
    public CameraPose focus(double kpc) {
        this.focusKpc = kpc;
        return this;
    }

    /** Distance from the eye to the point looked at, kpc; NaN when unknown. */
    public double focusKpc() {
        return focusKpc;
    }

    /** Sets the pose directly; the distance to the point looked at is kept (a shift moves both). */
    public CameraPose set(Vector3dc eyeKpc, Quaterniondc orientation, double fovDeg) {
        this.eyeKpc.set(eyeKpc);
        this.orientation.set(orientation).normalize();
        this.fovDeg = fovDeg;
        return this;
    }

    /** Copies another pose. */
    public CameraPose set(CameraPose other) {
        set(other.eyeKpc, other.orientation, other.fovDeg);
        focusKpc = other.focusKpc;
        return this;
    }

    /**
     * The camera-to-world rotation of a camera at {@code eye} facing {@code target} with
     * {@code up} towards the top of the frame.
     *
     * @throws IllegalArgumentException if the target is at the eye or up is along the view
     */
    public static Quaterniond orientationLookingAt(Vector3dc eye, Vector3dc target, Vector3dc up,
            Quaterniond dest) {
        Vector3d forward = new Vector3d(target).sub(eye);
        if (!(forward.lengthSquared() > 0)) {
            throw new IllegalArgumentException("camera target coincides with the eye");
        }
        forward.normalize();
        Vector3d right = new Vector3d(forward).cross(up);
        if (!(right.length() > 1e-9 * up.length())) {
            throw new IllegalArgumentException("camera up direction is parallel to the view direction");
        }
        right.normalize();
        Vector3d trueUp = new Vector3d(right).cross(forward);
        Matrix3d m = new Matrix3d(right.x, right.y, right.z, trueUp.x, trueUp.y, trueUp.z,
                -forward.x, -forward.y, -forward.z);
        return dest.setFromNormalized(m);
    }

    public Vector3dc eyeKpc() {
        return eyeKpc;
    }

    public Quaterniondc orientation() {
        return orientation;
    }

    public double fovDeg() {
        return fovDeg;
    }

    /** The unit view direction in world axes. */
    public Vector3d forward(Vector3d dest) {
        return orientation.transform(dest.set(0, 0, -1));
    }

    /**
     * The world-to-camera rotation as a row-major 3x3 array: camera = m * (world - eye).
     *
     * @param m9 receives 9 values
     */
    public double[] worldToCamera(double[] m9) {
        orientation.get(scratch);
        // rows of the inverse rotation are the columns of the camera-to-world rotation
        m9[0] = scratch.m00;
        m9[1] = scratch.m01;
        m9[2] = scratch.m02;
        m9[3] = scratch.m10;
        m9[4] = scratch.m11;
        m9[5] = scratch.m12;
        m9[6] = scratch.m20;
        m9[7] = scratch.m21;
        m9[8] = scratch.m22;
        return m9;
    }
}
