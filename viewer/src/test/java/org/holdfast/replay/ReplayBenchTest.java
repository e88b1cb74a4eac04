package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ServiceLoader;

import org.holdfast.bench.BenchSuite;
import org.holdfast.render.SceneFrame;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The replay suite is found by {@code holdfast bench}, and its synthetic run is what it claims. No timing here. */
class ReplayBenchTest {

    @TempDir
    Path dir;

    @Test
    void suiteIsRegistered() {
        boolean found = false;
        for (BenchSuite s : ServiceLoader.load(BenchSuite.class)) {
            found |= s.name().equals("replay") && s instanceof ReplayBench;
        }
        assertTrue(found, "suite 'replay' is listed in META-INF/services");
    }

    /**
     * Members move on circles turning once per 4 Gyr, saved every h = 0.25 Gyr. Midway, each
     * replayed coordinate r cos(omega t) may miss the circle by at most h^4/384 max|f''''| =
     * r (omega h)^4 / 384 (cubic Hermite error bound, Burden and Faires, Numerical Analysis,
     * 9th ed. 2011, Theorem 3.9), and must come close to it: the circle is what was saved.
     */
    @Test
    void replayedCirclesStayWithinTheHermiteErrorBound() {
        ReplayBench.write(dir, 64);
        RunArchive run = RunArchive.open(dir);
        assertEquals(12, run.snapshotCount());
        ReplayScene scene = new ReplayScene(run);
        SceneFrame start = scene.at(0);
        int n = start.galaxyCount();
        double[] r = new double[n];
        double[] phase = new double[n];
        for (int g = 0; g < n; g++) {
            r[g] = Math.hypot(start.galaxyX(g), start.galaxyY(g));
            phase[g] = Math.atan2(start.galaxyY(g), start.galaxyX(g));
        }
        double omega = 2 * Math.PI / 4.0;
        double h = 0.25;
        double worstRatio = 0;
        for (int k = 0; k < 11; k++) {
            double t = (k + 0.5) * h;
            SceneFrame f = scene.at(t);
            for (int g = 0; g < n; g++) {
                double bound = r[g] * Math.pow(omega * h, 4) / 384;
                double ex = r[g] * Math.cos(phase[g] + omega * t);
                double ey = r[g] * Math.sin(phase[g] + omega * t);
                double err = Math.max(Math.abs(f.galaxyX(g) - ex), Math.abs(f.galaxyY(g) - ey));
                worstRatio = Math.max(worstRatio, err / bound);
            }
        }
        assertTrue(worstRatio <= 1.0, "error / bound = " + worstRatio);
        assertTrue(worstRatio > 0.1, "the bound is nearly reached midway, not loose by orders: " + worstRatio);
    }
}
