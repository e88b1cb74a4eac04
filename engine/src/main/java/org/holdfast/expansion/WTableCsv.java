package org.holdfast.expansion;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.holdfast.schema.ScenarioException;

/**
 * Reads a w(a) table from CSV: a header line {@code a,w}, then one {@code a,w} pair per line,
 * a strictly increasing and positive, covering both the past (a &lt; 1) and the future
 * (a &gt; 1), parsed by Commons CSV. Blank lines and lines starting with {@code #} are skipped.
 * Every problem is reported as {@code file:line: what is wrong}.
 */
public final class WTableCsv {

    private WTableCsv() {
    }

    /** Comments after '#', blank lines skipped, spaces around values ignored. */
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setCommentMarker('#')
            .setIgnoreEmptyLines(true).setIgnoreSurroundingSpaces(true).get();

    /** Reads and checks the table. */
    public static TabulatedW read(Path file) {
        String text = org.holdfast.schema.InputText.read(file, "w(a) table");
        // With a line break after every record, the parser's line count after a record is its line.
        if (!text.endsWith("\n")) {
            text += "\n";
        }
        List<double[]> rows = new ArrayList<>();
        boolean header = false;
        long headerLine = 0;
        long lastLine;
        try (CSVParser parser = CSVParser.parse(text, FORMAT)) {
            for (CSVRecord cells : parser) {
                String where = file + ":" + parser.getCurrentLineNumber();
                String line = String.join(",", cells.values());
                if (!header) {
                    if (cells.size() != 2 || !cells.get(0).equals("a") || !cells.get(1).equals("w")) {
                        throw new ScenarioException(where, null, "expected the header line 'a,w', got '" + line + "'");
                    }
                    header = true;
                    headerLine = parser.getCurrentLineNumber();
                    continue;
                }
                if (cells.size() != 2) {
                    throw new ScenarioException(where, null, "expected two values 'a,w', got '" + line + "'");
                }
                double a = number(where, "a", cells.get(0));
                double w = number(where, "w", cells.get(1));
                if (!(a > 0)) {
                    throw new ScenarioException(where, "a", "scale factor must be > 0 (got " + cells.get(0) + ")");
                }
                if (!rows.isEmpty() && !(a > rows.get(rows.size() - 1)[0])) {
                    throw new ScenarioException(where, "a", "scale factors must increase strictly down the table");
                }
                rows.add(new double[] {a, w});
            }
            lastLine = parser.getCurrentLineNumber();
        } catch (IOException | UncheckedIOException e) {
            throw new ScenarioException(file.toString(), null, "malformed w(a) table: " + e.getMessage());
        }
        if (!header) {
            throw new ScenarioException(file + ":1", null, "empty w(a) table: expected the header line 'a,w'");
        }
        String end = file + ":" + (rows.isEmpty() ? headerLine : lastLine);
        if (rows.size() < 2) {
            throw new ScenarioException(end, null, "a w(a) table needs at least two rows");
        }
        double first = rows.get(0)[0];
        double last = rows.get(rows.size() - 1)[0];
        if (!(first < 1.0 && last > 1.0)) {
            throw new ScenarioException(end, "a", String.format(Locale.ROOT,
                    "the table must cover past and future (a < 1 and a > 1); it spans a = %.6g to %.6g", first, last));
        }
        double[] av = new double[rows.size()];
        double[] wv = new double[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            av[i] = rows.get(i)[0];
            wv[i] = rows.get(i)[1];
        }
        return new TabulatedW(av, wv, file.getFileName().toString());
    }

    private static double number(String where, String column, String cell) {
        try {
            double v = Double.parseDouble(cell.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ScenarioException(where, column, "expected a number, got '" + cell.strip() + "'");
    }
}
