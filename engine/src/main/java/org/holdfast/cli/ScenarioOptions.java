package org.holdfast.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;

import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The options every command that reads a scenario shares: the file, overrides, draws. */
public final class ScenarioOptions {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "A scenario file (TOML).")
    Path file;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "Override a scenario value by its dotted key, galaxies by name "
                    + "(repeatable): --set cosmology.dark_energy.w0=-1.3 --set galaxy.NAME.mass_msun=2e12")
    List<String> set = new ArrayList<>();

    @Option(names = "--sample", paramLabel = "N",
            description = "Use draw N (0, 1, ...) of every uncertain number instead of its central value.")
    Long sample;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the draws for --sample (default: ${DEFAULT-VALUE}).")
    long seed;

    /** The overrides given with --set. */
    Overrides overrides() {
        return Overrides.parse(set);
    }

    /** The number reader: central values, or draw N of seed S. */
    UncertainNumbers numbers() {
        if (sample != null && sample < 0) {
            throw new ScenarioException("--sample", null, "must be 0 or more (got " + sample + ")");
        }
        return sample == null ? UncertainNumbers.central() : UncertainNumbers.sampling(seed, sample);
    }

    /** Reads and checks the scenario. */
    Scenario read(double untilGyr) {
        return ScenarioReader.read(file, overrides(), numbers(), untilGyr);
    }

    /**
     * One line on how uncertain numbers were used; when there were none, a line saying that
     * --sample changes nothing if it was given, otherwise null.
     */
    String uncertainNote(Scenario s) {
        if (s.uncertain().isEmpty()) {
            return sample == null ? null
                    : "the scenario has no uncertain numbers, so --sample " + sample + " changes nothing";
        }
        return (sample == null ? "used the central value of " : "used draw " + sample + " (seed " + seed + ") of ")
                + s.uncertain().size() + " uncertain number" + (s.uncertain().size() == 1 ? "" : "s");
    }
}
