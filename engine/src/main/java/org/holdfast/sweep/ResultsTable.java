package org.holdfast.sweep;

import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * {@code results.csv}: one row per run, sorted by run index. Columns: {@code point},
 * {@code sample}, {@code seed}, each varied key, each sampled key (sorted: the values drawn, so
 * that paired draws show as equal values in the rows of one sample), {@code verdict},
 * {@code bound_until_gyr}, then per member {@code NAME.fate}, {@code NAME.at_gyr},
 * {@code NAME.left_gyr} (a ripped member: when it actually left), {@code NAME.with},
 * {@code NAME.together}, {@code NAME.group} (the final bound subgroup, numbered from 1; equal
 * numbers stay bound to each other or merged), {@code NAME.bound_at_start}, then
 * {@code energy_budget_error} and last {@code wall_s}.
 *
 * <p>Everything but the last column depends only on the sweep, so two sweeps made with any
 * number of workers or shards give files equal byte for byte once {@code wall_s} is set
 * aside; it is last so that {@code cut -d, -f1-N} or dropping one column does that.
 * Numbers are written in Java's shortest form that reads back to the same double; an empty
 * cell means "none" (no time for a bound member, no partner unless merged).
 */
public final class ResultsTable {

    /** The file name inside a sweep folder. */
    public static final String FILE = "results.csv";

    /** The only column that differs between identical sweeps. */
    public static final String WALL_COLUMN = "wall_s";

    static final CSVFormat CSV = CSVFormat.RFC4180.builder().setRecordSeparator('\n').get();

    private ResultsTable() {
    }

    /** Members in order of first appearance, runs taken in run order. */
    static List<String> memberNames(List<RunRecord> sorted) {
        Set<String> names = new LinkedHashSet<>();
        for (RunRecord r : sorted) {
            for (MemberOutcome m : r.outcome().members()) {
                names.add(m.name());
            }
        }
        return new ArrayList<>(names);
    }

    static List<String> sampledKeys(List<RunRecord> records) {
        Set<String> keys = new TreeSet<>();
        for (RunRecord r : records) {
            keys.addAll(r.outcome().sampledValues().keySet());
        }
        return new ArrayList<>(keys);
    }

    /** Sorts records by run index (in place) and returns them. */
    static List<RunRecord> sorted(List<RunRecord> records) {
        records.sort(Comparator.comparingLong(RunRecord::run));
        return records;
    }

    /** The table as CSV text; {@code records} must be sorted by run index. */
    public static String csv(SweepPlan plan, List<RunRecord> records) throws IOException {
        List<String> members = memberNames(records);
        List<String> sampled = sampledKeys(records);
        List<String> header = new ArrayList<>(List.of("point", "sample", "seed"));
        plan.axes().forEach(a -> header.add(a.key()));
        header.addAll(sampled);
        header.add("verdict");
        header.add("bound_until_gyr");
        for (String m : members) {
            header.add(m + ".fate");
            header.add(m + ".at_gyr");
            header.add(m + ".left_gyr");
            header.add(m + ".with");
            header.add(m + ".together");
            header.add(m + ".group");
            header.add(m + ".bound_at_start");
        }
        header.add("energy_budget_error");
        header.add(WALL_COLUMN);
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSV)) {
            p.printRecord(header);
            List<String> row = new ArrayList<>(header.size());
            for (RunRecord r : records) {
                row.clear();
                RunOutcome o = r.outcome();
                row.add(Long.toString(r.point()));
                row.add(Integer.toString(r.sample()));
                row.add(Long.toString(r.seed()));
                for (double v : plan.valuesAt(r.point())) {
                    row.add(num(v));
                }
                for (String k : sampled) {
                    row.add(num(o.sampledValues().get(k)));
                }
                row.add(o.verdict());
                row.add(num(o.boundUntilGyr()));
                for (String m : members) {
                    MemberOutcome f = o.member(m);
                    row.add(f == null ? "" : f.fate());
                    row.add(f == null ? "" : num(f.atGyr()));
                    row.add(f == null ? "" : num(f.leftGyr()));
                    row.add(f == null || f.with() == null ? "" : f.with());
                    row.add(f == null ? "" : Boolean.toString(Outcomes.together(o, m)));
                    row.add(f == null || f.group() == null ? "" : f.group().toString());
                    row.add(f == null || f.boundAtStart() == null ? "" : f.boundAtStart().toString());
                }
                row.add(num(o.energyBudgetError()));
                row.add(num(o.wallS()));
                p.printRecord(row);
            }
        }
        return w.toString();
    }

    static String num(Double v) {
        return v == null ? "" : Double.toString(v);
    }
}
