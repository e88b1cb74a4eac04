package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.fates.Fate;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.run.RunSettings;
import org.holdfast.integrators.Scheme;
import org.holdfast.run.Simulation;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** Members at rest just inside and just outside the zero-gravity radius of a host (invented members). */
class ZeroGravityRadiusTest {

    @Test
    void insideFallsBackOutsideEscapes() {
        // zero-gravity radius R = (G M / (Omega_Lambda H0^2))^(1/3) (Chernin and collaborators; Pavlidou & Tomaras
        // 2014, JCAP — reference from memory): 1711.8 kpc for M = 4e12 Msun, H0 = 70, Omega_Lambda = 0.7. At rest
        // inside it gravity wins, outside the Lambda force does.
        ExpansionTable t = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(120);
        double host = 4e12;
        double r0 = Math.cbrt(Units.G * host / (0.7 * Math.pow(Units.hubbleToPerGyr(70), 2)));
        assertEquals(1711.8, r0, 0.5);
        HaloSpec soft = HaloSpec.point(10);
        List<GalaxySpec> gs = new ArrayList<>();
        gs.add(new GalaxySpec("Garth", host, new double[] {0, 0, 0}, new double[] {0, 0, 0}, soft, null));
        gs.add(new GalaxySpec("Inby", 1e8, new double[] {0.9 * r0, 0, 0}, new double[] {0, 0, 0}, soft, null));
        gs.add(new GalaxySpec("Outby", 1e8, new double[] {0, 1.1 * r0, 0}, new double[] {0, 0, 0}, soft, null));
        RunSettings s = new RunSettings(0, 100, Scheme.LEAPFROG, 0.01, Double.NaN, 5000, true, false, 1);
        FateTracker tracker = new FateTracker(t, true, 0.5);
        List<MemberFate> fates;
        try (Simulation sim = Simulation.create(new GroupSpec(gs, null), s, t, 1)) {
            sim.run(List.of(tracker));
            fates = tracker.fates(sim);
        }
        Fate inby = fates.get(1).fate();
        assertTrue(inby == Fate.MERGED || inby == Fate.BOUND, "Inby: " + fates.get(1));
        // Outby is outside the zero-gravity radius from the start: unbound from the start, not "escaped at 0"
        assertEquals(Fate.UNBOUND, fates.get(2).fate(), "Outby: " + fates.get(2));
        assertEquals(0.0, fates.get(2).atGyr());
        assertEquals(Fate.BOUND, fates.get(0).fate());
    }
}
