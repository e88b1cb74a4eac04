package org.holdfast.integrators;

/** Yoshida's composition is of fourth order (Yoshida 1990, Phys. Lett. A 150, 262, eq. 4.11). */
class Yoshida4OrderTest extends LeapfrogOrderTest {

    @Override
    Integrator scheme() {
        return new Yoshida4();
    }

    @Override
    int[] stepsPerOrbit() {
        return new int[] {200, 400, 800};
    }
}
