package org.holdfast.scenario;

import java.util.Locale;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.run.RunSettings;
import org.holdfast.units.Units;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.Node;

/**
 * How far a run can go before rounding errors swamp the group, checked before it starts.
 *
 * <p>The group is followed in its centre-of-mass frame, where the background term c(t) r acts
 * on the centre of mass too: an offset d of it obeys d'' = c(t) d, so where c &gt; 0 (dark
 * energy) the offset that rounding leaves (about 1e-16 of the group's size at every step)
 * grows as exp(&int; sqrt(c) dt), with e-folding time 1/sqrt(k) = 17 Gyr for a cosmological
 * constant with H0 = 70 and Omega_L = 0.7 (the linear stability of d'' = c d is common
 * practice). The members' positions are stored as offset plus relative position, so the
 * relative positions lose 1e-16 x offset to rounding: past exp(&int; sqrt(c) dt) of about
 * 1e22 the group's own motion is lost (a bound pair of the tethered-pair scenario, run to 1500
 * Gyr, flew apart at 1000 Gyr and was reported as escaped). Such a run is refused, naming the
 * last time it could reach.
 *
 * <p>Once c exceeds ten times the group's mean tidal scale G M / R^3 (M all members' mass, R the
 * farthest member from the centre), nothing in the group stays bound and the members' distances
 * grow as fast as the offset, so the growth is counted only up to then: runs to a big rip
 * are not limited by it.
 */
public final class ReachCheck {

    /** The largest growth exponent allowed: exp(50) = 5e21. */
    public static final double MAX_GROWTH_EXPONENT = 50;

    private static final int SAMPLES = 4000;

    private ReachCheck() {
    }

    /**
     * @param runNode the [run] table, for the message
     * @param untilOverrideGyr the --until option, NaN when not given
     * @throws ScenarioException naming run.until_gyr (or --until) if the run goes too far
     */
    public static void check(Node runNode, RunSettings run, GroupSpec group, ExpansionHistory history,
            double untilOverrideGyr) {
        double start = run.startGyr();
        double end = Math.max(history.earliestGyr(), Math.min(history.latestGyr(), run.untilGyr()));
        double tide = 10 * tidalScale(group);
        double h = (end - start) / SAMPLES;
        double growth = 0;
        double prev = rate(run, history, start, tide);
        for (int i = 1; i <= SAMPLES; i++) {
            double t = start + i * h;
            double c = rate(run, history, t, tide);
            if (Double.isNaN(c)) {
                return; // the group is torn apart from here on
            }
            double next = growth + 0.5 * (prev + c) * Math.abs(h);
            if (next > MAX_GROWTH_EXPONENT) {
                double f = (MAX_GROWTH_EXPONENT - growth) / (next - growth);
                double last = start + (i - 1 + f) * h;
                throw refusal(runNode, run, untilOverrideGyr, last, total(run, history, tide, start, end));
            }
            growth = next;
            prev = c;
        }
    }

    /** sqrt(max(c, 0)) at t; NaN once c is beyond the tidal scale. */
    private static double rate(RunSettings run, ExpansionHistory history, double t, double tide) {
        double c = 0;
        if (run.darkEnergyForce()) {
            c += history.darkEnergyAcceleration(t);
        }
        if (run.backgroundMatter()) {
            c += history.matterAcceleration(t);
        }
        if (c > tide) {
            return Double.NaN;
        }
        return Math.sqrt(Math.max(c, 0));
    }

    private static double total(RunSettings run, ExpansionHistory history, double tide, double start, double end) {
        double h = (end - start) / SAMPLES;
        double sum = 0;
        double prev = rate(run, history, start, tide);
        for (int i = 1; i <= SAMPLES; i++) {
            double c = rate(run, history, start + i * h, tide);
            if (Double.isNaN(c)) {
                break;
            }
            sum += 0.5 * (prev + c) * Math.abs(h);
            prev = c;
        }
        return sum;
    }

    /** G M / R^3 of the whole group, 1/Gyr^2; infinite for a group of one or of coincident members. */
    static double tidalScale(GroupSpec group) {
        double m = 0;
        double[] cm = new double[3];
        for (GalaxySpec g : group.galaxies()) {
            m += g.massMsun();
            for (int k = 0; k < 3; k++) {
                cm[k] += g.massMsun() * g.positionKpc()[k];
            }
        }
        double r = 0;
        for (GalaxySpec g : group.galaxies()) {
            double d2 = 0;
            for (int k = 0; k < 3; k++) {
                double d = g.positionKpc()[k] - cm[k] / m;
                d2 += d * d;
            }
            r = Math.max(r, Math.sqrt(d2));
        }
        return r > 0 ? Units.G * m / (r * r * r) : Double.POSITIVE_INFINITY;
    }

    private static ScenarioException refusal(Node runNode, RunSettings run, double untilOverrideGyr, double last,
            double exponent) {
        String msg = String.format(Locale.ROOT,
                "a run to %s Gyr goes beyond what holdfast can follow: the dark-energy push amplifies any rounding"
                + " error of the group's centre of mass e^%.0f-fold by then, and after about %s Gyr it would swamp"
                + " the members' own motion (a group bound for ever would be reported as flying apart); end the run"
                + " by %s Gyr", fmt(run.untilGyr()), exponent, fmt(last), fmt(last));
        if (!Double.isNaN(untilOverrideGyr)) {
            return new ScenarioException("--until", null, msg);
        }
        return runNode.error("until_gyr", msg);
    }

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.4g", t);
    }
}
