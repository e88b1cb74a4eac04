package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

/** Two point masses on a Kepler ellipse, without the dark-energy force. */
class KeplerOrbitTest {

    static final double M = 1e12;
    static final double A = 50;
    static final double E = 0.5;
    /** Kepler's third law, P = 2 pi sqrt(a^3 / (G M)) (common practice). */
    static final double PERIOD = 2 * Math.PI * Math.sqrt(A * A * A / (Units.G * M));

    static GroupSpec pair() {
        double rp = A * (1 - E);
        double vp = Math.sqrt(Units.G * M / A * (1 + E) / (1 - E)) * Units.KPC_PER_GYR_TO_KMS;
        return Groups.of(Groups.point("Tarn", 0.8 * M, new double[] {-0.2 * rp, 0, 0}, new double[] {0, -0.2 * vp, 0}),
                Groups.point("Brisk", 0.2 * M, new double[] {0.8 * rp, 0, 0}, new double[] {0, 0.8 * vp, 0}));
    }

    static RunResult run(Scheme scheme, double stepGyr, double orbits, List<RunObserver> obs) {
        RunSettings s = Groups.fixed(scheme, orbits * PERIOD, stepGyr / Units.MYR, false);
        try (Simulation sim = Simulation.create(pair(), s, FlatLambdaHistory.standard())) {
            return sim.run(obs);
        }
    }

    @Test
    void periodFollowsKeplersThirdLaw() {
        // Kepler's third law for the relative orbit, P^2 = 4 pi^2 a^3 / (G (m1 + m2)) (Kepler 1619; common practice)
        List<Double> crossings = new ArrayList<>();
        RunObserver pericentre = new RunObserver() {
            double lastY = Double.NaN;

            @Override
            public void afterStep(RunView v) {
                double y = v.bodyY()[1] - v.bodyY()[0];
                double x = v.bodyX()[1] - v.bodyX()[0];
                if (lastY < 0 && y >= 0 && x > 0) {
                    double vy = v.bodyVy()[1] - v.bodyVy()[0];
                    crossings.add(v.tGyr() - y / vy);
                }
                lastY = y;
            }
        };
        run(Scheme.YOSHIDA4, PERIOD / 2000, 5.2, List.of(pericentre));
        assertEquals(5, crossings.size());
        double measured = (crossings.get(4) - crossings.get(0)) / 4;
        assertEquals(PERIOD, measured, 1e-8 * PERIOD);
    }

    @Test
    void leapfrogEnergyErrorFallsAsStepSquared() {
        // kick-drift-kick leapfrog is second order (Hairer, Lubich & Wanner 2006, sec. I.1.4); fitted slope
        double slope = slope(Scheme.LEAPFROG, new double[] {200, 400, 800, 1600});
        assertEquals(2.0, slope, 0.05);
    }

    @Test
    void yoshidaEnergyErrorFallsAsStepToTheFourth() {
        // Yoshida 1990, Phys. Lett. A 150, 262: fourth-order composition; fitted slope
        double slope = slope(Scheme.YOSHIDA4, new double[] {100, 200, 400, 800});
        assertEquals(4.0, slope, 0.1);
    }

    private static double slope(Scheme scheme, double[] perOrbit) {
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (double n : perOrbit) {
            double err = run(scheme, PERIOD / n, 10, List.of()).maxEnergyResidual();
            double x = Math.log(PERIOD / n);
            double y = Math.log(err);
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        int k = perOrbit.length;
        return (k * sxy - sx * sy) / (k * sxx - sx * sx);
    }

    @Test
    void angularMomentumIsConservedToRoundOff() {
        // central pair forces conserve angular momentum exactly, and so does each kick and drift (common practice)
        double[] l = new double[2];
        RunObserver obs = new RunObserver() {
            @Override
            public void init(RunView v) {
                l[0] = lz(v);
            }

            @Override
            public void finish(RunView v, StopReason r) {
                l[1] = lz(v);
            }
        };
        run(Scheme.LEAPFROG, PERIOD / 300, 10, List.of(obs));
        assertEquals(l[0], l[1], 1e-13 * Math.abs(l[0]));
    }

    static double lz(RunView v) {
        double s = 0;
        for (int i = 0; i < v.bodyCount(); i++) {
            s += v.bodyMass()[i] * (v.bodyX()[i] * v.bodyVy()[i] - v.bodyY()[i] * v.bodyVx()[i]);
        }
        return s;
    }

    @Test
    void forwardThenBackwardReturnsToTheStart() {
        // the leapfrog and its symmetric compositions are time-reversible (Hairer, Lubich & Wanner 2006, sec. V.1)
        for (Scheme scheme : Scheme.values()) {
            for (boolean de : new boolean[] {false, true}) {
                double step = 2e-3;
                double until = 2000 * step;
                GroupSpec g = pair();
                double[][] start = new double[2][];
                double[][] back = new double[2][];
                RunResult f = Reversal.forwardAndBack(g, scheme, step, until, de, start, back);
                assertEquals(StopReason.Kind.REACHED_END, f.reason().kind());
                for (int i = 0; i < 2; i++) {
                    for (int k = 0; k < 3; k++) {
                        assertEquals(start[i][k], back[i][k], 1e-10 * A, scheme + " de=" + de + " body " + i + " axis " + k);
                    }
                }
            }
        }
    }
}
