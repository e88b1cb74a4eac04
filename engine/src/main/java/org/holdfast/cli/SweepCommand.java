package org.holdfast.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;

import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.sweep.Axis;
import org.holdfast.sweep.KeyCheck;
import org.holdfast.sweep.LocalEngine;
import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.RunSpec;
import org.holdfast.sweep.Sweep;
import org.holdfast.sweep.SweepEngine;
import org.holdfast.sweep.SweepPlan;
import org.holdfast.sweep.SweepProgress;
import org.holdfast.sweep.ValueCheck;
import org.holdfast.console.RunProgress;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast sweep}: many runs of one scenario over a grid and over samples. */
@Command(name = "sweep",
        mixinStandardHelpOptions = true,
        header = "Run a scenario over a grid of values and draws; fractions per fate.",
        description = {
            "Runs a scenario over a grid of parameter values (the product of every",
            "--vary) and, with --samples, over random draws of its uncertain numbers:",
            "draw s is the same at every grid point (paired draws), so differences",
            "between grid points are not sampling noise. Writes one row per run to",
            "DIR/results.csv (with the values drawn), the fraction of runs in each",
            "outcome with 95%% Wilson intervals to DIR/fractions.csv (fates, together,",
            "each --pair, the group's verdict), and pictures for one or two varied keys.",
            "A stopped sweep resumes: run the same command again.",
            "",
            "Example:",
            "  holdfast sweep scenarios/observed-ossel-group.toml \\",
            "      --vary cosmology.dark_energy.w0=-1.6:-1.0:7 \\",
            "      --samples 20 --seed 7 --pair Quillon,Carrowmere --out w-sweep"
        })
public final class SweepCommand implements Callable<Integer> {

    /** Sweeps larger than this need --yes. */
    public static final long CONFIRM_ABOVE_RUNS = 100_000;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "The scenario file (TOML).")
    Path scenario;

    @Option(names = "--vary", paramLabel = "KEY=START:STOP:COUNT|KEY=V1,V2,...",
            description = "A key to vary, as evolve --set spells it (repeatable: the grid is the product).")
    List<String> vary = new ArrayList<>();

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "A fixed override for every run (repeatable).")
    List<String> set = new ArrayList<>();

    @Option(names = "--samples", paramLabel = "N",
            description = "Draw N realisations of every uncertain number at each grid point "
                    + "(without it: one run per point with central values).")
    Integer samples;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Master seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--draws", paramLabel = "paired|independent", defaultValue = SweepPlan.PAIRED,
            description = "paired: draw s of every uncertain number is the same at every grid point, as evolve "
                    + "--seed S --sample s gives it; independent: fresh draws at every point (default: ${DEFAULT-VALUE}).")
    String draws;

    @Option(names = "--pair", paramLabel = "A,B",
            description = "Count the runs in which members A and B end bound to each other or merged (repeatable).")
    List<String> pairs = new ArrayList<>();

    @Option(names = "--outcome", paramLabel = "WHAT",
            description = "What the two-key map shows: group (the group stays bound; the default), a member's "
                    + "name (it ends together with the group) or A+B (a --pair).")
    String outcome;

    @Option(names = "--workers", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer workers;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: sweep-SCENARIONAME).")
    Path out;

    @Option(names = "--until", paramLabel = "GYR", description = "End every run at this time instead of the scenario's.")
    Double untilGyr;

    @Option(names = "--keep-snapshots", description = "Keep each run's snapshots under DIR/snapshots/run-NNNNNNNN.")
    boolean keepSnapshots;

    @Option(names = "--yes", description = "Allow a sweep of more than " + CONFIRM_ABOVE_RUNS + " runs.")
    boolean yes;

    @Option(names = "--shard", paramLabel = "I/N", description = "Make only every N-th run, starting with run I-1 (I from 1).")
    String shard;

    @Option(names = "--engine", paramLabel = "local|spark", defaultValue = "local",
            description = "Where runs are made: local threads, or Apache Spark under spark-submit (default: ${DEFAULT-VALUE}).")
    String engine;

    @Option(names = "--spark-master", paramLabel = "URL",
            description = "Spark master for --engine spark (default: the one spark-submit sets).")
    String sparkMaster;

    @Option(names = "--progress-every", paramLabel = "S", defaultValue = "10",
            description = "Seconds between progress lines when not on a terminal (default: ${DEFAULT-VALUE}).")
    double progressEveryS;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter stdout = spec.commandLine().getOut();
        SweepPlan plan = plan();
        int nWorkers = workers == null ? Runtime.getRuntime().availableProcessors() : workers;
        if (nWorkers < 1) {
            throw new ScenarioException("--workers", null, "must be at least 1 (got " + nWorkers + ")");
        }
        SweepEngine eng = engine(nWorkers);
        Path dir = out != null ? out : Path.of("sweep-" + baseName(scenario));
        String snapshots = keepSnapshots ? dir.resolve("snapshots").toAbsolutePath().toString() : null;
        RunSpec runSpec = new RunSpec(RunFunctions.current(), plan.sample(),
                untilGyr == null ? Double.NaN : untilGyr, snapshots);
        SweepProgress progress = new SweepProgress(stdout, RunProgress.onTerminal(), progressEveryS);
        PrintWriter stderr = spec.commandLine().getErr();
        // Ctrl+C or SIGTERM: stop saving, say what was kept; the JVM then exits 130 (143).
        Thread onStop = new Thread(() -> {
            if (!progress.complete()) {
                stderr.println();
                stderr.println(progress.stop());
                stderr.flush();
            }
        }, "holdfast-sweep-stop");
        Runtime.getRuntime().addShutdownHook(onStop);
        Sweep.Summary s;
        try {
            s = Sweep.run(plan, scenario, dir, runSpec, eng, progress);
        } finally {
            try {
                Runtime.getRuntime().removeShutdownHook(onStop);
            } catch (IllegalStateException e) {
                // already stopping: the hook says what was kept
            }
        }
        stdout.printf("sweep: %d runs in %s (%d made now, %d already done)%n", s.runsInShard(),
                plan.shardCount() == 1 ? "all" : "shard " + plan.shardIndex() + "/" + plan.shardCount(), s.made(),
                s.alreadyDone());
        for (Path p : s.written()) {
            stdout.println("  wrote " + p);
        }
        stdout.flush();
        return 0;
    }

    /** Checks every option and the varied keys, and builds the plan. */
    SweepPlan plan() throws IOException {
        if (!Files.isRegularFile(scenario)) {
            throw new ScenarioException(scenario.toString(), null, "no such scenario file");
        }
        List<Axis> axes = new ArrayList<>();
        Set<String> keys = new LinkedHashSet<>();
        KeyCheck check = KeyCheck.of(scenario);
        for (String v : vary) {
            Axis a = Axis.parse(v);
            if (!keys.add(a.key())) {
                throw new ScenarioException(Axis.OPTION, a.key(), "is varied twice");
            }
            check.requireNumber(Axis.OPTION, a.key());
            axes.add(a);
        }
        Overrides fixed = Overrides.parse(set);
        for (String k : fixed.asMap().keySet()) {
            if (keys.contains(k)) {
                throw new ScenarioException(Overrides.OPTION, k, "is also varied with --vary; give it only once");
            }
            check.requireKnown(Overrides.OPTION, k);
        }
        if (samples != null && samples < 1) {
            throw new ScenarioException("--samples", null, "must be at least 1 (got " + samples + ")");
        }
        if (untilGyr != null && !Double.isFinite(untilGyr)) {
            throw new ScenarioException("--until", null, "must be a finite number of Gyr");
        }
        if (!draws.equals(SweepPlan.PAIRED) && !draws.equals(SweepPlan.INDEPENDENT)) {
            throw new ScenarioException("--draws", draws, "choose paired or independent");
        }
        List<List<String>> named = pairs(check, pairs);
        String shown = outcomeShown(check, named, outcome);
        int[] sh = shard();
        SweepPlan plan = new SweepPlan(SweepPlan.FORMAT, scenario.toString(), sha256(scenario), fixed.asMap(), axes,
                samples == null ? 1 : samples, samples != null, seed, untilGyr, keepSnapshots, sh[0], sh[1], draws,
                named, shown);
        long runs = plan.runs();
        if (runs > Integer.MAX_VALUE || runs < 0) {
            throw new ScenarioException("--vary", null, "the sweep would have " + runs + " runs, more than "
                    + Integer.MAX_VALUE + " one sweep can hold");
        }
        if (runs > CONFIRM_ABOVE_RUNS && !yes) {
            throw new ScenarioException("--yes", null, "the sweep has " + runs + " runs (more than " + CONFIRM_ABOVE_RUNS
                    + "); add --yes if you mean it");
        }
        ValueCheck.readAtEveryValue(scenario, fixed.asMap(), axes, untilGyr == null ? Double.NaN : untilGyr);
        return plan;
    }

    /** Parses and checks --pair A,B options: two different members of the scenario, each pair once. */
    static List<List<String>> pairs(KeyCheck check, List<String> given) {
        List<List<String>> out = new ArrayList<>();
        Set<Set<String>> seen = new java.util.HashSet<>();
        for (String g : given) {
            String[] p = g.split(",", -1);
            if (p.length != 2 || p[0].isBlank() || p[1].isBlank()) {
                throw new ScenarioException("--pair", g, "expected two member names, A,B");
            }
            String a = p[0].trim();
            String b = p[1].trim();
            check.requireGalaxy("--pair", a);
            check.requireGalaxy("--pair", b);
            if (a.equals(b)) {
                throw new ScenarioException("--pair", g, "names the same member twice");
            }
            if (!seen.add(Set.of(a, b))) {
                throw new ScenarioException("--pair", g, "is given twice");
            }
            out.add(List.of(a, b));
        }
        return out;
    }

    /** Checks --outcome: group, a member's name, or A+B of a --pair; null for the default (group). */
    static String outcomeShown(KeyCheck check, List<List<String>> pairs, String outcome) {
        if (outcome == null || outcome.equals("group")) {
            return null;
        }
        for (List<String> p : pairs) {
            if (outcome.equals(p.get(0) + "+" + p.get(1)) || outcome.equals(p.get(1) + "+" + p.get(0))) {
                return p.get(0) + "+" + p.get(1);
            }
        }
        if (outcome.contains("+")) {
            throw new ScenarioException("--outcome", outcome, "is not one of the --pair options given");
        }
        check.requireGalaxy("--outcome", outcome);
        return outcome;
    }

    private int[] shard() {
        if (shard == null) {
            return new int[] {1, 1};
        }
        String[] p = shard.split("/", -1);
        try {
            int i = Integer.parseInt(p[0].trim());
            int n = Integer.parseInt(p[1].trim());
            if (p.length == 2 && n >= 1 && i >= 1 && i <= n) {
                return new int[] {i, n};
            }
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            // reported below
        }
        throw new ScenarioException("--shard", shard, "expected I/N with 1 <= I <= N, e.g. 3/16");
    }

    private SweepEngine engine(int nWorkers) {
        switch (engine) {
            case "local":
                return new LocalEngine(nWorkers);
            case "spark":
                return sparkEngine();
            default:
                throw new ScenarioException("--engine", engine, "unknown engine; choose local or spark");
        }
    }

    /** Loads the Spark engine by name, so that nothing of Spark is touched otherwise. */
    private SweepEngine sparkEngine() {
        try {
            Class.forName("org.apache.spark.SparkConf", false, getClass().getClassLoader());
            Class<?> c = Class.forName("org.holdfast.sweep.spark.SparkEngine");
            return (SweepEngine) c.getConstructor(String.class).newInstance(sparkMaster);
        } catch (ClassNotFoundException | NoClassDefFoundError e) {
            throw new ScenarioException("--engine", "spark",
                    "Apache Spark is not on the class path; run holdfast under spark-submit (see the README)");
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot start the Spark engine: " + e, e);
        }
    }

    static String sha256(Path file) throws IOException {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String baseName(Path p) {
        String n = p.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
