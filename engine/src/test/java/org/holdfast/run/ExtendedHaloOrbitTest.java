package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.Halos;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** A point satellite inside an extended host. */
class ExtendedHaloOrbitTest {

    @Test
    void pointSatelliteCirclesAtTheHostsCircularSpeed() {
        // inside a spherical host a point feels G M(<r)/r^2 (Newton's shell theorem, Binney & Tremaine 2008,
        // sec. 2.2.1), so v_c = sqrt(G M(<r)/r) with M(<r) of NFW (Navarro, Frenk & White 1996) keeps it circular
        HaloSpec spec = new HaloSpec("nfw", Double.NaN, 20, Double.NaN, 250);
        HaloProfile host = Halos.build(spec, 1e12, FlatLambdaHistory.standard().criticalDensityToday());
        double r = 40;
        double vc = host.circularSpeed(r);
        double[] spread = {Double.POSITIVE_INFINITY, 0};
        double[] angle = {0, 0};
        RunObserver obs = new RunObserver() {
            double last = 0;

            @Override
            public void afterStep(RunView v) {
                double dx = v.bodyX()[1] - v.bodyX()[0];
                double dy = v.bodyY()[1] - v.bodyY()[0];
                double d = Math.hypot(dx, dy);
                spread[0] = Math.min(spread[0], d);
                spread[1] = Math.max(spread[1], d);
                double a = Math.atan2(dy, dx);
                double da = a - last;
                if (da < -Math.PI) {
                    da += 2 * Math.PI;
                }
                angle[0] += da;
                last = a;
            }
        };
        GroupSpec g = Groups.of(
                new GalaxySpec("Holm", 1e12, new double[] {0, 0, 0}, new double[] {0, 0, 0},
                        spec, null),
                Groups.point("Skerry", 1, new double[] {r, 0, 0}, new double[] {0, vc * Units.KPC_PER_GYR_TO_KMS, 0}));
        double until = 3;
        try (Simulation sim = Simulation.create(g, Groups.fixed(Scheme.YOSHIDA4, until, 1, false), FlatLambdaHistory.standard())) {
            sim.run(List.of(obs));
        }
        assertTrue((spread[1] - spread[0]) / r < 1e-9, "radial spread " + (spread[1] - spread[0]) / r);
        assertEquals(vc / r * until, angle[0], 1e-9 * angle[0]);
        // and not at the whole host's Keplerian speed
        assertTrue(Math.sqrt(Units.G * 1e12 / r) > 1.5 * vc);
    }
}
