package org.holdfast.output;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;
import org.holdfast.units.Units;

/**
 * Writes {@code tracks.csv}: one row per galaxy per snapshot, each snapshot's rows written at
 * once so a killed run keeps what it had, in whole snapshots. Columns:
 * {@code t_gyr,a,name,x_kpc,y_kpc,z_kpc,vx_kms,vy_kms,vz_kms,mass_msun,stripped_msun}: mass_msun is
 * the bound mass (after tidal stripping and mergers), stripped_msun what stripping took so far.
 */
public final class TrackWriter implements RunObserver, AutoCloseable {

    /** File name inside a run folder. */
    public static final String FILE = "tracks.csv";

    /** The header, in order. */
    public static final String[] COLUMNS = {
        "t_gyr", "a", "name", "x_kpc", "y_kpc", "z_kpc", "vx_kms", "vy_kms", "vz_kms", "mass_msun", "stripped_msun"
    };

    private final Path file;
    private final StringBuilder block = new StringBuilder();
    private OutputStream out;
    private CSVPrinter csv;

    public TrackWriter(Path runDir) {
        this.file = runDir.resolve(FILE);
    }

    @Override
    public void init(RunView run) {
        try {
            out = Files.newOutputStream(file);
            csv = new CSVPrinter(block, CSVFormat.DEFAULT.builder().setHeader(COLUMNS).setRecordSeparator('\n').get());
            writeBlock();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Writes one snapshot's rows with a single unbuffered write, so that a run killed at any
     * moment leaves tracks.csv ending after a whole snapshot's rows (one per galaxy then).
     */
    @Override
    public void atSnapshot(RunView run) {
        double k = Units.KPC_PER_GYR_TO_KMS;
        try {
            for (int i = 0; i < run.bodyCount(); i++) {
                csv.printRecord(run.tGyr(), run.scaleFactor(), run.bodyName(i),
                        run.bodyX()[i], run.bodyY()[i], run.bodyZ()[i],
                        run.bodyVx()[i] * k, run.bodyVy()[i] * k, run.bodyVz()[i] * k, run.bodyMass()[i],
                        run.strippedMassMsun(run.bodyName(i)));
            }
            writeBlock();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void writeBlock() throws IOException {
        csv.flush();
        out.write(block.toString().getBytes(StandardCharsets.UTF_8));
        out.flush();
        block.setLength(0);
    }

    @Override
    public void finish(RunView run, StopReason reason) {
        close();
    }

    @Override
    public void close() {
        if (out != null) {
            try {
                out.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } finally {
                out = null;
                csv = null;
            }
        }
    }
}
