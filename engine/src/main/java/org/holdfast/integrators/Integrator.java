package org.holdfast.integrators;

import org.holdfast.run.RunSettings;

/** A one-step scheme that advances a {@link SplitSystem} by h (negative h goes back in time). */
public interface Integrator {

    /** Advances s by h; the accelerations stored in s are current before and after. */
    void step(SplitSystem s, double h);

    /** Order of accuracy. */
    int order();

    /** Name as scenarios write it. */
    String name();

    /** Force evaluations per step. */
    int stages();

    /**
     * The earliest clock reading inside a step, as a fraction of h (below 0 when a sub-step
     * goes backwards), so the caller can keep every sub-step inside the expansion history.
     */
    double minTimeFraction();

    /** The latest clock reading inside a step, as a fraction of h (above 1 when a sub-step overshoots). */
    double maxTimeFraction();

    /** The integrator of a scheme. */
    static Integrator of(Scheme scheme) {
        return switch (scheme) {
            case LEAPFROG -> new Leapfrog();
            case YOSHIDA4 -> new Yoshida4();
            case IAS15 -> throw new IllegalArgumentException("ias15 is not a splitting scheme: use Ias15");
        };
    }
}
