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

import org.holdfast.scenario.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.scenario.ScenarioException;
import org.holdfast.sweep.Axis;
import org.holdfast.sweep.KeyCheck;
import org.holdfast.sweep.LocalEngine;
import org.holdfast.sweep.MemberFate;
import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.RunOutcome;
import org.holdfast.sweep.RunRecord;
import org.holdfast.sweep.RunSpec;
import org.holdfast.sweep.RunTask;
import org.holdfast.sweep.SeedPlan;
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
            "escaped|ripped) or, without --member, the group's verdict (--fate bound|",
            "partly-bound|dissolved), reached by --within-gyr. Bisects on the outcome;",
            "with --samples N, on the fraction of N realisations (at one half).",
            "",
            "Example:",
            "  holdfast threshold scenarios/tethered-pair.toml \\",
            "      --vary cosmology.dark_energy.w0=-2.0:-1.0 \\",
            "      --member Wrenna --fate ripped --within-gyr 60 --tolerance 0.001"
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
        List<String> allowed = member == null ? RunOutcome.VERDICTS : MemberFate.FATES;
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
        List<String> names = atLow.group().galaxies().stream().map(g -> g.name()).toList();
        if (member != null && !names.contains(member)) {
            throw new ScenarioException("--member", member, "no such member; the scenario has " + String.join(", ", names));
        }
        int n = samples == null ? 1 : samples;
        Evaluator eval = new Evaluator(key, n);
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
        private final long[] seeds;
        private final Map<String, String> fixed;
        private final RunSpec runSpec;
        private final LocalEngine engine;
        private int runs;

        Evaluator(String key, int n) {
            this.key = key;
            this.seeds = new SeedPlan(seed).forPoint(0, n);
            this.fixed = Overrides.parse(set).asMap();
            this.runSpec = new RunSpec(RunFunctions.current(), samples != null,
                    withinGyr == null ? Double.NaN : withinGyr, null);
            int w = workers == null ? Runtime.getRuntime().availableProcessors() : Math.max(1, workers);
            this.engine = new LocalEngine(Math.min(w, n));
        }

        double fractionAt(double x) {
            Map<String, String> o = new LinkedHashMap<>(fixed);
            o.put(key, Axis.format(x));
            List<RunTask> tasks = new ArrayList<>();
            for (int s = 0; s < seeds.length; s++) {
                tasks.add(new RunTask(s, 0, s, seeds[s], o, List.of(key)));
            }
            int[] hits = {0};
            try {
                engine.run(scenario, runSpec, tasks, rec -> hits[0] += holds(rec) ? 1 : 0);
            } catch (RuntimeException e) {
                throw e;
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
            runs += seeds.length;
            return (double) hits[0] / seeds.length;
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
        MemberFate f = o.member(member);
        if (f == null) {
            List<String> names = o.members().stream().map(MemberFate::name).toList();
            throw new ScenarioException("--member", member, "no such member; the scenario has " + String.join(", ", names));
        }
        return f.fate().equals(fate) && (f.atGyr() == null || f.atGyr() <= t);
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
