package org.holdfast.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import org.holdfast.expansion.CosmologyReader;
import org.holdfast.expansion.ExpansionPlot;
import org.holdfast.expansion.ExpansionRangeException;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.RipLadder;
import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.units.Units;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code holdfast expansion}: the expansion history of one cosmology, as a table, JSON or a plot. */
@Command(name = "expansion",
        mixinStandardHelpOptions = true,
        header = "The expansion history of one universe: age, rip or crunch, a, H, k.",
        description = {
            "Solves the expansion of the universe for one cosmology and prints its landmarks (age,",
            "big rip or crunch, Hubble time, dark-energy density, q0, onset of acceleration) and",
            "a, H and the dark-energy term at a few times. Before a big rip it adds the rip",
            "ladder: when a group like the scenario's (or a typical one), a galaxy, a solar",
            "system, a planet and an atom come apart, by holdfast's binding criterion and by",
            "the rougher rule of Caldwell, Kamionkowski & Weinberg (2003).",
            "",
            "The cosmology comes from the [cosmology] table of a scenario file, or from options.",
            "",
            "Examples:",
            "  holdfast expansion scenarios/lambda-steady.toml",
            "  holdfast expansion --h0 70 --omega-m 0.3 --w0 -1.5 --at 0,10,20 --json",
            "  holdfast expansion scenarios/phantom-tide.toml --plot phantom.png"
        })
public final class ExpansionCommand implements Callable<Integer> {

    private static final double[] DEFAULT_TIMES = {0, 1, 2, 5, 10, 20, 50, 100};

    @Parameters(arity = "0..1", paramLabel = "SCENARIO", description = "A scenario file with a [cosmology] table.")
    Path scenario;

    @Mixin
    CosmologyOptions cosmology;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Override a scenario value, e.g. cosmology.h0=68.")
    List<String> sets = new ArrayList<>();

    @Option(names = "--at", paramLabel = "T1,T2,...", split = ",",
            description = "Sample times in Gyr from today (negative: the past).")
    List<Double> at;

    @Option(names = "--horizon", paramLabel = "GYR", defaultValue = "1000",
            description = "How far into the future the table reaches, Gyr (default ${DEFAULT-VALUE}).")
    double horizonGyr;

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    boolean json;

    @Option(names = "--plot", paramLabel = "FILE.png", description = "Also draw a(t) and w(a) into a PNG.")
    Path plot;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        if (!(horizonGyr > 0) || Double.isInfinite(horizonGyr)) {
            throw new ScenarioException("--horizon", null, "must be a positive number of Gyr");
        }
        if (plot != null) {
            checkPlotPath();
        }
        String title;
        ExpansionTable table;
        RipGroup group = RipGroup.DEFAULT;
        if (scenario != null) {
            rejectOptionsWithScenario();
            Overrides overrides = Overrides.parse(sets);
            Node root = ScenarioFile.open(scenario, overrides);
            title = root.string("name", scenario.getFileName().toString());
            table = CosmologyReader.solve(root.requireTable("cosmology"), horizonGyr);
            group = RipGroup.of(root, title);
            overrides.checkAllUsed();
        } else {
            if (!sets.isEmpty()) {
                throw new ScenarioException("--set", null, "needs a scenario file");
            }
            table = CosmologyOptions.solve(cosmology.cosmology(), horizonGyr);
            title = "holdfast expansion";
        }
        List<double[]> samples = samples(table);
        List<RipLadder.Rung> ladder = RipLadder.of(table, group.name(), group.massMsun(), group.radiusKpc());
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                    .writeValueAsString(ExpansionReport.json(table, samples, ladder)));
        } else {
            ExpansionReport.text(out, title, table, samples, ladder);
        }
        out.flush();
        if (plot != null) {
            ExpansionPlot.write(table, title, plot);
        }
        return 0;
    }

    private void checkPlotPath() {
        if (!plot.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png")) {
            throw new ScenarioException("--plot", null, "expected a file name ending in .png, got '" + plot + "'");
        }
        Path dir = plot.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new ScenarioException("--plot", null, "no such folder: " + dir);
        }
        org.holdfast.output.OutputPaths.check(plot, org.holdfast.output.OutputPaths.Kind.FILE, "--plot");
    }

    private void rejectOptionsWithScenario() {
        if (cosmology.any()) {
            throw new ScenarioException("--h0/--omega-m/...", null,
                    "give either a scenario file or cosmology options, not both (use --set cosmology.KEY=VALUE)");
        }
    }

    /** Rows of t, a, H [km/s/Mpc], k [1/Gyr^2], rho_de [kg/m^3], w. */
    private List<double[]> samples(ExpansionTable t) {
        List<double[]> rows = new ArrayList<>();
        if (at != null) {
            for (double tt : at) {
                if (!Double.isFinite(tt)) {
                    throw new ScenarioException("--at", null, "times must be finite numbers of Gyr");
                }
                try {
                    rows.add(row(t, tt));
                } catch (ExpansionRangeException e) {
                    throw e.asInputError("--at", null);
                }
            }
            return rows;
        }
        for (double tt : DEFAULT_TIMES) {
            if (tt <= t.latestGyr()) {
                rows.add(row(t, tt));
            }
        }
        return rows;
    }

    private static double[] row(ExpansionTable t, double tt) {
        return new double[] {tt, t.scaleFactor(tt), Units.hubbleToKmsPerMpc(t.hubbleRate(tt)),
            t.darkEnergyAcceleration(tt), t.darkEnergyDensityKgM3(tt), t.equationOfState(tt)};
    }

    /** The JSON keys of one optional landmark. */
    static Object orNull(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : null;
    }

    static Map<String, Object> map() {
        return new LinkedHashMap<>();
    }
}
