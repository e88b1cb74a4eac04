package org.holdfast.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.run.RunSettings;
import org.holdfast.run.Simulation;
import org.holdfast.units.Units;

import org.junit.jupiter.api.Test;

/**
 * What distances.png draws: each member's distance from the group centre. A pair torn apart by a
 * w = -1.5 expansion is no group any more; from then on both members are measured from their
 * common centre of mass, so their distances stand in the inverse ratio of their masses (the
 * two-body problem, common practice) instead of the heavier one sitting "at the centre".
 */
class RunRecorderTest {

    @Test
    void aPairThatCameApartIsMeasuredFromItsCommonCentreOfMass() {
        ExpansionTable phantom = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1.5)).solve(40);
        double heavy = 1.2e12;
        double light = 4e11;
        double sep = 400;
        // a circular relative orbit today (G M / r = v^2), shared in inverse proportion to the masses
        double v = Units.kpcPerGyrToKms(Math.sqrt(Units.G * (heavy + light) / sep));
        double f = light / (heavy + light);
        HaloSpec bare = HaloSpec.point(1);
        GroupSpec pair = new GroupSpec(List.of(
                new GalaxySpec("Heavy", heavy, new double[] {-f * sep, 0, 0}, new double[] {0, -f * v, 0}, bare, null),
                new GalaxySpec("Light", light, new double[] {(1 - f) * sep, 0, 0}, new double[] {0, (1 - f) * v, 0},
                        bare, null)), null);
        double rip = phantom.ripGyr().orElseThrow();
        RunSettings s = new RunSettings(0, rip - 1, Scheme.LEAPFROG, 0.005, Double.NaN, 1e4, true, false, 1);
        RunRecorder rec = new RunRecorder(phantom, true, 0.1);
        try (Simulation sim = Simulation.create(pair, s, phantom, 1)) {
            sim.run(List.of(rec));
        }
        Map<String, double[]> d = rec.distancesKpc();
        int last = rec.times().length - 1;
        while (Double.isNaN(d.get("Heavy")[last])) {
            last--;
        }
        double dh = d.get("Heavy")[last];
        double dl = d.get("Light")[last];
        assertTrue(dl > 10 * sep, "the pair has come apart by " + rec.times()[last] + " Gyr: " + dl + " kpc");
        assertEquals(light / heavy, dh / dl, 1e-6, "distances from the common centre of mass");
        assertTrue(Double.isNaN(rec.zeroGravityKpc()[last]), "no group left to have a zero-gravity radius");
        assertTrue(Double.isFinite(rec.zeroGravityKpc()[0]), "the bound pair has one at the start");
    }
}
