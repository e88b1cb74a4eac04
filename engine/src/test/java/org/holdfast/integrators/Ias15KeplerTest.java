package org.holdfast.integrators;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** IAS15 with its own step control on Kepler orbits. */
class Ias15KeplerTest {

    @Test
    void energyErrorStaysAtRoundOffOverAThousandOrbits() {
        // Rein & Spiegel 2015, MNRAS 446, 1424, sec. 4.1 and fig. 3: with epsilon = 1e-9 the relative
        // energy error of a Kepler orbit stays at machine precision and grows as a random walk
        // (Brouwer's law, t^(1/2)), not linearly; 1e-13 over 1000 orbits of e = 0.5 allows that walk
        Kepler k = new Kepler(0.5);
        Ias15 ias = new Ias15(2, 0, Ias15.DEFAULT_EPSILON);
        ias.reset(0, 2, new double[] {k.x, k.y}, new double[] {k.vx, k.vy});
        ias.setNextStep(0.01);
        double e0 = Kepler.energy(k.x, k.y, k.vx, k.vy);
        double end = 1000 * 2 * Math.PI;
        double worst = 0;
        long steps = 0;
        while (ias.time() < end) {
            ias.step(k, end - ias.time());
            steps++;
            double[] p = ias.positions();
            double[] v = ias.velocities();
            worst = Math.max(worst, Math.abs(Kepler.energy(p[0], p[1], v[0], v[1]) / e0 - 1));
        }
        assertEquals(end, ias.time(), 1e-9);
        assertTrue(worst < 1e-13, "largest relative energy error " + worst + " in " + steps + " steps");
        // and the phase: the orbit is where Kepler's equation puts it
        double[] exact = k.exact(ias.time());
        assertTrue(ConvergenceOrderContract.distance(exact, ias.positions()[0], ias.positions()[1]) < 1e-8,
                "position error after 1000 orbits");
    }

    @Test
    void radauWeightsIntegrateDegreeFourteenExactly() {
        // an 8-point Radau rule is exact for polynomials of degree 2 * 8 - 2 = 14 (Abramowitz & Stegun 1964, 25.4.31)
        for (int p = 0; p <= 14; p++) {
            double sum = 0;
            for (int k = 0; k < 8; k++) {
                sum += Ias15.WEIGHTS[k] * Math.pow(Ias15.NODES[k], p);
            }
            assertEquals(1.0 / (p + 1), sum, 1e-14, "degree " + p);
        }
    }

    @Test
    void denseOutputFollowsTheOrbitInsideEachStep() {
        Kepler k = new Kepler(0.5);
        Ias15 ias = new Ias15(2, 0, Ias15.DEFAULT_EPSILON);
        ias.reset(0, 2, new double[] {k.x, k.y}, new double[] {k.vx, k.vy});
        ias.setNextStep(0.01);
        double[] px = new double[2];
        double[] pv = new double[2];
        double worst = 0;
        for (int s = 0; s < 200; s++) {
            ias.step(k, 100);
            for (int j = 1; j < 10; j++) {
                double tt = ias.stepStart() + j / 10.0 * (ias.stepEnd() - ias.stepStart());
                ias.sample(tt, px, pv);
                worst = Math.max(worst, ConvergenceOrderContract.distance(k.exact(tt), px[0], px[1]));
            }
        }
        assertTrue(worst < 1e-11, "largest error inside a step " + worst);
    }
}
