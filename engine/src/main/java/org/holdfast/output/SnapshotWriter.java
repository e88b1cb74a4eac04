package org.holdfast.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;

import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.units.Units;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.WritableGroup;

/**
 * Writes one HDF5 file per snapshot into {@code snapshots/}: {@code state_000000.h5},
 * {@code state_000001.h5}, ... Each is written under a temporary name and renamed when
 * complete, so a run killed at any moment leaves every snapshot already written whole, and
 * memory stays bounded by one snapshot however long the run.
 *
 * <p>Layout of each file (arrays put the long dimension last, so h5py shows shape (3, N)):
 * <pre>
 * /                      attributes: t_gyr, scale_factor, index, scenario, holdfast_version,
 *                        frame ("centre of mass"), length_unit "kpc", velocity_unit "km/s"
 *                        (strings are fixed-length UTF-8, the only kind jhdf 0.10 writes: h5py
 *                        returns them as bytes, b"kpc".decode() gives the text)
 * /galaxies/name         string[N]
 * /galaxies/mass_msun    float64[N]
 * /galaxies/position_kpc float64[3][N]
 * /galaxies/velocity_kms float64[3][N]
 * /tracers/position_kpc  float32[3][M]   (only when M > 0)
 * /tracers/velocity_kms  float32[3][M]
 * /tracers/host          int32[M]        index into this file's /galaxies (a merged galaxy's stars pass
 *                                        to its survivor); -1 for flow
 * </pre>
 */
public final class SnapshotWriter implements RunObserver {

    /** Folder of snapshots inside a run folder. */
    public static final String FOLDER = "snapshots";

    private final Path dir;
    private final String scenarioName;
    private final String version;
    private int index;
    private String[] initialNames = new String[0];

    public SnapshotWriter(Path runDir, String scenarioName, String version) {
        this.dir = runDir.resolve(FOLDER);
        this.scenarioName = scenarioName;
        this.version = version;
    }

    /** File name of snapshot i. */
    public static String fileName(int i) {
        return String.format(Locale.ROOT, "state_%06d.h5", i);
    }

    /** Number of snapshots written so far. */
    public int written() {
        return index;
    }

    @Override
    public void init(RunView run) {
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        initialNames = new String[run.bodyCount()];
        for (int i = 0; i < initialNames.length; i++) {
            initialNames[i] = run.bodyName(i);
        }
    }

    @Override
    public void atSnapshot(RunView run) {
        Path target = dir.resolve(fileName(index));
        Path tmp = dir.resolve(fileName(index) + ".part");
        try {
            Files.deleteIfExists(tmp);
            try (WritableHdfFile file = HdfFile.write(tmp)) {
                fill(file, run);
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write snapshot " + target, e);
        }
        index++;
    }

    private void fill(WritableHdfFile file, RunView run) {
        // jhdf marks every file it writes with a root attribute of its own; a snapshot holds only ours
        file.removeAttribute("_jHDF");
        file.putAttribute("t_gyr", run.tGyr());
        file.putAttribute("scale_factor", run.scaleFactor());
        file.putAttribute("index", index);
        file.putAttribute("scenario", scenarioName);
        file.putAttribute("holdfast_version", version);
        file.putAttribute("frame", "centre of mass");
        file.putAttribute("length_unit", "kpc");
        file.putAttribute("velocity_unit", "km/s");
        file.putAttribute("mass_unit", "Msun");

        int n = run.bodyCount();
        WritableGroup g = file.putGroup("galaxies");
        String[] names = new String[n];
        double[] mass = new double[n];
        double[][] pos = new double[3][n];
        double[][] vel = new double[3][n];
        double k = Units.KPC_PER_GYR_TO_KMS;
        for (int i = 0; i < n; i++) {
            names[i] = run.bodyName(i);
            mass[i] = run.bodyMass()[i];
            pos[0][i] = run.bodyX()[i];
            pos[1][i] = run.bodyY()[i];
            pos[2][i] = run.bodyZ()[i];
            vel[0][i] = run.bodyVx()[i] * k;
            vel[1][i] = run.bodyVy()[i] * k;
            vel[2][i] = run.bodyVz()[i] * k;
        }
        g.putDataset("name", names);
        g.putDataset("mass_msun", mass);
        g.putDataset("position_kpc", pos);
        g.putDataset("velocity_kms", vel);

        int m = run.tracerCount();
        if (m > 0) {
            WritableGroup t = file.putGroup("tracers");
            t.putDataset("position_kpc", toFloat(run.tracerX(), run.tracerY(), run.tracerZ(), m, 1.0));
            t.putDataset("velocity_kms", toFloat(run.tracerVx(), run.tracerVy(), run.tracerVz(), m, k));
            t.putDataset("host", java.util.Arrays.copyOf(run.tracerHost(), m));
        }
        if (initialNames.length > 0) {
            file.putAttribute("initial_galaxies", String.join(",", initialNames));
        }
    }

    private static float[][] toFloat(double[] x, double[] y, double[] z, int m, double scale) {
        float[][] out = new float[3][m];
        for (int j = 0; j < m; j++) {
            out[0][j] = (float) (x[j] * scale);
            out[1][j] = (float) (y[j] * scale);
            out[2][j] = (float) (z[j] * scale);
        }
        return out;
    }
}
