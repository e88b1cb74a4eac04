package org.holdfast.weighing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** The velocity-distance relation and its fit. */
class FlowCurveTest {

    @Test
    void withoutDarkEnergyTheZeroVelocityRadiusIsLyndenBellAndSandages() {
        // Lynden-Bell 1981 (Observatory 101, 111); Sandage 1986 (ApJ 307, 1): radial orbits from the
        // Big Bang turn around at R0 with M = pi^2 R0^3 / (8 G t0^2)
        double age = 13.0;
        FlowCurve c = new FlowCurve(t -> 0.0, age, 300, 5000, 60);
        for (double m : new double[] {1e12, 4e12}) {
            double r0 = Math.cbrt(8 * Units.G * m * age * age / (Math.PI * Math.PI));
            assertEquals(r0, c.zeroVelocityKpc(m), 1e-4 * r0);
        }
        // and every point of the relation is a Kahn & Woltjer radial orbit of that mass
        KeplerTiming.Orbit k = KeplerTiming.solve(new PairMotion(2500, c.velocityKms(2500, 2e12), 0, age));
        assertTrue(k == null || Math.abs(k.massMsun() / 2e12 - 1) < 1e-4);
    }

    @Test
    void darkEnergyPushesTheFlowOutwardAndShrinksTheZeroVelocityRadius() {
        ExpansionTable h = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(1);
        FlowCurve none = new FlowCurve(t -> 0.0, h.ageGyr(), 300, 5000, 60);
        FlowCurve de = new FlowCurve(t -> Background.DARK_ENERGY.coefficient(h, t), h.ageGyr(), 300, 5000, 60);
        assertTrue(de.zeroVelocityKpc(3e12) < none.zeroVelocityKpc(3e12));
        assertTrue(de.velocityKms(2500, 3e12) > none.velocityKms(2500, 3e12));
    }

    @Test
    void theFitFindsTheMassThatMadeNoiselessData() {
        ExpansionTable h = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(1);
        FlowCurve c = new FlowCurve(t -> Background.DARK_ENERGY.coefficient(h, t), h.ageGyr(), 150, 6000, 60);
        int n = 12;
        double[] r = new double[n];
        double[] er = new double[n];
        double[] v = new double[n];
        double[] ev = new double[n];
        List<String> names = new java.util.ArrayList<>();
        for (int i = 0; i < n; i++) {
            r[i] = 800 + 200 * i;
            er[i] = 0;
            v[i] = c.velocityKms(r[i], 2.5e12);
            ev[i] = 10;
            names.add("g" + i);
        }
        FlowData d = new FlowData(names, r, er, v, ev);
        double[] grid = new double[121];
        for (int i = 0; i < grid.length; i++) {
            grid[i] = 1e12 * Math.pow(10, i / 120.0);
        }
        FlowFit.Result f = FlowFit.fit(d, List.of(new FlowFit.Model(Double.NaN, c)), 0, grid, 2);
        assertEquals(2.5e12, f.bestMassMsun(), 0.02 * 2.5e12);
        assertTrue(f.mass().lo68() < 2.5e12 && f.mass().hi68() > 2.5e12);
        assertEquals(c.zeroVelocityKpc(2.5e12), f.zeroVelocityKpc().median(), 0.02 * c.zeroVelocityKpc(2.5e12));
    }
}
