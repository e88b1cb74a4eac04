package org.holdfast.integrators;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The schemes on a harmonic oscillator x'' = -x, whose exact solution is x = cos t
 * (common practice); one test class per scheme gives its order.
 */
abstract class OscillatorTest {

    abstract Integrator integrator();

    /** One particle on a spring, with a clock. */
    static final class Spring implements SplitSystem {
        double x = 1;
        double v = 0;
        double a = -1;
        double t = 0;

        @Override
        public void kick(double h) {
            v += a * h;
        }

        @Override
        public void drift(double h) {
            x += v * h;
            t += h;
        }

        @Override
        public void updateAccelerations() {
            a = -x;
        }
    }

    private double errorAfter(double h, double until) {
        Spring s = new Spring();
        int n = (int) Math.round(until / h);
        for (int i = 0; i < n; i++) {
            integrator().step(s, h);
        }
        assertEquals(until, s.t, 1e-9);
        return Math.abs(s.x - Math.cos(until));
    }

    @Test
    void errorFallsAtTheClaimedOrder() {
        double coarse = errorAfter(0.1, 10);
        double fine = errorAfter(0.05, 10);
        double order = Math.log(coarse / fine) / Math.log(2);
        assertEquals(integrator().order(), order, 0.1);
    }

    @Test
    void steppingBackUndoesAStep() {
        // symmetric compositions are time-reversible (Hairer, Lubich & Wanner 2006, sec. V.1)
        Spring s = new Spring();
        for (int i = 0; i < 100; i++) {
            integrator().step(s, 0.1);
        }
        for (int i = 0; i < 100; i++) {
            integrator().step(s, -0.1);
        }
        assertEquals(1, s.x, 1e-13);
        assertEquals(0, s.v, 1e-13);
        assertEquals(0, s.t, 1e-13);
    }

    @Test
    void clockExcursionIsReported() {
        Spring s = new Spring();
        double[] range = {0, 0};
        SplitSystem watch = new SplitSystem() {
            @Override
            public void kick(double h) {
                s.kick(h);
            }

            @Override
            public void drift(double h) {
                s.drift(h);
                range[0] = Math.min(range[0], s.t);
                range[1] = Math.max(range[1], s.t);
            }

            @Override
            public void updateAccelerations() {
                s.updateAccelerations();
            }
        };
        integrator().step(watch, 1);
        assertEquals(integrator().minTimeFraction(), range[0], 1e-15);
        assertEquals(integrator().maxTimeFraction(), range[1], 1e-15);
        assertTrue(integrator().stages() >= 1);
    }
}

class LeapfrogOscillatorTest extends OscillatorTest {
    @Override
    Integrator integrator() {
        return new Leapfrog();
    }
}

class Yoshida4OscillatorTest extends OscillatorTest {
    @Override
    Integrator integrator() {
        return new Yoshida4();
    }

    @Test
    void weightsAreYoshidas() {
        // Yoshida 1990, Phys. Lett. A 150, 262: w1 = 1.3512071919596578, w0 = -1.7024143839193153
        assertEquals(1.3512071919596578, Yoshida4.W1, 1e-15);
        assertEquals(-1.7024143839193153, Yoshida4.W0, 1e-15);
        assertEquals(1, 2 * Yoshida4.W1 + Yoshida4.W0, 1e-15);
    }
}
