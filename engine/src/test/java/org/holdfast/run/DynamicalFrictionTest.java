package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** A satellite sinking by dynamical friction in a singular isothermal host (invented members). */
class DynamicalFrictionTest {

    private static final double VC_KMS = 220;
    private static final double R_TRUNC = 1000;
    private static final double R_START = 50;
    private static final double SATELLITE = 2e10;
    private static final double LN_LAMBDA = 3;

    /** Separation and the time it first fell below a fraction of the start. */
    private static final class Sinking implements RunObserver {
        final double below;
        double reachedAt = Double.NaN;
        double maxMomentum;
        double momentumScale;
        /** Stopped once sunk: the point satellite's fall into the cusp would take ever shorter steps. */
        Simulation stop;

        Sinking(double below) {
            this.below = below;
        }

        @Override
        public void afterStep(RunView v) {
            double dx = v.bodyX()[1] - v.bodyX()[0];
            double dy = v.bodyY()[1] - v.bodyY()[0];
            double dz = v.bodyZ()[1] - v.bodyZ()[0];
            if (Double.isNaN(reachedAt) && Math.sqrt(dx * dx + dy * dy + dz * dz) < below) {
                reachedAt = v.tGyr();
                if (stop != null) {
                    stop.cancel();
                }
            }
            double px = 0;
            double scale = 0;
            for (int i = 0; i < v.bodyCount(); i++) {
                px += v.bodyMass()[i] * v.bodyVx()[i];
                scale += v.bodyMass()[i] * Math.abs(v.bodyVy()[i]);
            }
            maxMomentum = Math.max(maxMomentum, Math.abs(px));
            momentumScale = Math.max(momentumScale, scale);
        }
    }

    private static GroupSpec satelliteOnCircle() {
        double vc = Units.kmsToKpcPerGyr(VC_KMS);
        double hostMass = vc * vc * R_TRUNC / Units.G;
        HaloSpec sis = new HaloSpec("isothermal", Double.NaN, Double.NaN, Double.NaN, R_TRUNC);
        return Groups.of(new GalaxySpec("Brannock", hostMass, new double[] {0, 0, 0}, new double[] {0, 0, 0}, sis, null),
                Groups.point("Tilde", SATELLITE, new double[] {R_START, 0, 0}, new double[] {0, VC_KMS, 0}));
    }

    @Test
    void circularSatelliteSinksInTheChandrasekharTime() {
        // Binney & Tremaine 2008, Galactic Dynamics 2nd ed., sec. 8.1 (equation number from memory, 8.13):
        // in a singular isothermal sphere a satellite on a circular orbit spirals in as r dr/dt = -0.428 ln L G M / v_c,
        // reaching the centre after t_fric = (1.17 / ln Lambda) r_i^2 v_c / (G M): 2.44 Gyr for these numbers.
        double vc = Units.kmsToKpcPerGyr(VC_KMS);
        double tFric = 1.17 / LN_LAMBDA * R_START * R_START * vc / (Units.G * SATELLITE);
        assertEquals(2.44, tFric, 0.01);
        double fraction = 0.05;
        Sinking watch = new Sinking(fraction * R_START);
        RunSettings s = Groups.adaptive(Scheme.LEAPFROG, 4, 0.01, false)
                .withFriction(true, CoulombLog.constant(LN_LAMBDA)).withMergeWithin(0);
        try (Simulation sim = Simulation.create(satelliteOnCircle(), s, FlatLambdaHistory.standard())) {
            watch.stop = sim;
            sim.run(List.of(watch));
            // the budget K + W - friction work stays put while the orbit loses its energy
            assertTrue(sim.frictionWork() < 0, "friction took energy out: " + sim.frictionWork());
            assertTrue(sim.energyResidual() < 1e-3, "budget residual " + sim.energyResidual());
        }
        // r^2 falls linearly in time, so reaching fraction f of r_i takes t_fric (1 - f^2)
        double expected = tFric * (1 - fraction * fraction);
        assertTrue(!Double.isNaN(watch.reachedAt), "the satellite never sank");
        assertEquals(expected, watch.reachedAt, 0.15 * expected, "sinking time");
        // the host takes the reaction: total momentum stays zero (common practice: Newton's third law)
        assertTrue(watch.maxMomentum < 1e-12 * watch.momentumScale, "momentum " + watch.maxMomentum);
    }

    @Test
    void withoutFrictionTheOrbitStaysCircular() {
        Sinking watch = new Sinking(0.9 * R_START);
        RunSettings s = Groups.adaptive(Scheme.LEAPFROG, 4, 0.01, false).withMergeWithin(0);
        try (Simulation sim = Simulation.create(satelliteOnCircle(), s, FlatLambdaHistory.standard())) {
            sim.run(List.of(watch));
            assertEquals(0.0, sim.frictionWork());
        }
        assertTrue(Double.isNaN(watch.reachedAt), "sank without friction at " + watch.reachedAt);
    }
}
