package org.holdfast.render.bench;

import java.awt.Color;

import org.holdfast.render.CameraPose;
import org.holdfast.render.Palette;
import org.holdfast.render.SceneFrame;
import org.holdfast.render.projection.Projection;

/** Projects a scene's tracers for the Java2D comparison: integer pixels and a shaded colour each. */
final class Java2dProjector {

    private Java2dProjector() {
    }

    static void project(SceneFrame scene, CameraPose pose, Projection p, int[] px, int[] py, Color[] colour,
            Color[][] shades) {
        double[] m = pose.worldToCamera(new double[9]);
        double ex = pose.eyeKpc().x();
        double ey = pose.eyeKpc().y();
        double ez = pose.eyeKpc().z();
        double[] out = new double[2];
        double ref2 = 200.0 * 200.0;
        for (int i = 0; i < scene.tracerCount(); i++) {
            float[] xyz = scene.tracerPosition(i, new float[3]);
            double wx = xyz[0] - ex;
            double wy = xyz[1] - ey;
            double wz = xyz[2] - ez;
            double cx = m[0] * wx + m[1] * wy + m[2] * wz;
            double cy = m[3] * wx + m[4] * wy + m[5] * wz;
            double cz = m[6] * wx + m[7] * wy + m[8] * wz;
            if (!p.project(cx, cy, cz, out) || out[0] < -2 || out[1] < -2 || out[0] > p.width() + 2
                    || out[1] > p.height() + 2) {
                colour[i] = null;
                continue;
            }
            px[i] = (int) Math.floor(out[0]);
            py[i] = (int) Math.floor(out[1]);
            int h = scene.tracerHost(i);
            double flux = (h < 0 ? 0.3 : 1.0) * ref2 / (cx * cx + cy * cy + cz * cz);
            int a = (int) Math.max(0, Math.min(15, Math.round(flux * 15)));
            colour[i] = shades[h < 0 ? Palette.size() : Math.floorMod(h, Palette.size())][a];
        }
    }
}
