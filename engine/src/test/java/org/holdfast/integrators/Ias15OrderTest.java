package org.holdfast.integrators;

/**
 * IAS15 at fixed steps is of order 15 (Rein &amp; Spiegel 2015, MNRAS 446, 1424, sec. 2). In double
 * precision the errors of a 15th-order scheme span only a factor of about three in step size
 * between large steps (where the predictor–corrector barely converges) and round-off, so the fit
 * runs before the asymptotic regime is fully reached and the slope is allowed 2 below 15; a
 * scheme of order 12 or less fails.
 */
class Ias15OrderTest extends ConvergenceOrderContract {

    @Override
    int order() {
        return 15;
    }

    @Override
    int[] stepsPerOrbit() {
        return new int[] {6, 7, 8, 9, 10, 11, 12, 14, 16};
    }

    @Override
    double eccentricity() {
        return 0.4;
    }

    @Override
    double tolerance() {
        return 2.0;
    }

    @Override
    double errorAfter(int stepsPerOrbit, int orbits) {
        Kepler k = new Kepler(eccentricity());
        Ias15 ias = new Ias15(4, 0, 0);
        ias.reset(0, 2, new double[] {k.x, k.y}, new double[] {k.vx, k.vy});
        double h = 2 * Math.PI / stepsPerOrbit;
        for (int i = 0; i < stepsPerOrbit * orbits; i++) {
            ias.step(k, h);
        }
        double[] exact = k.exact(ias.time());
        return distance(exact, ias.positions()[0], ias.positions()[1]);
    }
}
