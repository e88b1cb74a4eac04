package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.output.SnapshotWriter;
import org.holdfast.render.SceneFrame;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.WritableGroup;

/**
 * A hand-made run folder in the snapshot layout of {@link SnapshotWriter}: two invented galaxies,
 * Quillon and Sarrow, moving at constant velocity, and Sarrow merging into Quillon at 1.5 Gyr,
 * between the snapshots at 1 and 2 Gyr.
 */
class MergerReplayTest {

    @TempDir
    Path dir;

    private static final double V_KMS = 100;

    private void snapshot(int index, double t, String[] names, double[] x) throws Exception {
        Path snaps = Files.createDirectories(dir.resolve(SnapshotWriter.FOLDER));
        try (WritableHdfFile f = HdfFile.write(snaps.resolve(SnapshotWriter.fileName(index)))) {
            f.putAttribute("t_gyr", t);
            f.putAttribute("scale_factor", 1 + 0.1 * t);
            f.putAttribute("initial_galaxies", "Quillon,Sarrow");
            WritableGroup g = f.putGroup("galaxies");
            int n = names.length;
            double[][] pos = new double[3][n];
            double[][] vel = new double[3][n];
            for (int i = 0; i < n; i++) {
                pos[0][i] = x[i];
                vel[0][i] = i == 0 ? V_KMS : -V_KMS;
            }
            g.putDataset("name", names);
            g.putDataset("mass_msun", new double[n]);
            g.putDataset("position_kpc", pos);
            g.putDataset("velocity_kms", vel);
        }
    }

    private RunArchive run() throws Exception {
        double d = V_KMS * Units.KMS_TO_KPC_PER_GYR;
        String[] both = {"Quillon", "Sarrow"};
        snapshot(0, 0, both, new double[] {0, 500});
        snapshot(1, 1, both, new double[] {d, 500 - d});
        snapshot(2, 2, new String[] {"Quillon"}, new double[] {2 * d});
        Files.writeString(dir.resolve("summary.json"), "{\"events\": [{\"t_gyr\": 1.5, \"kind\": \"merged\","
                + " \"members\": [\"Quillon\", \"Sarrow\"]}], \"cosmology\": {\"rip_gyr\": null},"
                + " \"stop_reason\": \"reached_end\"}");
        return RunArchive.open(dir);
    }

    @Test
    void uniformMotionIsReproducedExactlyBetweenSnapshots() throws Exception {
        // A cubic Hermite interpolant is exact for motion of degree three or less (common practice).
        SceneFrame f = new ReplayScene(run()).at(0.4);
        assertEquals(2, f.galaxyCount());
        assertEquals(0.4 * V_KMS * Units.KMS_TO_KPC_PER_GYR, f.galaxyX(0), 1e-9);
        assertEquals(500 - 0.4 * V_KMS * Units.KMS_TO_KPC_PER_GYR, f.galaxyX(1), 1e-9);
        assertEquals(1.04, f.scaleFactor(), 1e-12);
    }

    @Test
    void aMergedGalaxyHeadsForItsSurvivorAndIsGoneAtTheMerger() throws Exception {
        ReplayScene scene = new ReplayScene(run());
        SceneFrame before = scene.at(1.25);
        assertEquals(2, before.galaxyCount());
        assertEquals("Sarrow", before.name(1));
        assertEquals(1, before.colourIndex(1), "colours follow the galaxies at the start");
        double d = V_KMS * Units.KMS_TO_KPC_PER_GYR;
        assertTrue(before.galaxyX(1) < 500 - d && before.galaxyX(1) > 2 * d, "between its last place and the survivor's next");
        assertTrue(before.events().isEmpty());
        SceneFrame after = scene.at(1.75);
        assertEquals(1, after.galaxyCount());
        assertEquals("Quillon", after.name(0));
        assertEquals(1, after.events().size());
        assertEquals("Quillon merged with Sarrow", after.events().get(0).describe());
        assertFalse(scene.centreOf("Sarrow", 1.75, new double[3]));
    }
}
