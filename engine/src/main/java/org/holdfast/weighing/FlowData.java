package org.holdfast.weighing;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.holdfast.schema.ScenarioException;

/**
 * Galaxies around a group: distance from the group's barycentre and radial velocity relative
 * to it along that line, each with its error. A CSV file with the header
 * {@code name,distance_kpc,distance_err_kpc,velocity_kms,velocity_err_kms}.
 *
 * @param names galaxy names
 * @param distanceKpc distances
 * @param distanceErrKpc their errors (&gt;= 0)
 * @param velocityKms radial velocities
 * @param velocityErrKms their errors (&gt;= 0)
 */
public record FlowData(List<String> names, double[] distanceKpc, double[] distanceErrKpc, double[] velocityKms,
        double[] velocityErrKms) {

    static final String[] COLUMNS = {"name", "distance_kpc", "distance_err_kpc", "velocity_kms", "velocity_err_kms"};

    /** How many galaxies. */
    public int size() {
        return names.size();
    }

    /** Reads the CSV; a bad cell is one error naming file, line and column. */
    public static FlowData read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new ScenarioException(file.toString(), null, "no such galaxy table");
        }
        List<String> names = new ArrayList<>();
        List<double[]> rows = new ArrayList<>();
        try (Reader in = Files.newBufferedReader(file);
                CSVParser p = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                        .setCommentMarker('#').setIgnoreSurroundingSpaces(true).build().parse(in)) {
            for (String c : COLUMNS) {
                if (!p.getHeaderMap().containsKey(c)) {
                    throw new ScenarioException(file + ":1", c, "missing column; the header must be "
                            + String.join(",", COLUMNS));
                }
            }
            for (CSVRecord r : p) {
                String where = file + ":" + p.getCurrentLineNumber();
                names.add(r.get("name"));
                double[] row = new double[4];
                for (int i = 0; i < 4; i++) {
                    String c = COLUMNS[i + 1];
                    try {
                        row[i] = Double.parseDouble(r.get(c));
                    } catch (NumberFormatException | IllegalStateException e) {
                        throw new ScenarioException(where, c, "not a number: '" + r.get(c) + "'");
                    }
                    if (!Double.isFinite(row[i]) || (i != 2 && row[i] < 0) || (i == 0 && row[i] == 0)) {
                        throw new ScenarioException(where, c, i == 0 ? "must be a positive distance"
                                : i == 2 ? "must be a finite velocity" : "must be >= 0");
                    }
                }
                rows.add(row);
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new ScenarioException(file.toString(), null, "cannot read: " + e.getMessage());
        } catch (IllegalArgumentException e) {
            throw new ScenarioException(file.toString(), null, "not a galaxy table: " + e.getMessage());
        }
        if (rows.size() < 2) {
            throw new ScenarioException(file.toString(), null, "needs at least two galaxies, has " + rows.size());
        }
        int n = rows.size();
        double[][] cols = new double[4][n];
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < 4; c++) {
                cols[c][i] = rows.get(i)[c];
            }
        }
        return new FlowData(List.copyOf(names), cols[0], cols[1], cols[2], cols[3]);
    }
}
