package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;

/**
 * Reads the scenario, before a sweep or a threshold search writes or runs anything, at every
 * value of every varied key (the other keys at their first value), so that a value the reader
 * refuses (a negative mass, a universe that does not expand) is reported at once, as the
 * option that gave it, and leaves nothing behind. One read per value, not per grid point: a
 * combination of values that only fails together is still found by the run that meets it.
 */
public final class ValueCheck {

    private ValueCheck() {
    }

    /**
     * @param set the fixed overrides ({@code --set})
     * @param axes the varied keys
     * @param untilGyr the runs' end time; NaN for the scenario's own
     * @return the scenario as read with every axis at its first value
     * @throws ScenarioException for the first value the scenario reader refuses
     */
    public static Scenario readAtEveryValue(Path scenario, Map<String, String> set, List<Axis> axes,
            double untilGyr) {
        Scenario first = null;
        for (int i = 0; i < axes.size(); i++) {
            for (int k = 0; k < axes.get(i).size(); k++) {
                if (i > 0 && k == 0) {
                    continue; // the point with every axis at its first value was read already
                }
                Overrides o = withSet(set);
                for (int j = 0; j < axes.size(); j++) {
                    Axis a = axes.get(j);
                    o.put(a.key(), Axis.format(a.values().get(j == i ? k : 0)), Axis.OPTION);
                }
                Scenario s = ScenarioReader.read(scenario, o, UncertainNumbers.central(), untilGyr);
                first = first == null ? s : first;
            }
        }
        return first != null ? first
                : ScenarioReader.read(scenario, withSet(set), UncertainNumbers.central(), untilGyr);
    }

    private static Overrides withSet(Map<String, String> set) {
        Overrides o = Overrides.none();
        set.forEach((k, v) -> o.put(k, v, Overrides.OPTION));
        return o;
    }
}
