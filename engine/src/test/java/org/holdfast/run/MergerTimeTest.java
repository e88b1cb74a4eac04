package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.group.CoulombLog;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.halos.Halos;
import org.holdfast.halos.NfwHalo;
import org.holdfast.integrators.Scheme;
import org.holdfast.units.Units;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Merger times of extended satellites (NFW, concentration 10, both) falling in from the host's
 * virial radius, with dynamical friction and tidal stripping, against the fit of Boylan-Kolchin,
 * Ma &amp; Quataert 2008 (MNRAS 383, 93; arXiv 0707.2960) to their N-body runs:
 * t_merge / tau_dyn = A (Mh/Ms)^b / ln(1 + Mh/Ms) exp(c eta) (r_c(E) / R_vir)^d,
 * tau_dyn = R_vir / V_vir, A = 0.216, b = 1.3, c = 1.9, d = 1.0 (constants from memory, as listed
 * in physics-references.md). The orbit starts at R_vir with the circular speed there, rotated so
 * that the circularity j / j_c(E) is eta: r_c(E) = R_vir by construction. No dark energy, no
 * expansion terms (an isolated pair, as in their runs).
 */
class MergerTimeTest {

    static double bk08(double ratio, double eta, double tauDyn) {
        return tauDyn * 0.216 * Math.pow(ratio, 1.3) / Math.log1p(ratio) * Math.exp(1.9 * eta);
    }

    /** Runs the pair; returns {merger time (NaN if none), final satellite mass fraction, residual}. */
    static double[] mergerTime(double ratio, double eta, boolean friction, double untilGyr) {
        FlatLambdaHistory h = FlatLambdaHistory.standard();
        double mh = 1e12;
        double ms = mh / ratio;
        double rvir = Halos.r200(mh, h.criticalDensityToday());
        double vc = Math.sqrt(Units.G * mh / rvir);
        double vKms = Units.kpcPerGyrToKms(vc);
        HaloSpec nfw = new HaloSpec("nfw", Double.NaN, Double.NaN, 10, Double.NaN);
        GroupSpec g = Groups.of(
                new GalaxySpec("Hollin", mh, new double[3], new double[3], nfw, null),
                new GalaxySpec("Sprig", ms, new double[] {rvir, 0, 0},
                        new double[] {-Math.sqrt(1 - eta * eta) * vKms, eta * vKms, 0}, nfw, null));
        RunSettings s = Groups.adaptive(Scheme.YOSHIDA4, untilGyr, 0.01, false)
                .withFriction(friction, CoulombLog.DEFAULT);
        try (Simulation sim = Simulation.create(g, s, h)) {
            MergeWatch w = new MergeWatch(sim);
            sim.run(List.of(w));
            double left = sim.bodyCount() > 1 ? sim.bodyMass()[1] / ms : 0;
            return new double[] {w.at, left, sim.energyResidual()};
        }
    }

    static final class MergeWatch implements RunObserver {
        final Simulation sim;
        double at = Double.NaN;

        MergeWatch(Simulation sim) {
            this.sim = sim;
        }

        @Override
        public void afterStep(RunView v) {
            if (Double.isNaN(at) && v.bodyCount() == 1) {
                at = v.tGyr();
                sim.cancel();
            }
        }
    }

    private static double tauDyn() {
        double rvir = Halos.r200(1e12, FlatLambdaHistory.standard().criticalDensityToday());
        return rvir / Math.sqrt(Units.G * 1e12 / rvir);
    }

    /**
     * Reached: within 15% of the fit for circularities 0.3-0.6 and mass ratios 1:10-1:30
     * (measured 1.13, 0.90, 1.03, 1.06 of it). Why not closer: the fit itself is a smooth form
     * through scattered N-body times, and our satellite is a point with a bound mass, not a
     * resolved halo; its circularity dependence is the main difference (next test).
     */
    @ParameterizedTest
    @CsvSource({"10, 0.3", "10, 0.6", "20, 0.5", "30, 0.3"})
    void mergerTimesFollowTheCalibratedFit(double ratio, double eta) {
        double expected = bk08(ratio, eta, tauDyn());
        double[] r = mergerTime(ratio, eta, true, 2 * expected);
        assertTrue(!Double.isNaN(r[0]), "no merger within " + 2 * expected + " Gyr");
        System.out.printf(java.util.Locale.ROOT, "1:%.0f eta %.1f: merged at %.2f Gyr, fit %.2f Gyr (%.3f of it)%n",
                ratio, eta, r[0], expected, r[0] / expected);
        assertEquals(1.0, r[0] / expected, 0.15, "merger at " + r[0] + " Gyr, fit " + expected);
        assertTrue(r[2] < 1e-4, "energy budget residual " + r[2]);
    }

    /**
     * Near-circular orbits: the fit's exp(1.9 eta) makes eta = 0.9 take 3.1 times as long as
     * eta = 0.3; Jiang et al. 2008 (ApJ 675, 1095, their abstract) find a much weaker
     * dependence, 0.94 eps^0.60 + 0.60, a factor 1.40 between the same circularities. Ours (1.49
     * measured) follows the latter within 15%; at eta = 0.9 we therefore merge in about half of
     * BK08's time (0.54 of it measured at 1:10) - the spread between the two calibrations.
     */
    @org.junit.jupiter.api.Test
    void theCircularityDependenceIsJiangEtAls() {
        double tau = tauDyn();
        double low = mergerTime(10, 0.3, true, 2 * bk08(10, 0.3, tau))[0];
        double high = mergerTime(10, 0.9, true, 2 * bk08(10, 0.9, tau))[0];
        double jiang = (0.94 * Math.pow(0.9, 0.6) + 0.6) / (0.94 * Math.pow(0.3, 0.6) + 0.6);
        assertEquals(1.40, jiang, 0.01);
        System.out.printf(java.util.Locale.ROOT, "eta 0.3: %.2f Gyr, eta 0.9: %.2f Gyr, ratio %.3f (Jiang et al. %.3f)%n",
                low, high, high / low, jiang);
        assertEquals(jiang, high / low, 0.15 * jiang, "t(0.9) " + high + " Gyr, t(0.3) " + low + " Gyr");
    }
}
