package org.holdfast.cli;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.expansion.RipLadder;
import org.holdfast.group.GroupSpec;
import org.holdfast.scenario.GroupReader;
import org.holdfast.schema.Node;

/**
 * The group on the first rung of the rip ladder: the scenario's own members when it has any
 * ({@link RipLadder#groupScale}), else a typical small group (invented round numbers).
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
        double[] mass = new double[gs.size()];
        double[][] pos = new double[gs.size()][];
        for (int i = 0; i < gs.size(); i++) {
            mass[i] = gs.get(i).massMsun();
            pos[i] = gs.get(i).positionKpc();
        }
        double[] mr = RipLadder.groupScale(mass, pos);
        double total = mr[0];
        double r = mr[1];
        return r > 0 ? new RipGroup(String.format(java.util.Locale.ROOT, "a group like %s (%.3g Msun, %.0f kpc)",
                title, total, r), total, r) : DEFAULT;
    }
}
