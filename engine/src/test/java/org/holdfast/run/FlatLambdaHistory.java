package org.holdfast.run;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.expansion.ExpansionRangeException;
import org.holdfast.units.Units;

/**
 * Test-only closed-form expansion history of a flat matter + cosmological-constant universe:
 * a(tau) = (Om/OL)^(1/3) sinh^(2/3)(1.5 sqrt(OL) H0 tau), tau = t + t0, with
 * t0 = 2/(3 H0 sqrt(OL)) arsinh(sqrt(OL/Om)) (textbook result, e.g. Carroll, Press &amp; Turner
 * 1992, ARA&amp;A 30, 499 — from memory). k = OL H0^2, matter term -(1/2) H0^2 Om a^-3.
 */
final class FlatLambdaHistory implements ExpansionHistory {

    final double h0;
    final double om;
    final double ol;
    final double t0;
    private final double latest;

    /** @param h0Kms H0 in km/s/Mpc */
    FlatLambdaHistory(double h0Kms, double om, double ol, double latestGyr) {
        this.h0 = Units.hubbleToPerGyr(h0Kms);
        this.om = om;
        this.ol = ol;
        this.t0 = 2 / (3 * h0 * Math.sqrt(ol)) * asinh(Math.sqrt(ol / om));
        this.latest = latestGyr;
    }

    /** H0 = 70, Om = 0.3, OL = 0.7, up to 200 Gyr from today. */
    static FlatLambdaHistory standard() {
        return new FlatLambdaHistory(70, 0.3, 0.7, 200);
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }

    private double theta(double t) {
        check(t);
        return 1.5 * Math.sqrt(ol) * h0 * (t + t0);
    }

    private void check(double t) {
        if (!(t >= earliestGyr() && t <= latest)) {
            throw new ExpansionRangeException(t, "outside the test history");
        }
    }

    @Override
    public double scaleFactor(double t) {
        return Math.cbrt(om / ol) * Math.pow(Math.sinh(theta(t)), 2.0 / 3);
    }

    @Override
    public double hubbleRate(double t) {
        return Math.sqrt(ol) * h0 / Math.tanh(theta(t));
    }

    @Override
    public double totalAcceleration(double t) {
        return darkEnergyAcceleration(t) + matterAcceleration(t);
    }

    @Override
    public double darkEnergyAcceleration(double t) {
        check(t);
        return ol * h0 * h0;
    }

    @Override
    public double darkEnergyAccelerationRate(double t) {
        check(t);
        return 0;
    }

    @Override
    public double matterAcceleration(double t) {
        double a = scaleFactor(t);
        return -0.5 * h0 * h0 * om / (a * a * a);
    }

    @Override
    public double darkEnergyDensity(double t) {
        check(t);
        return ol * criticalDensityToday();
    }

    @Override
    public double criticalDensityToday() {
        return 3 * h0 * h0 / (8 * Math.PI * Units.G);
    }

    @Override
    public double earliestGyr() {
        return -t0 * (1 - 1e-6);
    }

    @Override
    public double latestGyr() {
        return latest;
    }
}
