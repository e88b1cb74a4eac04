package org.holdfast.integrators;

/**
 * A time-symmetric adaptive step: h = eta (tau(start) + tau(end)) / 2, where tau is the
 * system's dynamical time and the end is that of a trial step of the same h, solved by
 * fixed-point iteration (Hut, Makino &amp; McMillan 1995, ApJ 443, L93, eq. 5). Stepping back
 * from the end with this rule gives the same h, so the leapfrog stays time-reversible to the
 * tolerance of the iteration.
 */
public final class SymmetricStepSize {

    private final double eta;
    private final int iterations;

    /**
     * @param eta the accuracy parameter (fraction of the dynamical time per step)
     * @param iterations fixed-point iterations (2 is plenty, Hut et al. 1995)
     */
    public SymmetricStepSize(double eta, int iterations) {
        if (!(eta > 0)) {
            throw new IllegalArgumentException("accuracy must be positive, got " + eta);
        }
        this.eta = eta;
        this.iterations = iterations;
    }

    /** The accuracy parameter. */
    public double eta() {
        return eta;
    }

    /**
     * The step to take from the current state, at most |limit| long, signed like limit.
     *
     * @param limit the signed largest step allowed (to the next snapshot, the end)
     */
    public double choose(Integrator integrator, TrialSystem s, double limit) {
        double sign = Math.signum(limit);
        double tau0 = s.timescale();
        double h = Math.min(eta * tau0, Math.abs(limit));
        if (!Double.isFinite(tau0)) {
            return limit;
        }
        for (int k = 0; k < iterations; k++) {
            s.beginTrial();
            integrator.step(s, sign * h);
            double tau1 = s.timescale();
            s.endTrial();
            h = Math.min(eta * 0.5 * (tau0 + Math.min(tau1, 1e300)), Math.abs(limit));
        }
        return sign * h;
    }
}
