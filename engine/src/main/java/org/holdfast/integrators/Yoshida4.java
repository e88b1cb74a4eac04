package org.holdfast.integrators;

/**
 * Yoshida's fourth-order symmetric composition of three leapfrogs (Yoshida 1990, Phys. Lett. A
 * 150, 262, eq. 4.11): weights w1, w0, w1 with w1 = 1/(2 - 2^(1/3)), w0 = -2^(1/3)/(2 - 2^(1/3)).
 * The middle sub-step runs backwards, so the clock leaves [t, t + h] by about 0.35 and 1.35 h.
 */
public final class Yoshida4 extends Composition {

    /** w1 = 1/(2 - 2^(1/3)). */
    public static final double W1 = 1.0 / (2.0 - Math.cbrt(2.0));
    /** w0 = -2^(1/3)/(2 - 2^(1/3)) = 1 - 2 w1. */
    public static final double W0 = -Math.cbrt(2.0) / (2.0 - Math.cbrt(2.0));

    public Yoshida4() {
        super("yoshida4", 4, W1, W0, W1);
    }
}
