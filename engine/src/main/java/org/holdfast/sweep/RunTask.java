package org.holdfast.sweep;

import java.io.Serializable;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One run to make.
 *
 * @param run run index in the whole sweep
 * @param point grid-point index
 * @param sample sample index at that point
 * @param seed the seed of the run's draws
 * @param draw the draw index of its uncertain numbers under that seed
 * @param overrides dotted key to value, fixed and varied together
 * @param varied the keys of {@code overrides} that come from {@code --vary} (the others from
 *     {@code --set}), so that a bad value is blamed on the option that gave it
 */
public record RunTask(long run, int point, int sample, long seed, long draw, Map<String, String> overrides,
        List<String> varied) implements Serializable {

    private static final long serialVersionUID = 1L;

    public RunTask {
        overrides = new LinkedHashMap<>(overrides);
        varied = List.copyOf(varied);
    }
}
