package org.holdfast.sweep;

import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.apache.commons.csv.CSVPrinter;

/**
 * {@code fractions.csv}: at each grid point, the fraction of its runs that ended in each
 * member fate and in each group verdict, with a 95% Wilson score interval ({@link Wilson}).
 *
 * <p>Long format, one row per (point, subject, outcome): {@code point}, each varied key,
 * {@code level} ({@code member} or {@code group}), {@code name} (the member; the group's
 * rows carry an empty name), {@code outcome} (a fate or a verdict), {@code count},
 * {@code runs}, {@code fraction}, {@code wilson95_low}, {@code wilson95_high}. Every known
 * fate and verdict is listed, with count 0 where none occurred, so a filter never misses a row.
 */
public final class Fractions {

    /** The file name inside a sweep folder. */
    public static final String FILE = "fractions.csv";

    /** One row of the table. */
    public record Row(int point, double[] values, String level, String name, String outcome, long count,
            long runs, double fraction, double low, double high) {
    }

    private Fractions() {
    }

    /** The rows, point by point; {@code records} must be sorted by run index and complete. */
    public static List<Row> rows(SweepPlan plan, List<RunRecord> records) {
        List<String> members = ResultsTable.memberNames(records);
        Set<String> fates = new LinkedHashSet<>(MemberFate.FATES);
        Set<String> verdicts = new LinkedHashSet<>(RunOutcome.VERDICTS);
        for (RunRecord r : records) {
            verdicts.add(r.outcome().verdict());
            r.outcome().members().forEach(m -> fates.add(m.fate()));
        }
        List<Row> rows = new ArrayList<>();
        int i = 0;
        while (i < records.size()) {
            int point = records.get(i).point();
            int j = i;
            while (j < records.size() && records.get(j).point() == point) {
                j++;
            }
            List<RunRecord> at = records.subList(i, j);
            double[] values = plan.valuesAt(point);
            for (String m : members) {
                for (String fate : fates) {
                    long k = at.stream().filter(r -> {
                        MemberFate f = r.outcome().member(m);
                        return f != null && f.fate().equals(fate);
                    }).count();
                    rows.add(row(point, values, "member", m, fate, k, at.size()));
                }
            }
            for (String v : verdicts) {
                long k = at.stream().filter(r -> r.outcome().verdict().equals(v)).count();
                rows.add(row(point, values, "group", "", v, k, at.size()));
            }
            i = j;
        }
        return rows;
    }

    private static Row row(int point, double[] values, String level, String name, String outcome, long k, long n) {
        double[] ci = Wilson.interval95(k, n);
        return new Row(point, values, level, name, outcome, k, n, (double) k / n, ci[0], ci[1]);
    }

    /** The table as CSV text. */
    public static String csv(SweepPlan plan, List<Row> rows) throws IOException {
        List<String> header = new ArrayList<>(List.of("point"));
        plan.axes().forEach(a -> header.add(a.key()));
        header.addAll(List.of("level", "name", "outcome", "count", "runs", "fraction", "wilson95_low", "wilson95_high"));
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, ResultsTable.CSV)) {
            p.printRecord(header);
            List<String> cells = new ArrayList<>();
            for (Row r : rows) {
                cells.clear();
                cells.add(Integer.toString(r.point()));
                for (double v : r.values()) {
                    cells.add(Double.toString(v));
                }
                cells.addAll(List.of(r.level(), r.name(), r.outcome(), Long.toString(r.count()), Long.toString(r.runs()),
                        fmt(r.fraction()), fmt(r.low()), fmt(r.high())));
                p.printRecord(cells);
            }
        }
        return w.toString();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6f", v);
    }
}
