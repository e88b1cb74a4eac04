package org.holdfast.integrators;

/** The kick-drift-kick leapfrog is of second order (Hairer, Lubich &amp; Wanner 2006, sec. II.3). */
class LeapfrogOrderTest extends ConvergenceOrderContract {

    Integrator scheme() {
        return new Leapfrog();
    }

    @Override
    int order() {
        return scheme().order();
    }

    @Override
    int[] stepsPerOrbit() {
        return new int[] {400, 800, 1600};
    }

    @Override
    double errorAfter(int stepsPerOrbit, int orbits) {
        Kepler k = new Kepler(eccentricity());
        Integrator s = scheme();
        double h = 2 * Math.PI / stepsPerOrbit;
        for (int i = 0; i < stepsPerOrbit * orbits; i++) {
            s.step(k, h);
        }
        return distance(k.exact(k.t), k.x, k.y);
    }
}
