package org.holdfast.run;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;

/** Runs a group forward with a fixed step, then from its end state back to the start. */
final class Reversal {

    private Reversal() {
    }

    static RunResult forwardAndBack(GroupSpec g, Scheme scheme, double stepGyr, double untilGyr, boolean de,
            double[][] startOut, double[][] backOut) {
        FlatLambdaHistory h = FlatLambdaHistory.standard();
        RunSettings fwd = new RunSettings(0, untilGyr, scheme, Double.NaN, stepGyr / Units.MYR, Double.NaN, de, false, 1);
        List<GalaxySpec> end = new ArrayList<>();
        RunResult r;
        try (Simulation sim = Simulation.create(g, fwd, h)) {
            for (int i = 0; i < sim.bodyCount(); i++) {
                startOut[i] = new double[] {sim.bodyX()[i], sim.bodyY()[i], sim.bodyZ()[i]};
            }
            r = sim.run(List.of());
            for (int i = 0; i < sim.bodyCount(); i++) {
                GalaxySpec s = g.galaxies().get(i);
                end.add(new GalaxySpec(s.name(), s.massMsun(),
                        new double[] {sim.bodyX()[i], sim.bodyY()[i], sim.bodyZ()[i]},
                        new double[] {Units.kpcPerGyrToKms(sim.bodyVx()[i]), Units.kpcPerGyrToKms(sim.bodyVy()[i]),
                            Units.kpcPerGyrToKms(sim.bodyVz()[i])}, s.halo(), null));
            }
        }
        RunSettings bwd = new RunSettings(untilGyr, 0, scheme, Double.NaN, stepGyr / Units.MYR, Double.NaN, de, false, 1);
        try (Simulation sim = Simulation.create(new GroupSpec(end, null), bwd, h)) {
            sim.run(List.of());
            for (int i = 0; i < sim.bodyCount(); i++) {
                backOut[i] = new double[] {sim.bodyX()[i], sim.bodyY()[i], sim.bodyZ()[i]};
            }
        }
        return r;
    }
}
