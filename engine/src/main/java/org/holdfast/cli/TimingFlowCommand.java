package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.CosmologyReader;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.InvalidCosmologyException;
import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.weighing.Background;
import org.holdfast.weighing.FlowCurve;
import org.holdfast.weighing.FlowData;
import org.holdfast.weighing.FlowFit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code holdfast timing flow}: the mass of a group from the velocities and distances of the galaxies around it. */
@Command(name = "flow",
        header = "The mass of a group from the velocity-distance relation of the galaxies around it.",
        mixinStandardHelpOptions = true,
        description = {
            "Each galaxy is taken to have left the group's centre at the Big Bang on a radial orbit in the",
            "field of the group's mass and the background (dark energy by default). The mass, and optionally",
            "H0 or Omega_Lambda, whose velocity-distance relation fits the galaxies best is found on a grid,",
            "with 68% and 95% intervals and the zero-velocity radius. The table has the columns",
            "name,distance_kpc,distance_err_kpc,velocity_kms,velocity_err_kms (relative to the group's barycentre).",
            "",
            "Example:",
            "  holdfast timing flow scenarios/brisk-flow.csv --h0 70 --omega-m 0.3 --scatter-kms 25",
            "  holdfast timing flow scenarios/brisk-flow.toml --fit-h0 60:80:5"
        })
public final class TimingFlowCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "GALAXIES.csv|FILE.toml",
            description = "The galaxies around the group, or a file with [cosmology] and [flow] (galaxies = \"FILE.csv\").")
    Path data;

    @Mixin
    CosmologyOptions cosmology;

    @Option(names = "--age-gyr", paramLabel = "GYR", description = "Time since the Big Bang (default: the cosmology's age).")
    Double ageGyr;

    @Option(names = "--background", paramLabel = "KIND", description = "none, dark_energy (default) or full.")
    String background;

    @Option(names = "--scatter-kms", paramLabel = "KM_S", description = "Intrinsic velocity scatter added to every error (default 0).")
    Double scatter;

    /** The scatter used (option, file or 0). */
    double scatterKms;

    @Option(names = "--fit-h0", paramLabel = "LO:HI:N", description = "Also fit H0 over this grid (km/s/Mpc).")
    String fitH0;

    @Option(names = "--fit-omega-lambda", paramLabel = "LO:HI:N", description = "Also fit Omega_Lambda over this grid (flat).")
    String fitOmegaL;

    @Option(names = "--mass-range", paramLabel = "LO:HI", description = "Masses tried, Msun (default 1e10:1e14).")
    String massRange = "1e10:1e14";

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Option(names = "--out", paramLabel = "DIR", description = "Write fit.json, posterior.csv and flow.png here.")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Path[] table = {data};
        Cosmology base = data.getFileName().toString().endsWith(".toml") ? readFile(table) : cosmology.cosmology();
        scatterKms = scatter == null ? 0 : scatter;
        Background b = Background.of(background == null ? Background.DARK_ENERGY.key() : background);
        if (b == null) {
            throw new ScenarioException("--background", null, "expected one of " + Background.keys() + ", got '" + background + "'");
        }
        if (fitH0 != null && fitOmegaL != null) {
            throw new ScenarioException("--fit-h0", null, "fit H0 or Omega_Lambda, not both");
        }
        if (!(scatterKms >= 0) || Double.isInfinite(scatterKms)) {
            throw new ScenarioException("--scatter-kms", null, "must be >= 0");
        }
        double[] range = numbers("--mass-range", massRange, 2);
        if (!(range[0] > 0 && range[1] > range[0])) {
            throw new ScenarioException("--mass-range", null, "must be LO:HI with 0 < LO < HI");
        }
        if (out != null && Files.exists(out) && !Files.isDirectory(out)) {
            throw new ScenarioException("--out", null, "exists and is not a folder: " + out);
        }
        FlowData d = FlowData.read(table[0]);
        int nThreads = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (nThreads < 1) {
            throw new ScenarioException("--threads", null, "must be at least 1");
        }
        double[] masses = new double[161];
        for (int i = 0; i < masses.length; i++) {
            masses[i] = Math.exp(Math.log(range[0]) + (Math.log(range[1]) - Math.log(range[0])) * i / (masses.length - 1));
        }
        List<FlowFit.Model> models = models(base, b, d, range);
        FlowFit.Result fit = FlowFit.fit(d, models, scatterKms, masses, nThreads);
        Map<String, Object> j = result(fit, b, d);
        PrintWriter w = spec.commandLine().getOut();
        String text = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(j);
        if (json) {
            w.println(text);
        } else {
            print(w, fit, b, d);
        }
        if (out != null) {
            Files.createDirectories(out);
            TimingReport.writeText(out.resolve("fit.json"), text + "\n");
            StringBuilder s = new StringBuilder("mass_msun,posterior\n");
            for (int i = 0; i < masses.length; i++) {
                s.append(String.format(Locale.ROOT, "%.6g,%.6g%n", masses[i], fit.massPosterior()[i]));
            }
            TimingReport.writeText(out.resolve("posterior.csv"), s.toString());
            TimingPlots.flow(d, fit, out.resolve("flow.png"));
            if (!json) {
                w.println("wrote " + out);
            }
        }
        w.flush();
        return 0;
    }

    /** Reads a [cosmology] and [flow] file; fills in what the options left open, and the table's path. */
    private Cosmology readFile(Path[] table) {
        if (cosmology.any()) {
            throw new ScenarioException("--h0", null, "give the cosmology in " + data + ", not as options");
        }
        Node root = ScenarioFile.open(data, Overrides.none());
        root.allowOnly("cosmology", "flow");
        Cosmology base = CosmologyReader.read(root.requireTable("cosmology"));
        Node flow = root.requireTable("flow");
        flow.allowOnly("galaxies", "scatter_kms", "background", "age_gyr");
        Path dir = data.toAbsolutePath().getParent();
        table[0] = dir.resolve(flow.string("galaxies"));
        if (!Files.isRegularFile(table[0])) {
            throw flow.error("galaxies", "no such galaxy table: " + table[0]);
        }
        if (scatter == null && flow.has("scatter_kms")) {
            scatter = flow.number("scatter_kms");
        }
        if (background == null && flow.has("background")) {
            background = flow.choice("background", Background.keys());
        }
        if (ageGyr == null && flow.has("age_gyr")) {
            ageGyr = flow.positive("age_gyr");
        }
        return base;
    }

    private List<FlowFit.Model> models(Cosmology base, Background b, FlowData d, double[] range) {
        List<Double> values = new ArrayList<>();
        String option = fitH0 != null ? "--fit-h0" : "--fit-omega-lambda";
        String grid = fitH0 != null ? fitH0 : fitOmegaL;
        if (grid == null) {
            values.add(Double.NaN);
        } else {
            double[] g = numbers(option, grid, 3);
            int n = (int) g[2];
            if (n < 2 || n > 200 || g[2] != n || !(g[1] > g[0])) {
                throw new ScenarioException(option, null, "must be LO:HI:N with LO < HI and 2 <= N <= 200");
            }
            for (int i = 0; i < n; i++) {
                values.add(g[0] + (g[1] - g[0]) * i / (n - 1));
            }
        }
        double rLo = java.util.Arrays.stream(d.distanceKpc()).min().orElseThrow();
        double rHi = java.util.Arrays.stream(d.distanceKpc()).max().orElseThrow();
        double lo = 0.8 * rLo / FlowCurve.scale(range[1]);
        double hi = 1.25 * rHi / FlowCurve.scale(range[0]);
        List<FlowFit.Model> models = new ArrayList<>();
        for (double v : values) {
            Cosmology c = base;
            try {
                if (fitH0 != null) {
                    c = new Cosmology(v, base.omegaM(), base.omegaR(), base.omegaK(), base.darkEnergy());
                } else if (fitOmegaL != null) {
                    c = new Cosmology(base.h0Kms(), 1 - v - base.omegaR() - base.omegaK(), base.omegaR(), base.omegaK(),
                            base.darkEnergy());
                }
                ExpansionTable h = c.solve(1);
                double age = ageGyr == null ? h.ageGyr() : ageGyr;
                if (!(age > 0) || (b.needsHistory() && age > h.ageGyr() + 1e-3)) {
                    throw new ScenarioException("--age-gyr", null, String.format(Locale.ROOT,
                            "must be positive and, with a background, at most the cosmology's age %.4f Gyr (got %s)", h.ageGyr(), age));
                }
                models.add(new FlowFit.Model(v, new FlowCurve(TimingReport.field(b, h), age, lo, hi, 72)));
            } catch (InvalidCosmologyException e) {
                throw new ScenarioException(grid == null ? "cosmology" : option, null, e.getMessage());
            }
        }
        return models;
    }

    private static double[] numbers(String option, String text, int count) {
        String[] parts = text.split(":");
        if (parts.length != count) {
            throw new ScenarioException(option, null, "expected " + count + " numbers separated by ':', got '" + text + "'");
        }
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            try {
                v[i] = Double.parseDouble(parts[i].strip());
            } catch (NumberFormatException e) {
                throw new ScenarioException(option, null, "not a number: '" + parts[i] + "'");
            }
            if (!Double.isFinite(v[i])) {
                throw new ScenarioException(option, null, "not a finite number: '" + parts[i] + "'");
            }
        }
        return v;
    }

    private Map<String, Object> interval(FlowFit.Interval i) {
        Map<String, Object> o = ExpansionCommand.map();
        o.put("median", i.median());
        o.put("lo68", i.lo68());
        o.put("hi68", i.hi68());
        o.put("lo95", i.lo95());
        o.put("hi95", i.hi95());
        return o;
    }

    private Map<String, Object> result(FlowFit.Result f, Background b, FlowData d) {
        Map<String, Object> j = ExpansionCommand.map();
        j.put("galaxies", d.size());
        j.put("background", b.key());
        j.put("scatter_kms", scatterKms);
        j.put("age_gyr", f.bestModel().curve().ageGyr());
        j.put("best_mass_msun", f.bestMassMsun());
        j.put("mass_msun", interval(f.mass()));
        j.put("zero_velocity_radius_kpc", interval(f.zeroVelocityKpc()));
        j.put("chi2", f.chi2());
        if (f.parameter() != null) {
            j.put(fitH0 != null ? "h0_kms_mpc" : "omega_lambda", interval(f.parameter()));
            j.put(fitH0 != null ? "best_h0_kms_mpc" : "best_omega_lambda", f.bestParameter());
        }
        return j;
    }

    private void print(PrintWriter w, FlowFit.Result f, Background b, FlowData d) {
        w.printf(Locale.ROOT, "Velocity-distance fit: %d galaxies, background %s, age %.4g Gyr%n", d.size(), b.label(),
                f.bestModel().curve().ageGyr());
        FlowFit.Interval m = f.mass();
        w.printf(Locale.ROOT, "  mass                   %.3g Msun  median %.3g  68%% [%.3g, %.3g]  95%% [%.3g, %.3g]%n",
                f.bestMassMsun(), m.median(), m.lo68(), m.hi68(), m.lo95(), m.hi95());
        FlowFit.Interval r = f.zeroVelocityKpc();
        w.printf(Locale.ROOT, "  zero-velocity radius   median %.0f kpc  68%% [%.0f, %.0f]  95%% [%.0f, %.0f]%n",
                r.median(), r.lo68(), r.hi68(), r.lo95(), r.hi95());
        if (f.parameter() != null) {
            FlowFit.Interval p = f.parameter();
            w.printf(Locale.ROOT, "  %-22s best %.4g  median %.4g  68%% [%.4g, %.4g]  95%% [%.4g, %.4g]%n",
                    fitH0 != null ? "H0 (km/s/Mpc)" : "Omega_Lambda", f.bestParameter(), p.median(), p.lo68(), p.hi68(),
                    p.lo95(), p.hi95());
        }
        w.printf(Locale.ROOT, "  chi-square at the best fit %.2f for %d galaxies%n", f.chi2(), d.size());
    }
}
