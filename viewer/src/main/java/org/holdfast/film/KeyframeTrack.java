package org.holdfast.film;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.holdfast.render.CameraPose;
import org.holdfast.render.SnapshotInterpolation;
import org.joml.Quaterniond;
import org.joml.Vector3d;

/**
 * A camera moving smoothly through keyframes. The eye position and the field of view follow a
 * Catmull-Rom spline (Catmull and Rom 1974, "A class of local interpolating splines", in
 * Barnhill and Riesenfeld, Computer Aided Geometric Design, Academic Press; pages not checked): a cubic
 * Hermite curve on each interval whose tangent at a keyframe is the chord between its
 * neighbours, divided by their time apart, so the motion is continuous in velocity even when
 * keyframes are unevenly spaced; one-sided chords at the ends. The orientation is the spherical
 * linear interpolation (slerp) of the keyframes' orientations (Shoemake 1985, SIGGRAPH Computer
 * Graphics 19(3), 245). Before the first keyframe and after the last, the camera holds still.
 */
public final class KeyframeTrack implements CameraTrack {

    private final double[] t;
    private final double[][] eye;
    private final double[] fov;
    /** Distance from the eye to the point looked at, per keyframe (the scale bar's depth). */
    private final double[] focus;
    private final Quaterniond[] orientation;
    private final Quaterniond scratch = new Quaterniond();
    private final Vector3d eyeScratch = new Vector3d();

    /** @param keys at least one keyframe, at distinct film seconds */
    public KeyframeTrack(List<Keyframe> keys) {
        if (keys.isEmpty()) {
            throw new IllegalArgumentException("a keyframe track needs at least one keyframe");
        }
        List<Keyframe> sorted = new ArrayList<>(keys);
        sorted.sort(Comparator.comparingDouble(Keyframe::atS));
        int n = sorted.size();
        t = new double[n];
        eye = new double[3][n];
        fov = new double[n];
        focus = new double[n];
        orientation = new Quaterniond[n];
        for (int i = 0; i < n; i++) {
            Keyframe k = sorted.get(i);
            if (i > 0 && !(k.atS() > t[i - 1])) {
                throw new IllegalArgumentException("two keyframes at film second " + k.atS());
            }
            t[i] = k.atS();
            eye[0][i] = k.eyeKpc().x();
            eye[1][i] = k.eyeKpc().y();
            eye[2][i] = k.eyeKpc().z();
            fov[i] = k.fovDeg();
            focus[i] = k.eyeKpc().distance(k.targetKpc());
            orientation[i] = CameraPose.orientationLookingAt(k.eyeKpc(), k.targetKpc(), k.up(), new Quaterniond());
            if (i > 0 && orientation[i].dot(orientation[i - 1]) < 0) {
                // take the short way round: q and -q are the same rotation
                orientation[i].mul(-1);
            }
        }
    }

    @Override
    public CameraPose poseAt(double filmS, CameraPose dest) {
        int n = t.length;
        if (n == 1 || filmS <= t[0]) {
            return dest.set(eyeScratch.set(eye[0][0], eye[1][0], eye[2][0]), orientation[0], fov[0]).focus(focus[0]);
        }
        if (filmS >= t[n - 1]) {
            return dest.set(eyeScratch.set(eye[0][n - 1], eye[1][n - 1], eye[2][n - 1]), orientation[n - 1], fov[n - 1])
                    .focus(focus[n - 1]);
        }
        int i = segment(filmS);
        double u = (filmS - t[i]) / (t[i + 1] - t[i]);
        eyeScratch.set(spline(eye[0], i, filmS), spline(eye[1], i, filmS), spline(eye[2], i, filmS));
        orientation[i].slerp(orientation[i + 1], u, scratch);
        double f = Math.max(1e-3, Math.min(179, spline(fov, i, filmS)));
        return dest.set(eyeScratch, scratch, f).focus(focus[i] + (focus[i + 1] - focus[i]) * u);
    }

    private int segment(double s) {
        int lo = 0;
        int hi = t.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (t[mid] <= s) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private double spline(double[] p, int i, double s) {
        return SnapshotInterpolation.hermite(t[i], p[i], tangent(p, i), t[i + 1], p[i + 1], tangent(p, i + 1), s);
    }

    /** Catmull-Rom tangent at keyframe i, per film second. */
    private double tangent(double[] p, int i) {
        int a = Math.max(0, i - 1);
        int b = Math.min(t.length - 1, i + 1);
        return (p[b] - p[a]) / (t[b] - t[a]);
    }
}
