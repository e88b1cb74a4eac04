package org.holdfast.group;

import java.util.List;

/**
 * A whole group as described: its members and the optional flow tracers around it.
 *
 * @param galaxies at least one
 * @param flow null for none
 */
public record GroupSpec(List<GalaxySpec> galaxies, FlowSpec flow) {

    /** Total number of massless tracers (stars of every member plus flow). */
    public long tracerCount() {
        long n = flow == null ? 0 : flow.count();
        for (GalaxySpec g : galaxies) {
            n += g.stars() == null ? 0 : g.stars().count();
        }
        return n;
    }
}
