package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.W0WaDarkEnergy;
import org.holdfast.group.FlowSpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The dynamics in a w0–wa universe from the expansion solver. */
@Tag("slow")
class W0WaDynamicsTest {

    /** w0 = -0.9, wa = -0.3 (w > -1 from a = 2/3 on: no rip), H0 = 70, Omega_m = 0.3, flat, no radiation (Chevallier & Polarski 2001; Linder 2003). */
    private static final ExpansionTable W0WA = new Cosmology(70, 0.3, 0, 0, new W0WaDarkEnergy(-0.9, -0.3)).solve(200);

    @Test
    void hubbleFlowTracersMoveWithTheScaleFactor() {
        // with the mean-matter and dark-energy terms, r'' = (a''/a) r, so r(t) = r0 a(t)/a(t0)
        // (Newtonian cosmology, e.g. Peebles 1993, Principles of Physical Cosmology, eq. 5.15)
        double start = -8;
        double until = 12;
        GroupSpec g = new GroupSpec(List.of(Groups.point("Mote", 1, new double[] {0, 0, 0}, new double[] {0, 0, 0})),
                new FlowSpec(400, 300, 3000, 0));
        RunSettings s = new RunSettings(start, until, Scheme.YOSHIDA4, Double.NaN, 4, Double.NaN, true, true, 7);
        try (Simulation sim = Simulation.create(g, s, W0WA)) {
            int n = sim.tracerCount();
            double[] r0 = new double[n];
            for (int j = 0; j < n; j++) {
                r0[j] = Math.sqrt(sq(sim.tracerX()[j]) + sq(sim.tracerY()[j]) + sq(sim.tracerZ()[j]));
            }
            assertEquals(StopReason.Kind.REACHED_END, sim.run(List.of()).reason().kind());
            double ratio = W0WA.scaleFactor(until) / W0WA.scaleFactor(start);
            double worst = 0;
            for (int j = 0; j < n; j++) {
                double rj = Math.sqrt(sq(sim.tracerX()[j]) + sq(sim.tracerY()[j]) + sq(sim.tracerZ()[j]));
                worst = Math.max(worst, Math.abs(rj / (r0[j] * ratio) - 1));
            }
            assertTrue(worst < 1e-8, "worst relative deviation from r0 a(t) " + worst);
        }
    }

    private static double sq(double x) {
        return x * x;
    }

    @Test
    void budgetOfADemoLikeGroupClosesOverThirtyGyr() {
        // energy budget K + W - (1/2) k(t) sum m r^2 - integral of the explicit time derivative, conserved for a
        // time-dependent Hamiltonian (dH/dt = partial H / partial t; Goldstein, Classical Mechanics, 3rd ed., sec. 8.2 — section from memory)
        RunResult r = EnergyBudgetTest.budget(W0WA, 0.01, false);
        assertEquals(StopReason.Kind.REACHED_END, r.reason().kind());
        assertTrue(r.maxEnergyResidual() < 1e-6, "largest residual " + r.maxEnergyResidual() + " in " + r.steps() + " steps");
    }
}
