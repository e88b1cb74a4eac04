package org.holdfast.output;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.holdfast.fates.FateTracker;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;

/**
 * Writes {@code fates.csv}: at every snapshot, one row per member still present, saying why its
 * fate stands where it does: its separation from the centre of mass of the rest of the main group
 * (or of the main group, when it is outside), the specific energy of that relative motion
 * against the top of the effective-potential barrier, the barrier's and the zero-gravity radius,
 * the background coefficient the binding test credited, and the member's bound and stripped mass.
 * Columns: {@link #COLUMNS}. Energies in (km/s)^2; an empty cell where there is nothing to
 * compare with (the heaviest member alone) or no barrier (no field: the top is then 0 and the
 * radii empty).
 */
public final class FateWriter implements RunObserver, AutoCloseable {

    /** File name inside a run folder. */
    public static final String FILE = "fates.csv";

    /** The header, in order. */
    public static final String[] COLUMNS = {
        "t_gyr", "name", "in_main_group", "separation_kpc", "energy_kms2", "barrier_kms2", "barrier_kpc",
        "zero_gravity_kpc", "k_gyr2", "mass_msun", "stripped_msun"
    };

    private final Path file;
    private final FateTracker tracker;
    private CSVPrinter csv;

    /** @param tracker the run's fate tracker, which must watch the run before this writer */
    public FateWriter(Path runDir, FateTracker tracker) {
        this.file = runDir.resolve(FILE);
        this.tracker = tracker;
    }

    @Override
    public void init(RunView run) {
        try {
            BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
            csv = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setHeader(COLUMNS).setRecordSeparator('\n').get());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void atSnapshot(RunView run) {
        Map<String, FateTracker.Why> why = tracker.why();
        try {
            for (int i = 0; i < run.bodyCount(); i++) {
                String name = run.bodyName(i);
                FateTracker.Why w = why.get(name);
                if (w == null) {
                    continue;
                }
                csv.printRecord(run.tGyr(), name, w.inMain() ? 1 : 0, cell(w.separationKpc()), cell(w.energy()),
                        cell(w.barrierEnergy()), cell(w.barrierKpc()), cell(w.zeroGravityKpc()), w.kCredited(),
                        run.bodyMass()[i], run.strippedMassMsun(name));
            }
            csv.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String cell(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    @Override
    public void finish(RunView run, StopReason reason) {
        close();
    }

    @Override
    public void close() {
        if (csv != null) {
            try {
                csv.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } finally {
                csv = null;
            }
        }
    }
}
