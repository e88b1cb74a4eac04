package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.holdfast.output.SnapshotWriter;
import org.holdfast.render.SceneFrame;
import org.junit.jupiter.api.Test;

import io.jhdf.HdfFile;

/** Replaying the cut-down demo run: exact at snapshots, accurate between them. */
class ReplaySceneTest {

    private static double[][] saved(Path run, int i) {
        try (HdfFile h = new HdfFile(run.resolve(SnapshotWriter.FOLDER).resolve(SnapshotWriter.fileName(i)))) {
            return (double[][]) h.getDatasetByPath("galaxies/position_kpc").getData();
        }
    }

    @Test
    void atEverySnapshotTimeTheSceneHoldsTheSavedPositionsExactly() {
        RunArchive run = RunArchive.open(DemoRun.folder());
        assertEquals(9, run.snapshotCount(), "0 to 2 Gyr every 250 Myr");
        ReplayScene scene = new ReplayScene(run);
        for (int i = 0; i < run.snapshotCount(); i++) {
            double[][] p = saved(run.dir(), i);
            SceneFrame f = scene.at(run.timeOf(i));
            assertEquals(p[0].length, f.galaxyCount());
            for (int g = 0; g < f.galaxyCount(); g++) {
                // Hermite basis at s = 0 and s = 1 is exactly (1, 0, 0, 0) and (0, 0, 1, 0).
                assertEquals(p[0][g], f.galaxyX(g), 0.0);
                assertEquals(p[1][g], f.galaxyY(g), 0.0);
                assertEquals(p[2][g], f.galaxyZ(g), 0.0);
            }
        }
    }

    /**
     * Midway between the 250 Myr snapshots, the interpolated galaxies are compared with the same
     * run saved every 125 Myr. Cubic Hermite interpolation errs by at most h^4/384 max|x''''|,
     * straight lines by h^2/8 max|x''| (Burden and Faires, Numerical Analysis, 9th ed. 2011,
     * Theorems 3.3 and 3.9), so with h = 0.25 Gyr the cubic must be far closer than the line.
     */
    @Test
    void betweenSnapshotsTheCubicFollowsTheOrbitFarBetterThanAStraightLine() {
        RunArchive coarse = RunArchive.open(DemoRun.folder());
        RunArchive dense = RunArchive.open(DemoRun.denseFolder());
        ReplayScene scene = new ReplayScene(coarse);
        double worstCubic = 0;
        double worstLine = 0;
        for (int k = 1; k < dense.snapshotCount(); k += 2) {
            double t = dense.timeOf(k);
            double[][] truth = saved(dense.dir(), k);
            double[][] before = saved(coarse.dir(), k / 2);
            double[][] after = saved(coarse.dir(), k / 2 + 1);
            SceneFrame f = scene.at(t);
            for (int g = 0; g < f.galaxyCount(); g++) {
                double[] mine = {f.galaxyX(g), f.galaxyY(g), f.galaxyZ(g)};
                double cubic = 0;
                double line = 0;
                for (int a = 0; a < 3; a++) {
                    cubic += Math.pow(mine[a] - truth[a][g], 2);
                    line += Math.pow(0.5 * (before[a][g] + after[a][g]) - truth[a][g], 2);
                }
                worstCubic = Math.max(worstCubic, Math.sqrt(cubic));
                worstLine = Math.max(worstLine, Math.sqrt(line));
            }
        }
        System.out.printf(java.util.Locale.ROOT, "midway errors: cubic %.4g kpc, line %.4g kpc%n", worstCubic, worstLine);
        assertTrue(worstLine > 1.0, "the orbits curve measurably within a snapshot interval: " + worstLine);
        assertTrue(worstCubic < 0.05 * worstLine, "cubic " + worstCubic + " kpc vs line " + worstLine + " kpc");
    }

    @Test
    void trailsRunThroughTheSavedPositionsUpToTheCurrentOne() {
        RunArchive run = RunArchive.open(DemoRun.folder());
        ReplayScene scene = new ReplayScene(run);
        double t = 0.5 * (run.timeOf(3) + run.timeOf(4));
        SceneFrame f = scene.at(t);
        double[][] p = saved(run.dir(), 2);
        for (int g = 0; g < f.galaxyCount(); g++) {
            assertEquals(5, f.trailCount(g), "snapshots 0..3, then now");
            assertEquals(t, f.trailTGyr(g, 4), 0.0);
            assertEquals(f.galaxyX(g), f.trailX(g, 4), 0.0);
            assertEquals(run.timeOf(2), f.trailTGyr(g, 2), 1e-12);
            assertEquals(p[1][g], f.trailY(g, 2), 1e-9);
        }
    }

    @Test
    void timesOutsideTheRunAreRefused() {
        ReplayScene scene = new ReplayScene(RunArchive.open(DemoRun.folder()));
        assertThrows(IllegalArgumentException.class, () -> scene.at(-0.01));
        assertThrows(IllegalArgumentException.class, () -> scene.at(DemoRun.UNTIL_GYR + 0.01));
    }
}
