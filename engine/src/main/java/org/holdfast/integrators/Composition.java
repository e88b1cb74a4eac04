package org.holdfast.integrators;

/**
 * A composition of kick-drift-kick leapfrogs with weights w_i: one step of size h is the
 * sequence of leapfrogs of sizes w_i h (Yoshida 1990, Phys. Lett. A 150, 262, eq. 4.4). Adjacent
 * half kicks at the same positions are merged, so a step costs one force evaluation per weight.
 * The accelerations stored at the start of a step must be current (first same as last).
 */
public class Composition implements Integrator {

    private final String name;
    private final int order;
    private final double[] weights;
    private final double minFraction;
    private final double maxFraction;

    protected Composition(String name, int order, double... weights) {
        this.name = name;
        this.order = order;
        this.weights = weights.clone();
        double t = 0;
        double lo = 0;
        double hi = 0;
        for (double w : weights) {
            t += w;
            lo = Math.min(lo, t);
            hi = Math.max(hi, t);
        }
        this.minFraction = lo;
        this.maxFraction = hi;
    }

    @Override
    public final void step(SplitSystem s, double h) {
        double pending = 0.5 * weights[0] * h;
        for (int i = 0; i < weights.length; i++) {
            s.kick(pending);
            s.drift(weights[i] * h);
            s.updateAccelerations();
            pending = 0.5 * weights[i] * h + (i + 1 < weights.length ? 0.5 * weights[i + 1] * h : 0);
        }
        s.kick(pending);
    }

    @Override
    public final int order() {
        return order;
    }

    @Override
    public final String name() {
        return name;
    }

    @Override
    public final double minTimeFraction() {
        return minFraction;
    }

    @Override
    public final double maxTimeFraction() {
        return maxFraction;
    }

    @Override
    public final int stages() {
        return weights.length;
    }
}
