package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.DoubleUnaryOperator;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.InvalidCosmologyException;
import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.weighing.Background;
import org.holdfast.weighing.DarkEnergyBound;
import org.holdfast.weighing.MassDraws;
import org.holdfast.weighing.PairMotion;
import org.holdfast.weighing.TimingSolver;
import org.holdfast.weighing.WeighingInput;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code holdfast timing}: the timing-argument mass of a pair, with its errors, in three backgrounds. */
@Command(name = "timing",
        header = "The timing-argument mass of a pair: tangential motion, uncertain inputs, backgrounds, a dark-energy bound.",
        mixinStandardHelpOptions = true,
        subcommands = {TimingFlowCommand.class},
        description = {
            "Finds the mass of a pair from its separation, radial and tangential velocity today, assuming",
            "the Big Bang was a pericentre of its orbit (zero separation when the motion is radial): without",
            "a background (Kepler), with the dark-energy force alone, and in the full background (matter and",
            "dark energy). Give the numbers as options, or a weighing file whose numbers may be uncertain",
            "({ mean, sigma }, { median, sigma_dex }, { min, max }) and --samples N for their spread.",
            "With an independent mass it bounds the strength of dark energy. 'timing flow' fits the mass",
            "to the velocities of the galaxies around a group.",
            "",
            "Examples:",
            "  holdfast timing --separation-kpc 784 --radial-velocity-kms -130 --h0 70 --omega-m 0.3 --json",
            "  holdfast timing scenarios/weighing-brisk-pair.toml --samples 20 --seed 1 --out brisk-weighing"
        })
public final class TimingCommand implements Callable<Integer> {

    /** The central expansion reaches this far ahead, for drawing the orbit's future. */
    static final double PLOT_HORIZON_GYR = 60;

    /** How many values of w are solved for its bound. */
    private static final int W_NODES = 29;

    /** The bound uses the first this many draws (each costs a weighing per value tried). */
    static final int BOUND_DRAWS = 100;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE.toml",
            description = "A weighing file ([pair], optional [cosmology] and [independent_mass]).")
    Path file;

    @Option(names = "--separation-kpc", paramLabel = "KPC", description = "Separation today, kpc.")
    Double separationKpc;

    @Option(names = "--radial-velocity-kms", paramLabel = "KM_S",
            description = "Radial velocity today, km/s (negative: approaching).")
    Double radialKms;

    @Option(names = "--tangential-velocity-kms", paramLabel = "KM_S", description = "Tangential velocity today, km/s (default 0).")
    Double tangentialKms;

    @Option(names = "--age-gyr", paramLabel = "GYR",
            description = "Time since the Big Bang, Gyr (default: the cosmology's age).")
    Double ageGyr;

    @Mixin
    CosmologyOptions cosmology;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Override a value of the weighing file, e.g. pair.age_gyr=13.8.")
    List<String> sets = new ArrayList<>();

    @Option(names = "--samples", paramLabel = "N", description = "Draws of the uncertain numbers of the file (default 0: central values).")
    int samples;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of the draws (default 1).")
    long seed = 1;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores); the answer does not depend on it.")
    Integer threads;

    @Option(names = "--independent-mass-msun", paramLabel = "MSUN", description = "An independent mass estimate, for the bound on dark energy.")
    Double independentMass;

    @Option(names = "--independent-sigma-msun", paramLabel = "MSUN", description = "Its standard error.")
    Double independentSigma;

    @Option(names = "--bound-max", paramLabel = "X", description = "Top of the flat prior on Lambda / Lambda_cosmology (default 12).")
    double boundMax = 12;

    @Option(names = "--bound-on", paramLabel = "lambda|w",
            description = "Bound the strength of the cosmological constant (default) or a constant w.")
    String boundOn = "lambda";

    @Option(names = "--w-range", paramLabel = "LO:HI", description = "The flat prior on w for --bound-on w (default -2.5:-0.4).")
    String wRange = "-2.5:-0.4";

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Option(names = "--out", paramLabel = "DIR", description = "Write draws.csv, summary.json and PNGs (mass histogram, orbit, bound) here.")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        int nThreads = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (nThreads < 1) {
            throw new ScenarioException("--threads", null, "must be at least 1 (got " + nThreads + ")");
        }
        if (samples < 0) {
            throw new ScenarioException("--samples", null, "must be >= 0 (got " + samples + ")");
        }
        Inputs in = file != null ? fromFile(nThreads) : fromOptions();
        TimingReport report = TimingReport.compute(in.central, in.table, in.draws, bound(in, nThreads), boundOn);
        if (out != null) {
            TimingReport.checkOut(out);
        }
        PrintWriter w = spec.commandLine().getOut();
        if (json) {
            w.println(report.json());
        } else {
            report.print(w);
        }
        if (out != null) {
            report.write(out);
            if (!json) {
                w.println("wrote " + out);
            }
        }
        w.flush();
        return 0;
    }

    /** The central input, its expansion and the draws (null without --samples). */
    record Inputs(WeighingInput central, ExpansionTable table, MassDraws.Draw[] draws, List<PairMotion> pairs) {
    }

    private Inputs fromOptions() {
        if (separationKpc == null || radialKms == null) {
            throw new ScenarioException(separationKpc == null ? "--separation-kpc" : "--radial-velocity-kms", null,
                    "missing: give it, or a weighing file");
        }
        if (!(separationKpc > 0) || Double.isInfinite(separationKpc)) {
            throw new ScenarioException("--separation-kpc", null, "must be a positive number of kpc");
        }
        if (!Double.isFinite(radialKms)) {
            throw new ScenarioException("--radial-velocity-kms", null, "must be a finite number of km/s");
        }
        double vt = tangentialKms == null ? 0 : tangentialKms;
        if (!(vt >= 0) || Double.isInfinite(vt)) {
            throw new ScenarioException("--tangential-velocity-kms", null, "must be a number >= 0 of km/s");
        }
        if (samples > 0) {
            throw new ScenarioException("--samples", null, "needs a weighing file with uncertain numbers");
        }
        if (!sets.isEmpty()) {
            throw new ScenarioException("--set", null, "needs a weighing file");
        }
        ExpansionTable table = null;
        if (cosmology.any() || ageGyr == null) {
            table = CosmologyOptions.solve(cosmology.cosmology(), PLOT_HORIZON_GYR);
        }
        double age = ageGyr == null ? table.ageGyr() : ageGyr;
        if (!(age > 0) || Double.isInfinite(age)) {
            throw new ScenarioException("--age-gyr", null, "must be a positive number of Gyr (got " + age + ")");
        }
        WeighingInput w = new WeighingInput(separationKpc, radialKms, vt, age, table == null ? null : table.cosmology(),
                independentMass == null ? Double.NaN : independentMass,
                independentSigma == null ? Double.NaN : independentSigma);
        checkIndependent(w);
        return new Inputs(w, table, null, List.of(pair(w, table)));
    }

    private Inputs fromFile(int nThreads) {
        if (separationKpc != null || radialKms != null || tangentialKms != null || ageGyr != null || cosmology.any()) {
            throw new ScenarioException(separationKpc != null ? "--separation-kpc" : radialKms != null
                    ? "--radial-velocity-kms" : tangentialKms != null ? "--tangential-velocity-kms"
                    : ageGyr != null ? "--age-gyr" : "--h0", null,
                    "give the pair and cosmology in the file (or override with --set), not as options");
        }
        Overrides overrides = Overrides.parse(sets);
        UncertainNumbers centralNumbers = UncertainNumbers.central();
        Node root = ScenarioFile.open(file, overrides, centralNumbers);
        WeighingInput central = WeighingInput.read(root);
        overrides.checkAllUsed();
        if (independentMass != null) {
            central = new WeighingInput(central.separationKpc(), central.radialKms(), central.tangentialKms(),
                    central.ageGyr(), central.cosmology(), independentMass,
                    independentSigma == null ? Double.NaN : independentSigma);
        }
        checkIndependent(central);
        ExpansionTable table = null;
        if (central.cosmology() != null) {
            try {
                table = central.cosmology().solve(PLOT_HORIZON_GYR);
            } catch (InvalidCosmologyException e) {
                throw new ScenarioException(file.toString(), "cosmology", e.getMessage());
            }
        }
        if (Double.isNaN(central.ageGyr()) && table == null) {
            throw new ScenarioException(file.toString(), "pair.age_gyr", "give an age or a [cosmology]");
        }
        boolean cosmologyVaries = centralNumbers.used().stream().anyMatch(u -> u.path().startsWith("cosmology."));
        MassDraws.Draw[] draws = null;
        List<PairMotion> pairs = new ArrayList<>();
        if (samples > 0) {
            String text = readText(file);
            WeighingInput fixedInd = central;
            draws = MassDraws.run(samples, i -> drawn(text, overrides, i, fixedInd), table, cosmologyVaries, nThreads);
            for (MassDraws.Draw d : draws) {
                if (Double.isFinite(d.ageGyr())) {
                    pairs.add(new PairMotion(d.input().separationKpc(), d.input().radialKms(),
                            d.input().tangentialKms(), d.ageGyr()));
                }
            }
        } else {
            pairs.add(pair(central, table));
        }
        return new Inputs(central, table, draws, pairs);
    }

    private WeighingInput drawn(String text, Overrides overrides, int i, WeighingInput central) {
        WeighingInput d = WeighingInput.read(ScenarioFile.parse(file, text, overrides.copy(),
                UncertainNumbers.sampling(seed, i)));
        return new WeighingInput(d.separationKpc(), d.radialKms(), d.tangentialKms(), d.ageGyr(), d.cosmology(),
                central.independentMassMsun(), central.independentSigmaMsun());
    }

    private static String readText(Path f) {
        try {
            return Files.readString(f);
        } catch (java.io.IOException e) {
            throw new ScenarioException(f.toString(), null, "cannot read: " + e.getMessage());
        }
    }

    private static PairMotion pair(WeighingInput w, ExpansionTable table) {
        double age = Double.isNaN(w.ageGyr()) ? table.ageGyr() : w.ageGyr();
        return new PairMotion(w.separationKpc(), w.radialKms(), w.tangentialKms(), age);
    }

    private void checkIndependent(WeighingInput w) {
        boolean m = Double.isFinite(w.independentMassMsun());
        boolean s = Double.isFinite(w.independentSigmaMsun());
        if (m != s) {
            throw new ScenarioException(m ? "--independent-sigma-msun" : "--independent-mass-msun", null,
                    "give the independent mass and its error together");
        }
        if (m && !(w.independentMassMsun() > 0 && w.independentSigmaMsun() > 0)) {
            throw new ScenarioException("--independent-mass-msun", null, "the mass and its error must be > 0");
        }
        if (!(boundMax > 0) || Double.isInfinite(boundMax)) {
            throw new ScenarioException("--bound-max", null, "must be a positive number (got " + boundMax + ")");
        }
    }

    private DarkEnergyBound.Result bound(Inputs in, int nThreads) {
        WeighingInput c = in.central;
        if (!Double.isFinite(c.independentMassMsun())) {
            return null;
        }
        if (in.table == null) {
            throw new ScenarioException("--independent-mass-msun", null, "the bound on dark energy needs a cosmology");
        }
        ExpansionTable h = in.table;
        List<PairMotion> within = in.pairs.stream()
                .filter(p -> -p.ageGyr() >= h.earliestGyr() - TimingSolver.START_SLACK_GYR).toList();
        if (within.isEmpty()) {
            throw new ScenarioException("--independent-mass-msun", null, String.format(Locale.ROOT,
                    "the bound needs ages within the cosmology's %.4f Gyr", h.ageGyr()));
        }
        List<PairMotion> use = within.size() > BOUND_DRAWS ? within.subList(0, BOUND_DRAWS) : within;
        if (boundOn.equals("w")) {
            return wBound(use, h, c, nThreads);
        }
        if (!boundOn.equals("lambda")) {
            throw new ScenarioException("--bound-on", null, "expected lambda or w, got '" + boundOn + "'");
        }
        return DarkEnergyBound.of(use, t -> Background.DARK_ENERGY.coefficient(h, t), c.independentMassMsun(),
                c.independentSigmaMsun(), boundMax, nThreads);
    }

    /**
     * The likelihood of a constant w, each value its own expansion; an age given with the pair is
     * held (values of w whose universe is younger than it are excluded), the cosmology's own age
     * follows w.
     */
    private DarkEnergyBound.Result wBound(List<PairMotion> pairs, ExpansionTable h, WeighingInput c, int nThreads) {
        String[] parts = wRange.split(":");
        double lo;
        double hi;
        try {
            lo = Double.parseDouble(parts[0]);
            hi = Double.parseDouble(parts[parts.length - 1]);
        } catch (NumberFormatException e) {
            throw new ScenarioException("--w-range", null, "expected LO:HI, got '" + wRange + "'");
        }
        if (parts.length != 2 || !(hi > lo) || !Double.isFinite(lo) || !Double.isFinite(hi)) {
            throw new ScenarioException("--w-range", null, "expected LO:HI with LO < HI, got '" + wRange + "'");
        }
        int n = W_NODES;
        double[] nodes = new double[n];
        double[] ages = new double[n];
        DoubleUnaryOperator[] fields = new DoubleUnaryOperator[n];
        org.holdfast.expansion.Cosmology base = h.cosmology();
        for (int j = 0; j < n; j++) {
            nodes[j] = lo + (hi - lo) * j / (n - 1);
            try {
                ExpansionTable t = new org.holdfast.expansion.Cosmology(base.h0Kms(), base.omegaM(), base.omegaR(),
                        base.omegaK(), nodes[j] == -1 ? new org.holdfast.expansion.ConstantW(-1)
                                : new org.holdfast.expansion.ConstantW(nodes[j])).solve(1);
                fields[j] = x -> Background.DARK_ENERGY.coefficient(t, x);
                ages[j] = t.ageGyr();
            } catch (InvalidCosmologyException e) {
                fields[j] = null;
                ages[j] = 0;
            }
        }
        return DarkEnergyBound.over(pairs, nodes, j -> fields[j], ages, Double.isNaN(c.ageGyr()), c.independentMassMsun(),
                c.independentSigmaMsun(), nThreads);
    }

}
