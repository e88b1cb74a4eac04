package org.holdfast.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.CosmologyReader;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.InvalidCosmologyException;
import org.holdfast.group.GroupSpec;
import org.holdfast.run.RunSettings;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.Node;
import org.holdfast.schema.ScenarioFile;

/**
 * Reads a whole scenario file: top-level {@code name} and {@code description}, then
 * {@code [cosmology]}, {@code [run]}, {@code [observer]}, {@code [[galaxy]]} and {@code [flow]}
 * ({@code [film]} belongs to the renderer and is only allowed here). Every check happens before
 * anything is written anywhere.
 */
public final class ScenarioReader {

    /** The top-level keys of a scenario. */
    public static final String[] TOP_LEVEL = {"name", "description", "cosmology", "run", "observer", "galaxy",
        "flow", "film"};

    private ScenarioReader() {
    }

    /** Reads with central values for uncertain numbers and the scenario's own end time. */
    public static Scenario read(Path file, Overrides overrides) {
        return read(file, overrides, UncertainNumbers.central(), Double.NaN);
    }

    /**
     * Reads a scenario.
     *
     * @param numbers central values or a seeded draw of the uncertain numbers
     * @param untilGyr replaces [run] until_gyr when not NaN
     * @throws ScenarioException naming file, line and key for anything wrong
     */
    public static Scenario read(Path file, Overrides overrides, UncertainNumbers numbers, double untilGyr) {
        Node root = ScenarioFile.open(file, overrides, numbers);
        root.allowOnly(TOP_LEVEL);
        String stem = file.getFileName().toString().replaceFirst("\\.toml$", "");
        String name = root.string("name", stem);
        String description = root.string("description", "");
        Node cosmologyNode = root.requireTable("cosmology");
        Cosmology cosmology = CosmologyReader.read(cosmologyNode);
        RunSettings run = RunReader.read(root, untilGyr);
        List<String> warnings = new ArrayList<>();
        GroupSpec group = GroupReader.read(root, warnings);
        overrides.checkAllUsed();
        double horizon = Math.max(Cosmology.DEFAULT_HORIZON_GYR, 1.5 * Math.max(run.startGyr(), run.untilGyr()));
        ExpansionTable expansion;
        try {
            expansion = cosmology.solve(horizon);
        } catch (InvalidCosmologyException e) {
            throw CosmologyReader.asInputError(cosmologyNode, e);
        }
        Node runNode = root.requireTable("run");
        if (run.startGyr() <= expansion.earliestGyr() || run.startGyr() >= expansion.latestGyr()) {
            throw runNode.error("start_gyr", String.format(java.util.Locale.ROOT,
                    "%.4g Gyr is outside this universe's history (%.4g to %.4g Gyr from today)",
                    run.startGyr(), expansion.earliestGyr(), expansion.latestGyr()));
        }
        ReachCheck.check(runNode, run, expansion, untilGyr);
        warnings.addAll(numbers.warnings());
        return new Scenario(name, description, file, cosmology, expansion, run, group, List.copyOf(warnings),
                List.copyOf(numbers.used()));
    }
}
