package org.holdfast.sweep;

import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;

import org.apache.commons.csv.CSVPrinter;

/**
 * {@code fractions.csv}: at each grid point, the fraction of its runs that ended in each
 * outcome, with a 95% Wilson score interval ({@link Wilson}).
 *
 * <p>Long format, one row per (point, subject, outcome): {@code point}, each varied key,
 * {@code level}, {@code name}, {@code outcome}, {@code count}, {@code runs}, {@code fraction},
 * {@code wilson95_low}, {@code wilson95_high}. The levels:
 * <ul>
 * <li>{@code member}: each fate (bound, merged, escaped, ripped, unbound) and {@code together}
 * (bound, or merged into a galaxy that stays bound: {@link Outcomes#together});</li>
 * <li>{@code pair} (name {@code A+B}, from {@code --pair A,B}): {@code together}, the two end
 * bound to each other or merged ({@link Outcomes#pairTogether}, symmetric in A and B);</li>
 * <li>{@code group} (empty name): each verdict over the members bound at the start.</li>
 * </ul>
 * Every known outcome is listed, with count 0 where none occurred, so a filter never misses a row.
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
        Set<String> fates = new LinkedHashSet<>(MemberOutcome.FATES);
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
            List<RunOutcome> at = records.subList(i, j).stream().map(RunRecord::outcome).toList();
            double[] values = plan.valuesAt(point);
            for (String m : members) {
                for (String fate : fates) {
                    rows.add(row(point, values, "member", m, fate, count(at, o -> {
                        MemberOutcome f = o.member(m);
                        return f != null && f.fate().equals(fate);
                    }), at.size()));
                }
                rows.add(row(point, values, "member", m, MemberOutcome.TOGETHER,
                        count(at, o -> Outcomes.together(o, m)), at.size()));
            }
            for (List<String> p : plan.pairs()) {
                rows.add(row(point, values, "pair", Outcomes.pairName(p), MemberOutcome.TOGETHER,
                        count(at, o -> Outcomes.pairTogether(o, p.get(0), p.get(1))), at.size()));
            }
            for (String v : verdicts) {
                rows.add(row(point, values, "group", "", v, count(at, o -> o.verdict().equals(v)), at.size()));
            }
            i = j;
        }
        return rows;
    }

    private static long count(List<RunOutcome> at, Predicate<RunOutcome> p) {
        long k = 0;
        for (RunOutcome o : at) {
            if (p.test(o)) {
                k++;
            }
        }
        return k;
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

    /** Six decimals, as {@code String.format("%.6f")} writes them (half up on the shortest decimal form), faster. */
    static String fmt(double v) {
        return java.math.BigDecimal.valueOf(v).setScale(6, java.math.RoundingMode.HALF_UP).toPlainString();
    }
}
