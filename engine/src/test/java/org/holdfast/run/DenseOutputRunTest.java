package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.CoulombLog;
import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** Snapshots sample the steps' dense output; mergers are located on it. */
class DenseOutputRunTest {

    private static RunSettings settings(Scheme scheme, double until, double snapshotMyr) {
        double accuracy = scheme == Scheme.IAS15 ? 1e-9 : 0.01;
        return new RunSettings(0, until, scheme, accuracy, Double.NaN, snapshotMyr, true, false, 1, false,
                CoulombLog.DEFAULT, 0);
    }

    private static double[][] finalState(Scheme scheme, double snapshotMyr, List<double[]> snaps) {
        RunObserver record = new RunObserver() {
            @Override
            public void atSnapshot(RunView v) {
                snaps.add(new double[] {v.tGyr(), v.bodyX()[3], v.bodyY()[3], v.bodyVx()[3]});
            }
        };
        try (Simulation sim = Simulation.create(EnergyBudgetTest.demoLike(), settings(scheme, 5, snapshotMyr),
                FlatLambdaHistory.standard())) {
            sim.run(List.of(record));
            int n = sim.bodyCount();
            return new double[][] {java.util.Arrays.copyOf(sim.bodyX(), n), java.util.Arrays.copyOf(sim.bodyY(), n),
                java.util.Arrays.copyOf(sim.bodyVz(), n)};
        }
    }

    @Test
    void theSnapshotIntervalDoesNotChangeTheTrajectory() {
        for (Scheme scheme : Scheme.values()) {
            List<double[]> often = new ArrayList<>();
            List<double[]> rarely = new ArrayList<>();
            double[][] a = finalState(scheme, 37, often);
            double[][] b = finalState(scheme, 1000, rarely);
            for (int k = 0; k < a.length; k++) {
                assertArrayEquals(a[k], b[k], 0.0, scheme + ": the end state differs with the snapshot interval");
            }
            assertTrue(often.size() > 100 && rarely.size() == 6, often.size() + " and " + rarely.size() + " snapshots");
            // snapshots at the same time agree to the interpolant's accuracy (1 Gyr is 1000 / 37 not whole: t = 0 and 5 only)
            assertEquals(often.get(0)[1], rarely.get(0)[1], 0.0);
            double[] lastOften = often.get(often.size() - 1);
            double[] lastRarely = rarely.get(rarely.size() - 1);
            assertEquals(5.0, lastOften[0], 0.0);
            assertEquals(lastOften[1], lastRarely[1], 0.0);
        }
    }

    @Test
    void snapshotsInsideStepsMatchARunThatEndsThere() {
        // a snapshot sampled from the interpolant at 2.220 Gyr against a run stopped at 2.220 Gyr (its last step lands there)
        List<double[]> snaps = new ArrayList<>();
        finalState(Scheme.IAS15, 222, snaps);
        double[] at = snaps.get(10);
        assertEquals(2.22, at[0], 1e-12);
        try (Simulation sim = Simulation.create(EnergyBudgetTest.demoLike(), settings(Scheme.IAS15, at[0], 1e6),
                FlatLambdaHistory.standard())) {
            sim.run(List.of());
            double scale = Math.hypot(sim.bodyX()[3], sim.bodyY()[3]);
            assertEquals(sim.bodyX()[3], at[1], 1e-9 * scale);
            assertEquals(sim.bodyY()[3], at[2], 1e-9 * scale);
        }
    }

    /**
     * Time for a radial Kepler fall from rest at r0 to r: t = sqrt(r0^3 / (2 G M)) [sqrt(x (1 - x)) +
     * arccos(sqrt(x))], x = r / r0 (the radial orbit's cycloid, e.g. Binney &amp; Tremaine 2008, Galactic
     * Dynamics, eq. 2.4 for the free-fall limit x = 0; the cycloid from memory, checked against it at x = 0).
     */
    static double infallTime(double r0, double r, double mass) {
        double x = r / r0;
        return Math.sqrt(r0 * r0 * r0 / (2 * Units.G * mass)) * (Math.sqrt(x * (1 - x)) + Math.acos(Math.sqrt(x)));
    }

    @Test
    void aMergerIsLocatedAtTheRadialInfallTime() {
        double m = 1e12;
        double r0 = 300;
        double within = 25;
        GroupSpec g = Groups.of(Groups.point("Hask", m / 2, new double[] {-r0 / 2, 0, 0}, new double[] {0, 0, 0}),
                Groups.point("Orrin", m / 2, new double[] {r0 / 2, 0, 0}, new double[] {0, 0, 0}));
        double expected = infallTime(r0, within, m);
        assertEquals(Math.PI / 2 * Math.sqrt(r0 * r0 * r0 / (2 * Units.G * m)), infallTime(r0, 0, m), 1e-12);
        for (Scheme scheme : Scheme.values()) {
            double accuracy = scheme == Scheme.IAS15 ? 1e-9 : 0.002;
            RunSettings s = new RunSettings(0, 5, scheme, accuracy, Double.NaN, 1000, false, false, 1, false,
                    CoulombLog.DEFAULT, within);
            try (Simulation sim = Simulation.create(g, s, FlatLambdaHistory.standard())) {
                sim.run(List.of());
                assertEquals(1, sim.bodyCount(), scheme + ": merged");
                double at = sim.events().get(0).tGyr();
                // IAS15 to its round-off; the splitting schemes to their own accuracy at this step
                double tol = scheme == Scheme.IAS15 ? 1e-10 : 1e-4;
                assertEquals(expected, at, tol * expected, scheme + ": merger time");
            }
        }
    }
}
