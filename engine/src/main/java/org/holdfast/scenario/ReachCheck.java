package org.holdfast.scenario;

import java.util.Locale;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.run.RunSettings;
import org.holdfast.schema.Node;
import org.holdfast.schema.ScenarioException;

/**
 * How far a run can go, checked before it starts: only as far as the expansion table gives a
 * finite background push.
 *
 * <p>The drift of the group's centre of mass, which the background term c(t) r amplifies
 * e-fold every 1/sqrt(c), no longer limits a run: the run loop takes it out as it goes
 * (org.holdfast.run.GroupSystem#recentre). What is left is the table itself: far along a
 * cosmological constant's exponential expansion (ln a of about 350, some 5900 Gyr from today for
 * H0 = 70, Omega_L = 0.7) its dark-energy push k(t) is no longer a finite number although the
 * table reaches further, and a run there would stop on a bad number half-way. Such a run is
 * refused, naming the last time it can reach.
 */
public final class ReachCheck {

    private static final int SAMPLES = 4000;

    private ReachCheck() {
    }

    /**
     * @param runNode the [run] table, for the message
     * @param untilOverrideGyr the --until option, NaN when not given
     * @throws ScenarioException naming run.until_gyr (or --until) if the run goes too far
     */
    public static void check(Node runNode, RunSettings run, ExpansionHistory history, double untilOverrideGyr) {
        double start = run.startGyr();
        double end = Math.max(history.earliestGyr(), Math.min(history.latestGyr(), run.untilGyr()));
        double h = (end - start) / SAMPLES;
        double good = start;
        for (int i = 1; i <= SAMPLES; i++) {
            double t = i == SAMPLES ? end : start + i * h;
            if (!finite(run, history, t)) {
                throw refusal(runNode, run, untilOverrideGyr, lastFinite(run, history, good, t));
            }
            good = t;
        }
    }

    /** Whether the background terms the run uses are finite numbers at t. */
    private static boolean finite(RunSettings run, ExpansionHistory history, double t) {
        double c = 0;
        if (run.darkEnergyForce()) {
            c += history.darkEnergyAcceleration(t) + history.darkEnergyAccelerationRate(t);
        }
        if (run.backgroundMatter()) {
            c += history.matterAcceleration(t) + history.hubbleRate(t);
        }
        return Double.isFinite(c);
    }

    /** Bisection between a finite time and one that is not. */
    private static double lastFinite(RunSettings run, ExpansionHistory history, double good, double bad) {
        for (int k = 0; k < 60; k++) {
            double mid = 0.5 * (good + bad);
            if (mid == good || mid == bad) {
                break;
            }
            if (finite(run, history, mid)) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    private static ScenarioException refusal(Node runNode, RunSettings run, double untilOverrideGyr, double last) {
        String msg = String.format(Locale.ROOT,
                "a run to %s Gyr goes beyond what holdfast can follow: this universe's expansion table gives no"
                + " finite dark-energy push after %s Gyr; end the run by %s Gyr",
                fmt(run.untilGyr()), fmt(last), fmt(last));
        if (!Double.isNaN(untilOverrideGyr)) {
            return new ScenarioException("--until", null, msg);
        }
        return runNode.error("until_gyr", msg);
    }

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.4g", t);
    }
}
