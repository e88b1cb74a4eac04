package org.holdfast.cli;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.scenario.GroupReader;
import org.holdfast.scenario.Node;

/**
 * The group on the first rung of the rip ladder: the scenario's own members when it has any
 * (their total mass, and the mass-weighted mean distance of the others from the heaviest, as
 * the radius of one circular orbit), else a typical small group (invented round numbers).
 */
record RipGroup(String name, double massMsun, double radiusKpc) {

    static final RipGroup DEFAULT = new RipGroup("a small group of galaxies (2e12 Msun, 500 kpc)", 2e12, 500);

    static RipGroup of(Node root, String title) {
        if (!root.has("galaxy")) {
            return DEFAULT;
        }
        GroupSpec g = GroupReader.read(root, new ArrayList<>());
        List<GalaxySpec> gs = g.galaxies();
        if (gs.size() < 2) {
            return DEFAULT;
        }
        GalaxySpec heavy = gs.get(0);
        double total = 0;
        for (GalaxySpec s : gs) {
            total += s.massMsun();
            if (s.massMsun() > heavy.massMsun()) {
                heavy = s;
            }
        }
        double sum = 0;
        double weight = 0;
        for (GalaxySpec s : gs) {
            if (s != heavy) {
                double dx = s.positionKpc()[0] - heavy.positionKpc()[0];
                double dy = s.positionKpc()[1] - heavy.positionKpc()[1];
                double dz = s.positionKpc()[2] - heavy.positionKpc()[2];
                sum += s.massMsun() * Math.sqrt(dx * dx + dy * dy + dz * dz);
                weight += s.massMsun();
            }
        }
        double r = sum / weight;
        return r > 0 ? new RipGroup(String.format(java.util.Locale.ROOT, "a group like %s (%.3g Msun, %.0f kpc)",
                title, total, r), total, r) : DEFAULT;
    }
}
