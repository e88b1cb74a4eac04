package org.holdfast.weighing;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.units.Units;

/**
 * The timing argument with tangential motion in any background: the mass for which the pair,
 * followed back from today's separation, radial and tangential velocity, meets its first
 * pericentre of the past exactly at the Big Bang (Li &amp; White 2008, MNRAS 384, 1459; van der
 * Marel et al. 2012, ApJ 753, 8).
 *
 * <p>How the angular momentum enters: the orbit keeps today's L = r v_t all the way back (the
 * forces are central, so L is conserved even with a time-dependent K(t)); the Big Bang is its
 * pericentre passage, where the separation is smallest, a(1 - e) for a Kepler orbit. As v_t
 * falls to zero that pericentre falls to zero separation and the solution becomes the radial
 * timing argument (a collapse to r = 0 at the Big Bang).
 *
 * <p>Brent's method (Commons Math) moves ln M until the pericentre time equals minus the age:
 * a later pericentre means too much mass, none by the Big Bang too little.
 */
public final class TimingSolver {

    /** How much earlier than the history's first time the Big Bang may lie, Gyr (1 Myr). */
    public static final double START_SLACK_GYR = 1e-3;

    /** The age is beyond what the expansion history reaches. */
    public static final class AgeBeyondCosmology extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;

        AgeBeyondCosmology(String message) {
            super(message);
        }
    }

    /**
     * One weighing.
     *
     * @param background what the orbit felt
     * @param massMsun the timing mass
     * @param eccentricity osculating Kepler eccentricity today (with this mass)
     * @param semiMajorKpc osculating semi-major axis (infinite if unbound)
     * @param pericentreKpc osculating pericentre a(1 - e)
     * @param periodGyr osculating Kepler period (NaN if unbound)
     * @param bigBangSeparationKpc the separation at the Big Bang pericentre of the integrated orbit
     * @param maxSeparationKpc the largest separation on the way back (turnaround)
     * @param maxSeparationGyr when, Gyr from today
     */
    public record Weighing(Background background, double massMsun, double eccentricity, double semiMajorKpc,
            double pericentreKpc, double periodGyr, double bigBangSeparationKpc, double maxSeparationKpc,
            double maxSeparationGyr) {
    }

    private TimingSolver() {
    }

    /**
     * Solves in a background of an expansion history.
     *
     * @throws AgeBeyondCosmology when a background is asked for and the age exceeds the history's
     */
    public static Weighing solve(PairMotion p, Background b, ExpansionHistory history) {
        if (b.needsHistory() && -p.ageGyr() < history.earliestGyr() - START_SLACK_GYR) {
            throw new AgeBeyondCosmology(String.format(java.util.Locale.ROOT,
                    "an age of %.4g Gyr is beyond the cosmology's age (%.4f Gyr): no %s mass", p.ageGyr(),
                    -history.earliestGyr(), b.label()));
        }
        return solve(p, b, b == Background.NONE ? t -> 0.0 : t -> b.coefficient(history, t));
    }

    /** Solves with a given K(t), 1/Gyr^2. */
    public static Weighing solve(PairMotion p, Background b, DoubleUnaryOperator field) {
        KeplerTiming.Orbit guess = KeplerTiming.solve(p);
        double center = guess != null ? Math.log(guess.massMsun()) : Math.log(1e12);
        // the backgrounds change the Kepler mass by tens of per cent: start near it and widen the
        // bracket step by step (the mismatch grows with the mass), never jumping to absurd masses
        double lo = center - 0.4;
        double hi = center + 0.4;
        double flo = mismatch(p, Math.exp(lo), field);
        double fhi = mismatch(p, Math.exp(hi), field);
        for (double step = 0.8; (flo > 0 || fhi < 0); step *= 2) {
            if (lo < Math.log(1e4) || hi > Math.log(1e18)) {
                throw new IllegalArgumentException("no mass between 1e4 and 1e18 Msun brings this pair from a"
                        + " pericentre at the Big Bang to today's separation and velocity");
            }
            if (flo > 0) {
                hi = lo;
                fhi = flo;
                lo -= step;
                flo = mismatch(p, Math.exp(lo), field);
            } else {
                lo = hi;
                flo = fhi;
                hi += step;
                fhi = mismatch(p, Math.exp(hi), field);
            }
        }
        double lnMass;
        try {
            lnMass = new BrentSolver(1e-12, 1e-10).solve(200, u -> mismatch(p, Math.exp(u), field), lo, hi);
        } catch (NoBracketingException e) {
            throw new IllegalArgumentException("no mass brackets this pair's timing solution", e);
        }
        double mass = Math.exp(lnMass);
        PairOrbit.Past past = orbit(p, mass, field).back(-p.ageGyr() * (1 + 1e-9));
        return elements(p, b, mass, past);
    }

    /** The orbit of this mass from today's state. */
    public static PairOrbit orbit(PairMotion p, double massMsun, DoubleUnaryOperator field) {
        return new PairOrbit(massMsun, p.separationKpc(), Units.kmsToKpcPerGyr(p.radialKms()),
                Units.kmsToKpcPerGyr(p.tangentialKms()), field);
    }

    /**
     * Positive when the first pericentre of the past came after the Big Bang (too much mass):
     * its time plus the age, over the age; negative when there was none by the Big Bang (or the
     * only minimum of r was one that dark energy made).
     */
    static double mismatch(PairMotion p, double massMsun, DoubleUnaryOperator field) {
        PairOrbit.Past past;
        try {
            past = orbit(p, massMsun, field).back(-p.ageGyr());
        } catch (org.apache.commons.math3.exception.MaxCountExceededException e) {
            // only an orbit of very many revolutions since the Big Bang takes so long: far too much mass
            return 1;
        }
        if (!Double.isNaN(past.pericentreGyr)) {
            return (past.pericentreGyr + p.ageGyr()) / p.ageGyr();
        }
        // none by the Big Bang: roughly how much earlier it would come, over the age (so that the
        // mismatch is smooth through the root): near a pericentre v_r / r'', near a radial
        // collapse (3/2) r / v_r (r ~ t^(2/3)); approaching or bounced there, simply negative
        if (past.bounced || !(past.endVr > 0)) {
            return -1 - past.endKpc / p.separationKpc();
        }
        double toCollapse = 1.5 * past.endKpc / past.endVr;
        double toPericentre = past.endAcceleration > 0 ? past.endVr / past.endAcceleration : Double.POSITIVE_INFINITY;
        return -Math.min(1, Math.min(toCollapse, toPericentre) / p.ageGyr());
    }

    private static Weighing elements(PairMotion p, Background b, double mass, PairOrbit.Past past) {
        double gm = Units.G * mass;
        double r = p.separationKpc();
        double vr = Units.kmsToKpcPerGyr(p.radialKms());
        double vt = Units.kmsToKpcPerGyr(p.tangentialKms());
        double energy = 0.5 * (vr * vr + vt * vt) - gm / r;
        double l = r * vt;
        double e = Math.sqrt(Math.max(0, 1 + 2 * energy * l * l / (gm * gm)));
        double a = energy < 0 ? -gm / (2 * energy) : Double.POSITIVE_INFINITY;
        double q = l * l / (gm * (1 + e));
        double period = energy < 0 ? 2 * Math.PI * Math.sqrt(a * a * a / gm) : Double.NaN;
        double bb = Double.isNaN(past.pericentreKpc) ? past.endKpc : past.pericentreKpc;
        return new Weighing(b, mass, e, a, q, period, bb, past.maxKpc, past.maxGyr);
    }
}
