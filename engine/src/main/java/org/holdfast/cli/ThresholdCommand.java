package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.sweep.Axis;
import org.holdfast.sweep.KeyCheck;
import org.holdfast.sweep.LocalEngine;
import org.holdfast.sweep.MemberOutcome;
import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.RunOutcome;
import org.holdfast.sweep.RunRecord;
import org.holdfast.sweep.RunSpec;
import org.holdfast.sweep.RunTask;
import org.holdfast.sweep.CriticalCurve;
import org.holdfast.sweep.Outcomes;
import org.holdfast.sweep.Threshold;
import org.holdfast.sweep.ValueCheck;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast threshold}: the critical value of one parameter for a stated outcome. */
@Command(name = "threshold",
        mixinStandardHelpOptions = true,
        header = "Find the value of one key at which a fate changes.",
        description = {
            "Finds the value of one key between LO and HI at which a stated outcome",
            "starts or stops: a member's fate (--member NAME --fate bound|merged|",
            "escaped|ripped|unbound|together) or, without --member, the group's verdict",
            "(--fate bound|partly-bound|dissolved|unbound), reached by --within-gyr.",
            "Bisects on the outcome; with --samples N, on the fraction of N realisations",
            "(at one half; draw s is the same at every value). With --along KEY2=A:B:N,",
            "finds it at each of N values of a second key: a critical curve, written to",
            "DIR/critical-curve.csv and drawn in DIR/critical-curve.png.",
            "",
            "Example:",
            "  holdfast threshold scenarios/tethered-pair.toml \\",
            "      --vary cosmology.dark_energy.w0=-2.0:-1.0 \\",
            "      --member Wrenna --fate ripped --within-gyr 60 --tolerance 0.001",
            "  holdfast threshold scenarios/tethered-pair.toml \\",
            "      --vary cosmology.dark_energy.w0=-2.0:-0.4 --along cosmology.dark_energy.wa=0:0.15:4 \\",
            "      --member Wrenna --fate ripped --within-gyr 60 --tolerance 0.01 --out rip-curve"
        })
public final class ThresholdCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "The scenario file (TOML).")
    Path scenario;

    @Option(names = "--vary", required = true, paramLabel = "KEY=LO:HI", description = "The key and the range to search.")
    String vary;

    @Option(names = "--member", paramLabel = "NAME", description = "The member whose fate counts (default: the group's verdict).")
    String member;

    @Option(names = "--fate", required = true, paramLabel = "FATE",
            description = "A member fate (bound, merged, escaped, ripped) or a group verdict (bound, partly-bound, dissolved).")
    String fate;

    @Option(names = "--within-gyr", paramLabel = "T", description = "Runs end at this time; the outcome must be reached by then.")
    Double withinGyr;

    @Option(names = "--tolerance", paramLabel = "DX", description = "Width of the final bracket (default: (HI-LO)/1000).")
    Double tolerance;

    @Option(names = "--samples", paramLabel = "N", description = "Realisations per value (uncertain numbers drawn).")
    Integer samples;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Master seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "A fixed override for every run (repeatable).")
    List<String> set = new ArrayList<>();

    @Option(names = "--workers", paramLabel = "N", description = "Worker threads for the samples (default: all cores).")
    Integer workers;

    @Option(names = "--max-evaluations", paramLabel = "N", defaultValue = "100",
            description = "Give up after this many values (default: ${DEFAULT-VALUE}).")
    int maxEvaluations;

    @Option(names = "--json", description = "Print one JSON object.")
    boolean json;

    @Option(names = "--along", paramLabel = "KEY=START:STOP:COUNT|KEY=V1,V2,...",
            description = "Find the threshold at each value of a second key: a critical curve (CSV and PNG in --out).")
    String along;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Folder for the critical curve with --along (default: threshold-SCENARIONAME).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        if (!Files.isRegularFile(scenario)) {
            throw new ScenarioException(scenario.toString(), null, "no such scenario file");
        }
        String[] kv = vary.split("=", 2);
        String[] range = kv.length == 2 ? kv[1].split(":", -1) : new String[0];
        if (kv.length != 2 || range.length != 2) {
            throw new ScenarioException("--vary", vary, "expected KEY=LO:HI");
        }
        String key = kv[0].trim();
        Axis ends = Axis.parse(key + "=" + kv[1].replace(':', ','));
        double lo = ends.values().get(0);
        double hi = ends.values().get(1);
        if (!(lo < hi)) {
            throw new ScenarioException("--vary", key, "LO must be below HI");
        }
        KeyCheck check = KeyCheck.of(scenario);
        check.requireNumber("--vary", key);
        for (String k : Overrides.parse(set).asMap().keySet()) {
            check.requireKnown(Overrides.OPTION, k);
        }
        List<String> allowed = new ArrayList<>(member == null ? RunOutcome.VERDICTS : MemberOutcome.FATES);
        if (member != null) {
            allowed.add(MemberOutcome.TOGETHER);
        }
        if (!allowed.contains(fate)) {
            throw new ScenarioException("--fate", fate, "choose one of " + String.join(", ", allowed)
                    + (member == null ? " (a group verdict; add --member NAME for a member's fate)" : ""));
        }
        double tol = tolerance == null ? (hi - lo) / 1000 : tolerance;
        if (!(tol > 0)) {
            throw new ScenarioException("--tolerance", null, "must be > 0");
        }
        if (samples != null && samples < 1) {
            throw new ScenarioException("--samples", null, "must be at least 1 (got " + samples + ")");
        }
        if (withinGyr != null && !Double.isFinite(withinGyr)) {
            throw new ScenarioException("--within-gyr", null, "must be a finite number of Gyr");
        }
        // Read with the scenario's own end, so that --within-gyr is judged here and not blamed on until_gyr.
        Scenario atLow = ValueCheck.readAtEveryValue(scenario, Overrides.parse(set).asMap(), List.of(ends), Double.NaN);
        double start = atLow.run().startGyr();
        if (withinGyr != null && !(withinGyr > start)) {
            throw new ScenarioException("--within-gyr", null, String.format(Locale.ROOT,
                    "must be later than the runs' start (%.4g Gyr from today), since fates are decided forward"
                            + " in time (got %.4g)", start, withinGyr));
        }
        if (withinGyr != null) {
            // the runs end at --within-gyr: what is wrong with that end is blamed on it
            try {
                ValueCheck.readAtEveryValue(scenario, Overrides.parse(set).asMap(), List.of(ends), withinGyr);
            } catch (ScenarioException e) {
                if ("--until".equals(e.where())) {
                    throw new ScenarioException("--within-gyr", e.key(), e.getMessage().substring("--until: ".length()));
                }
                throw e;
            }
        }
        if (member != null) {
            check.requireGalaxy("--member", member);
        }
        int n = samples == null ? 1 : samples;
        if (along != null) {
            return curve(check, key, lo, hi, tol, n);
        }
        Evaluator eval = new Evaluator(key, n, Map.of());
        Threshold.Result r;
        try {
            r = Threshold.find(eval::fractionAt, lo, hi, tol, maxEvaluations);
        } catch (Threshold.NoChangeException e) {
            throw new ScenarioException("--vary", key, "the outcome is the same at both ends (fraction "
                    + e.fractionAtLow() + " at " + lo + ", " + e.fractionAtHigh() + " at " + hi + "); widen the range");
        }
        print(key, r, eval.runs, tol);
        return 0;
    }

    /**
     * f(x): makes the runs at one value of the key (the same seeds at every value) and returns
     * the fraction in which the stated outcome happened.
     */
    private final class Evaluator {
        private final String key;
        private final int draws;
        private final Map<String, String> fixed;
        private final RunSpec runSpec;
        private final LocalEngine engine;
        private final List<String> varied;
        private int runs;

        Evaluator(String key, int n, Map<String, String> more) {
            this.key = key;
            this.draws = n;
            this.fixed = new LinkedHashMap<>(Overrides.parse(set).asMap());
            this.fixed.putAll(more);
            this.runSpec = new RunSpec(RunFunctions.current(), samples != null,
                    withinGyr == null ? Double.NaN : withinGyr, null);
            int w = workers == null ? Runtime.getRuntime().availableProcessors() : Math.max(1, workers);
            this.engine = new LocalEngine(Math.min(w, n));
            this.varied = new ArrayList<>(List.of(key));
            this.varied.addAll(more.keySet());
        }

        private final Map<Double, Double> known = new java.util.HashMap<>();

        double fractionAt(double x) {
            Double f = known.get(x);
            if (f == null) {
                f = evaluate(x);
                known.put(x, f);
            }
            return f;
        }

        private double evaluate(double x) {
            Map<String, String> o = new LinkedHashMap<>(fixed);
            o.put(key, Axis.format(x));
            List<RunTask> tasks = new ArrayList<>();
            for (int s = 0; s < draws; s++) {
                tasks.add(new RunTask(s, 0, s, seed, s, o, varied));
            }
            int[] hits = {0};
            try {
                engine.run(scenario, runSpec, tasks, rec -> hits[0] += holds(rec) ? 1 : 0);
            } catch (RuntimeException e) {
                throw e;
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
            runs += draws;
            return (double) hits[0] / draws;
        }
    }

    /** Whether the stated outcome happened in a run. */
    private boolean holds(RunRecord rec) {
        RunOutcome o = rec.outcome();
        double t = withinGyr == null ? Double.POSITIVE_INFINITY : withinGyr;
        if (member == null) {
            if (!o.verdict().equals(fate)) {
                return false;
            }
            return fate.equals("bound") || o.boundUntilGyr() == null || o.boundUntilGyr() <= t;
        }
        MemberOutcome f = o.member(member);
        if (f != null && fate.equals(MemberOutcome.TOGETHER)) {
            return Outcomes.together(o, member);
        }
        if (f == null) {
            List<String> names = o.members().stream().map(MemberOutcome::name).toList();
            throw new ScenarioException("--member", member, "no such member; the scenario has " + String.join(", ", names));
        }
        return f.fate().equals(fate) && (f.atGyr() == null || f.atGyr() <= t);
    }

    /** The critical curve: the threshold of {@code key} at every value of the --along key. */
    private int curve(KeyCheck check, String key, double lo, double hi, double tol, int n) throws Exception {
        Axis alongAxis = Axis.parse(along);
        if (alongAxis.key().equals(key)) {
            throw new ScenarioException("--along", along, "must name another key than --vary");
        }
        check.requireNumber("--along", alongAxis.key());
        ValueCheck.readAtEveryValue(scenario, Overrides.parse(set).asMap(), List.of(alongAxis), Double.NaN);
        Path dir = out != null ? out : Path.of("threshold-" + baseName(scenario));
        org.holdfast.output.RunFolder.makeFolder(dir, "--out");
        List<CriticalCurve.Point> points = new ArrayList<>();
        PrintWriter o = spec.commandLine().getOut();
        for (double a : alongAxis.values()) {
            Evaluator eval = new Evaluator(key, n, Map.of(alongAxis.key(), Axis.format(a)));
            CriticalCurve.Point p;
            try {
                Threshold.Result r = Threshold.find(eval::fractionAt, lo, hi, tol, maxEvaluations);
                double[] ci = medianInterval(eval, lo, hi, tol, n);
                p = new CriticalCurve.Point(a, true, r.value(), r.low(), r.high(), r.evaluations().get(r.low()),
                        r.evaluations().get(r.high()), eval.runs, ci[0], ci[1]);
            } catch (Threshold.NoChangeException e) {
                p = new CriticalCurve.Point(a, false, Double.NaN, lo, hi, e.fractionAtLow(), e.fractionAtHigh(), eval.runs,
                        Double.NaN, Double.NaN);
            }
            points.add(p);
            o.printf(Locale.ROOT, "  %s = %-10s %s%n", alongAxis.key(), Axis.format(a), p.found()
                    ? String.format(Locale.ROOT, "%s = %.6g  bracket [%.6g, %.6g]%s", key, p.value(), p.low(), p.high(),
                            Double.isNaN(p.ciLow()) ? "" : String.format(Locale.ROOT, "  median 95%% [%.6g, %.6g]",
                                    p.ciLow(), p.ciHigh()))
                    : "no change between " + Axis.format(lo) + " and " + Axis.format(hi));
            o.flush();
        }
        String what = (member == null ? "group verdict " : member + " ") + fate
                + (withinGyr == null ? "" : " by " + withinGyr + " Gyr");
        for (Path p : CriticalCurve.write(dir, key, alongAxis.key(), what, n, points)) {
            o.println("  wrote " + p);
        }
        o.flush();
        return 0;
    }

    /**
     * A 95% interval for the median draw's critical value (6 paired draws or more): where f crosses
     * the two levels of {@link Threshold#medianLevels95}; NaN ends otherwise, or where a level is
     * not crossed inside the range.
     */
    private double[] medianInterval(Evaluator eval, double lo, double hi, double tol, int n) {
        double[] levels = Threshold.medianLevels95(n);
        if (levels == null) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double[] x = new double[2];
        for (int i = 0; i < 2; i++) {
            try {
                x[i] = Threshold.find(eval::fractionAt, lo, hi, tol, maxEvaluations, levels[i]).value();
            } catch (Threshold.NoChangeException e) {
                return new double[] {Double.NaN, Double.NaN};
            }
        }
        return new double[] {Math.min(x[0], x[1]), Math.max(x[0], x[1])};
    }

    private static String baseName(Path p) {
        String name = p.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    private void print(String key, Threshold.Result r, int runs, double tol) throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        String what = (member == null ? "group verdict " : member + " ") + fate
                + (withinGyr == null ? "" : " by " + withinGyr + " Gyr");
        if (json) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("key", key);
            m.put("outcome", what);
            m.put("member", member);
            m.put("fate", fate);
            m.put("within_gyr", withinGyr);
            m.put("low", r.low());
            m.put("high", r.high());
            m.put("value", r.value());
            m.put("tolerance", tol);
            m.put("fraction_at_low_end", r.fractionAtLow());
            m.put("fraction_at_high_end", r.fractionAtHigh());
            m.put("values_evaluated", r.evaluated());
            m.put("runs", runs);
            List<Map<String, Double>> ev = new ArrayList<>();
            r.evaluations().forEach((x, f) -> ev.add(Map.of("value", x, "fraction", f)));
            m.put("evaluations", ev);
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(m));
        } else {
            out.printf(Locale.ROOT, "threshold of %s for %s%n", key, what);
            out.printf(Locale.ROOT, "  bracket  [%.10g, %.10g]%n", r.low(), r.high());
            out.printf(Locale.ROOT, "  value    %.10g%n", r.value());
            out.printf(Locale.ROOT, "  fraction %.4g at the low end, %.4g at the high end%n", r.fractionAtLow(), r.fractionAtHigh());
            out.printf(Locale.ROOT, "  runs     %d (%d values)%n", runs, r.evaluated());
        }
        out.flush();
    }
}
