package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.holdfast.output.SnapshotWriter;
import org.holdfast.render.SceneFrame;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import io.jhdf.HdfFile;

/** Replaying the cut-down demo run: exact at snapshots, accurate between them. */
@Tag("slow")
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
        int pieces = TrailCurves.PIECES;
        for (int g = 0; g < f.galaxyCount(); g++) {
            assertEquals(4 * pieces + 1, f.trailCount(g), "snapshots 0..3, then now, each step in " + pieces);
            assertEquals(t, f.trailTGyr(g, 4 * pieces), 0.0);
            assertEquals(f.galaxyX(g), f.trailX(g, 4 * pieces), 0.0);
            assertEquals(run.timeOf(2), f.trailTGyr(g, 2 * pieces), 1e-12);
            assertEquals(p[1][g], f.trailY(g, 2 * pieces), 1e-9);
        }
    }

    /**
     * Every point of a trail, saved samples, the pieces between them and the piece ending now,
     * lies where the galaxy itself is shown at that point's time: trails follow the galaxies'
     * own cubic motion between snapshots (for the last piece: a cubic Hermite interpolant
     * reproduces a cubic exactly, Burden and Faires, Numerical Analysis, 9th ed. 2011, sec. 3.4).
     */
    @Test
    void trailsFollowTheCurvesTheGalaxiesMoveOn() {
        RunArchive run = RunArchive.open(DemoRun.folder());
        ReplayScene scene = new ReplayScene(run);
        ReplayScene probe = new ReplayScene(run);
        double t = run.timeOf(6) + 0.3 * (run.timeOf(7) - run.timeOf(6));
        SceneFrame f = scene.at(t);
        double[] xyz = new double[3];
        int points = 0;
        for (int g = 0; g < f.galaxyCount(); g++) {
            for (int k = 0; k < f.trailCount(g); k++) {
                double tk = f.trailTGyr(g, k);
                assertTrue(probe.centreOf(f.name(g), tk, xyz));
                double off = Math.sqrt(Math.pow(f.trailX(g, k) - xyz[0], 2) + Math.pow(f.trailY(g, k) - xyz[1], 2)
                        + Math.pow(f.trailZ(g, k) - xyz[2], 2));
                assertEquals(0, off, 1e-9 * Math.max(1, Math.abs(xyz[0]) + Math.abs(xyz[1]) + Math.abs(xyz[2])),
                        f.name(g) + " at " + tk + " Gyr");
                points++;
            }
        }
        assertTrue(points > 7 * TrailCurves.PIECES * f.galaxyCount(), "points checked: " + points);
    }

    /** A trail turns gently from piece to piece: far less than the polygon of its saved samples. */
    @Test
    void trailsShowNoCorners() {
        RunArchive run = RunArchive.open(DemoRun.folder());
        SceneFrame f = new ReplayScene(run).at(run.lastGyr());
        double worstTrail = 0;
        double worstPolygon = 0;
        int pieces = TrailCurves.PIECES;
        for (int g = 0; g < f.galaxyCount(); g++) {
            for (int k = 1; k + 1 < f.trailCount(g); k++) {
                worstTrail = Math.max(worstTrail, turn(f, g, k - 1, k, k + 1));
            }
            for (int k = pieces; k + pieces < f.trailCount(g); k += pieces) {
                worstPolygon = Math.max(worstPolygon, turn(f, g, k - pieces, k, k + pieces));
            }
        }
        System.out.printf(java.util.Locale.ROOT, "largest turn: trail %.2f deg, saved polygon %.2f deg%n",
                worstTrail, worstPolygon);
        assertTrue(worstPolygon > 20, "the orbits bend visibly between snapshots: " + worstPolygon);
        assertTrue(worstTrail < worstPolygon / 4, "trail " + worstTrail + " deg vs polygon " + worstPolygon);
    }

    /** Angle in degrees between the directions a to b and b to c of trail g. */
    private static double turn(SceneFrame f, int g, int a, int b, int c) {
        double[] u = {f.trailX(g, b) - f.trailX(g, a), f.trailY(g, b) - f.trailY(g, a), f.trailZ(g, b) - f.trailZ(g, a)};
        double[] v = {f.trailX(g, c) - f.trailX(g, b), f.trailY(g, c) - f.trailY(g, b), f.trailZ(g, c) - f.trailZ(g, b)};
        double dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
        double nu = Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
        double nv = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, dot / (nu * nv)))));
    }

    @Test
    void timesOutsideTheRunAreRefused() {
        ReplayScene scene = new ReplayScene(RunArchive.open(DemoRun.folder()));
        assertThrows(IllegalArgumentException.class, () -> scene.at(-0.01));
        assertThrows(IllegalArgumentException.class, () -> scene.at(DemoRun.UNTIL_GYR + 0.01));
    }
}
