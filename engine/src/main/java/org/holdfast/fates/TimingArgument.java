package org.holdfast.fates;

import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunSettings;
import org.holdfast.integrators.Scheme;
import org.holdfast.run.RunView;
import org.holdfast.run.Simulation;
import org.holdfast.units.Units;

/**
 * The timing argument (Kahn &amp; Woltjer 1959, ApJ 130, 705 — from memory): the mass for which
 * two points that started together at the Big Bang on a radial orbit have today's separation
 * and radial velocity. It is found with the engine itself: for a trial mass the pair is
 * integrated back from today ({@link Simulation}, two bare point masses, optionally the
 * dark-energy force k(t) r of the expansion history) until the separation reaches zero, and
 * Brent's method (Commons Math) moves the mass until that happens at the Big Bang.
 *
 * <p>The closed radial Kepler solution r = A (1 - cos eta), t = B (eta - sin eta),
 * A^3 = G M B^2 gives the phase eta of the solution without dark energy.
 */
public final class TimingArgument {

    /** Stop when the separation falls below this fraction of today's. */
    private static final double COLLAPSED = 1e-6;
    private static final double ACCURACY = 0.002;

    /**
     * What a solution found.
     *
     * @param massMsun the timing mass
     * @param maxSeparationKpc the largest separation on the way back (turnaround)
     * @param maxSeparationGyr when it was largest, Gyr from today (negative: the past)
     */
    public record Solution(double massMsun, double maxSeparationKpc, double maxSeparationGyr) {
    }

    private final ExpansionHistory history;
    private final double separationKpc;
    private final double radialKms;
    private final double ageGyr;

    /** How much earlier than the history's first time the Big Bang may lie, Gyr (1 Myr). */
    private static final double START_SLACK_GYR = 1e-3;

    /**
     * @param history the expansion (its k(t) and its range: it must reach back ageGyr)
     * @param separationKpc today's separation, &gt; 0
     * @param radialVelocityKms today's radial velocity (negative: approaching)
     * @param ageGyr time since the Big Bang
     */
    public TimingArgument(ExpansionHistory history, double separationKpc, double radialVelocityKms, double ageGyr) {
        if (!(separationKpc > 0) || !Double.isFinite(separationKpc)) {
            throw new IllegalArgumentException("--separation-kpc must be positive, got " + separationKpc);
        }
        if (!Double.isFinite(radialVelocityKms)) {
            throw new IllegalArgumentException("--radial-velocity-kms must be a finite number");
        }
        // The history starts a few kyr after the Big Bang; an age up to the Big Bang itself is
        // fine, since the last stretch of a radial fall is extrapolated (r ~ t^(2/3)).
        if (!(ageGyr > 0) || -ageGyr < history.earliestGyr() - START_SLACK_GYR) {
            throw new IllegalArgumentException("--age-gyr must be positive and at most the cosmology's age ("
                    + (-history.earliestGyr()) + " Gyr), got " + ageGyr);
        }
        this.history = history;
        this.separationKpc = separationKpc;
        this.radialKms = radialVelocityKms;
        this.ageGyr = ageGyr;
    }

    /** Solves for the mass, with or without the dark-energy force. */
    public Solution solve(boolean darkEnergy) {
        BrentSolver brent = new BrentSolver(1e-10, 1e-9);
        double lo = Math.log(1e6);
        double hi = Math.log(1e17);
        double lnMass;
        try {
            lnMass = brent.solve(200, u -> mismatch(Math.exp(u), darkEnergy).value, lo, hi);
        } catch (NoBracketingException e) {
            throw new IllegalArgumentException("no mass between 1e6 and 1e17 Msun brings this pair from zero"
                    + " separation at the Big Bang to today's separation and velocity");
        }
        double mass = Math.exp(lnMass);
        Trial t = mismatch(mass, darkEnergy);
        return new Solution(mass, t.maxSeparation, t.maxAt);
    }

    /** The Kepler phase eta (radians) of a radial orbit of this mass with today's separation and age. */
    public double keplerPhase(double massMsun) {
        double ratio = Math.pow(separationKpc, 3) / (Units.G * massMsun * ageGyr * ageGyr);
        // (1 - cos eta)^3 / (eta - sin eta)^2 falls from 4.5 at 0 to 0 at 2 pi; approaching pairs are past pi
        double from = radialKms < 0 ? Math.PI : 1e-6;
        double to = radialKms < 0 ? 2 * Math.PI - 1e-9 : Math.PI;
        return new BrentSolver(1e-14).solve(200, eta -> {
            double c = 1 - Math.cos(eta);
            double s = eta - Math.sin(eta);
            return c * c * c / (s * s) - ratio;
        }, from, to);
    }

    private static final class Trial {
        double value;
        double maxSeparation;
        double maxAt;
    }

    /**
     * Positive when the pair collapses after the Big Bang (too much mass): the collapse time
     * plus the age; negative when it has not collapsed by then: minus the separation left,
     * over today's. Both go to zero at the solution.
     */
    private Trial mismatch(double massMsun, boolean darkEnergy) {
        double half = 0.5 * separationKpc;
        double halfV = 0.5 * radialKms;
        HaloSpec bare = HaloSpec.point(0);
        GroupSpec pair = new GroupSpec(List.of(
                new GalaxySpec("near", 0.5 * massMsun, new double[] {-half, 0, 0}, new double[] {-halfV, 0, 0}, bare, null),
                new GalaxySpec("far", 0.5 * massMsun, new double[] {half, 0, 0}, new double[] {halfV, 0, 0}, bare, null)),
                null);
        RunSettings s = new RunSettings(0, -ageGyr, Scheme.YOSHIDA4, ACCURACY, Double.NaN, ageGyr * 1e3 * 2,
                darkEnergy, false, 1, false, CoulombLog.DEFAULT, 0);
        Trial out = new Trial();
        try (Simulation sim = Simulation.create(pair, s, history, 1)) {
            double[] collapse = {Double.NaN};
            double[] last = {separationKpc};
            out.maxSeparation = separationKpc;
            RunObserver watch = new RunObserver() {
                @Override
                public void afterStep(RunView v) {
                    double dx = v.bodyX()[1] - v.bodyX()[0];
                    double d = Math.abs(dx);
                    if (d > out.maxSeparation) {
                        out.maxSeparation = d;
                        out.maxAt = v.tGyr();
                    }
                    boolean crossed = dx <= 0;
                    boolean close = d < COLLAPSED * separationKpc;
                    boolean passed = d > last[0] && last[0] < 1e-2 * separationKpc;
                    if (Double.isNaN(collapse[0]) && (crossed || close || passed)) {
                        // from d at speed u a radial fall to r = 0 takes (2/3) d / u more (r ~ t^(2/3) there);
                        // after a crossing or a pericentre the step's end is within one short step of it
                        double u = Math.abs(v.bodyVx()[1] - v.bodyVx()[0]);
                        collapse[0] = close && !crossed && !passed ? v.tGyr() - (2.0 / 3) * d / u : v.tGyr();
                        sim.cancel();
                    }
                    last[0] = d;
                }
            };
            sim.run(List.of(watch));
            out.value = Double.isNaN(collapse[0]) ? -last[0] / separationKpc : collapse[0] + ageGyr;
        }
        return out;
    }
}
