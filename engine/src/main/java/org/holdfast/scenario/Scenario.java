package org.holdfast.scenario;

import java.nio.file.Path;
import java.util.List;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.group.GroupSpec;
import org.holdfast.run.RunSettings;
import org.holdfast.uncertain.UncertainValue;

/**
 * A whole scenario, read and checked: what to evolve, in which universe, how.
 *
 * @param name free text from the file (or the file name)
 * @param description free text
 * @param file where it was read from
 * @param cosmology the background parameters
 * @param expansion the solved expansion history
 * @param run how to step
 * @param group the members and the flow
 * @param warnings assumptions the reader made that the user should hear about
 * @param uncertain the uncertain numbers and the values used for them; empty when none
 */
public record Scenario(String name, String description, Path file, Cosmology cosmology, ExpansionTable expansion,
        RunSettings run, GroupSpec group, List<String> warnings, List<UncertainValue> uncertain) {
}
