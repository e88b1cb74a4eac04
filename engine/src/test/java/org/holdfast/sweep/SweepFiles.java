package org.holdfast.sweep;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/** Reading sweep outputs back, for tests. */
public final class SweepFiles {

    private SweepFiles() {
    }

    /** All rows of a CSV file, header first. */
    public static List<List<String>> rows(Path csv) throws IOException {
        List<List<String>> out = new ArrayList<>();
        try (Reader r = Files.newBufferedReader(csv); CSVParser p = CSVFormat.RFC4180.parse(r)) {
            for (CSVRecord rec : p) {
                out.add(rec.toList());
            }
        }
        return out;
    }

    /** results.csv without its wall_s column (which must be last), as text lines. */
    public static List<String> resultsWithoutWall(Path dir) throws IOException {
        List<List<String>> rows = rows(dir.resolve(ResultsTable.FILE));
        List<String> header = rows.get(0);
        if (!header.get(header.size() - 1).equals(ResultsTable.WALL_COLUMN)) {
            throw new AssertionError("wall_s is not the last column: " + header);
        }
        List<String> out = new ArrayList<>();
        for (List<String> row : rows) {
            out.add(String.join(",", row.subList(0, row.size() - 1)));
        }
        return out;
    }
}
