package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.group.FlowSpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Gravity against a cosmological constant, and tracers on the Hubble flow. */
@Tag("slow")
class LambdaDynamicsTest {

    private static final FlatLambdaHistory LCDM = FlatLambdaHistory.standard();

    @Test
    void hubbleFlowTracersMoveWithTheScaleFactor() {
        // with the mean-matter and Lambda terms, r'' = (a''/a) r, so r(t) = r0 a(t)/a(t0) exactly
        // (Newtonian cosmology, e.g. Peebles 1993, Principles of Physical Cosmology, eq. 5.15);
        // a(t) closed form for flat matter + Lambda (Carroll, Press & Turner 1992 — from memory)
        for (Scheme scheme : Scheme.values()) {
            double step = scheme == Scheme.YOSHIDA4 ? 4 : 0.5;
            double start = -8;
            double until = scheme == Scheme.YOSHIDA4 ? 12 : 4;
            GroupSpec g = new GroupSpec(List.of(Groups.point("Mote", 1, new double[] {0, 0, 0}, new double[] {0, 0, 0})),
                    new FlowSpec(400, 300, 3000, 0));
            RunSettings s = new RunSettings(start, until, scheme, Double.NaN, step, Double.NaN, true, true, 7);
            try (Simulation sim = Simulation.create(g, s, LCDM)) {
                int n = sim.tracerCount();
                double[] r0 = new double[n];
                for (int j = 0; j < n; j++) {
                    r0[j] = Math.sqrt(sq(sim.tracerX()[j]) + sq(sim.tracerY()[j]) + sq(sim.tracerZ()[j]));
                }
                RunResult r = sim.run(List.of());
                assertEquals(StopReason.Kind.REACHED_END, r.reason().kind());
                double ratio = LCDM.scaleFactor(until) / LCDM.scaleFactor(start);
                double worst = 0;
                for (int j = 0; j < n; j++) {
                    double rj = Math.sqrt(sq(sim.tracerX()[j]) + sq(sim.tracerY()[j]) + sq(sim.tracerZ()[j]));
                    worst = Math.max(worst, Math.abs(rj / (r0[j] * ratio) - 1));
                }
                assertTrue(worst < 1e-8, scheme + ": worst relative deviation from r0 a(t) " + worst);
            }
        }
    }

    private static double sq(double x) {
        return x * x;
    }

    /** R = (G M / (Omega_L H0^2))^(1/3), the zero-gravity radius (Chernin and collaborators; physics-references.md). */
    private static double zeroGravityRadius(double m) {
        return Math.cbrt(Units.G * m / (LCDM.ol * LCDM.h0 * LCDM.h0));
    }

    @Test
    void zeroGravityRadiusSeparatesFallingInFromReceding() {
        // R = 1711.8 kpc for M = 4e12 Msun, H0 = 70, Omega_L = 0.7 (physics-references.md, derived)
        double m = 4e12;
        double rzg = zeroGravityRadius(m);
        assertEquals(1711.8, rzg, 0.1);
        assertTrue(radialSpeedAfter(m, 0.9 * rzg) < 0, "released at 0.9 R it falls in");
        assertTrue(radialSpeedAfter(m, 1.1 * rzg) > 0, "released at 1.1 R it recedes");
    }

    private static double radialSpeedAfter(double m, double r) {
        GroupSpec g = Groups.of(Groups.point("Keel", m, new double[] {0, 0, 0}, new double[] {0, 0, 0}),
                Groups.point("Speck", 1, new double[] {r, 0, 0}, new double[] {0, 0, 0}));
        try (Simulation sim = Simulation.create(g, Groups.adaptive(Scheme.LEAPFROG, 3, 0.01, true), LCDM)) {
            sim.run(List.of());
            return sim.bodyVx()[1] - sim.bodyVx()[0];
        }
    }

    @Test
    void circularOrbitWithLambdaStaysCircular() {
        // in a Lambda universe r'' = -G M / r^2 + Omega_L H0^2 r, so a circular orbit needs
        // v^2 = G M / r - Omega_L H0^2 r^2 (Chernin and collaborators; follows from the force law)
        double m = 4e12;
        double r = 300;
        double vLambda = Math.sqrt(Units.G * m / r - LCDM.ol * LCDM.h0 * LCDM.h0 * r * r);
        double vNewton = Math.sqrt(Units.G * m / r);
        assertTrue(radialSpread(m, r, vLambda) < 1e-9, "with the Lambda speed the orbit stays circular");
        assertTrue(radialSpread(m, r, vNewton) > 1e-3, "the Newtonian speed is too fast to stay circular");
    }

    private static double radialSpread(double m, double r, double vKpcGyr) {
        GroupSpec g = Groups.of(Groups.point("Keel", m, new double[] {0, 0, 0}, new double[] {0, 0, 0}),
                Groups.point("Speck", 1, new double[] {r, 0, 0}, new double[] {0, vKpcGyr * Units.KPC_PER_GYR_TO_KMS, 0}));
        double[] range = {Double.POSITIVE_INFINITY, 0};
        RunObserver obs = new RunObserver() {
            @Override
            public void afterStep(RunView v) {
                double dx = v.bodyX()[1] - v.bodyX()[0];
                double dy = v.bodyY()[1] - v.bodyY()[0];
                double d = Math.sqrt(dx * dx + dy * dy);
                range[0] = Math.min(range[0], d);
                range[1] = Math.max(range[1], d);
            }
        };
        try (Simulation sim = Simulation.create(g, Groups.fixed(Scheme.YOSHIDA4, 20, 5, true), LCDM)) {
            sim.run(List.of(obs));
        }
        return (range[1] - range[0]) / r;
    }
}
