package org.holdfast.integrators;

/**
 * Kick-drift-kick leapfrog: second order, symplectic and time-reversible (e.g. Hairer, Lubich
 * &amp; Wanner 2006, Geometric Numerical Integration, sec. I.1.4, the Stormer–Verlet scheme).
 */
public final class Leapfrog extends Composition {

    public Leapfrog() {
        super("leapfrog", 2, 1.0);
    }
}
