package org.holdfast.render.bench;

import java.util.SplittableRandom;

import org.holdfast.render.SceneFrame;

/**
 * An invented group for benchmarks: five galaxies with Plummer-like star clouds and a diffuse
 * sprinkling of flow tracers, a fixed random seed so every run draws the same splats.
 */
final class BenchScene {

    static final String[] NAMES = {"Tessaly", "Brin", "Orrin", "Vell", "Quasso"};

    private BenchScene() {
    }

    static SceneFrame build(int tracers, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        int g = NAMES.length;
        double[] gx = new double[g];
        double[] gy = new double[g];
        double[] gz = new double[g];
        int[] colour = new int[g];
        for (int i = 0; i < g; i++) {
            double phase = 2 * Math.PI * i / g;
            gx[i] = 120 * Math.cos(phase);
            gy[i] = 120 * Math.sin(phase);
            gz[i] = 20 * (i - 2);
            colour[i] = i;
        }
        float[] x = new float[tracers];
        float[] y = new float[tracers];
        float[] z = new float[tracers];
        int[] host = new int[tracers];
        for (int k = 0; k < tracers; k++) {
            boolean flow = k % 10 == 0;
            int h = flow ? -1 : rng.nextInt(g);
            // Plummer radius from its cumulative mass, r = b / sqrt(u^(-2/3) - 1), capped
            double u = Math.max(1e-6, rng.nextDouble() * 0.97);
            double r = (flow ? 150 : 12) / Math.sqrt(Math.pow(u, -2.0 / 3) - 1);
            double cz = 2 * rng.nextDouble() - 1;
            double phi = 2 * Math.PI * rng.nextDouble();
            double s = Math.sqrt(1 - cz * cz);
            double ox = flow ? 0 : gx[h];
            double oy = flow ? 0 : gy[h];
            double oz = flow ? 0 : gz[h];
            x[k] = (float) (ox + r * s * Math.cos(phi));
            y[k] = (float) (oy + r * s * Math.sin(phi));
            z[k] = (float) (oz + r * cz);
            host[k] = h;
        }
        return new SceneFrame().setClock(12.4, 1.9).setGalaxies(g, NAMES, colour, gx, gy, gz)
                .setTracers(tracers, x, y, z, host);
    }
}
