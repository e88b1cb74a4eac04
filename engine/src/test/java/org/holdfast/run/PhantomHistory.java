package org.holdfast.run;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.expansion.ExpansionRangeException;
import org.holdfast.units.Units;

/**
 * Test-only flat universe of phantom dark energy alone, constant w &lt; -1: H = H0 a^(-q),
 * q = 3(1 + w)/2, so a = (1 + q H0 t)^(1/q) with a rip at t_rip = 1 / (|q| H0) (from the
 * Friedmann equation with rho_de ~ a^(-3(1+w)); Caldwell, Kamionkowski &amp; Weinberg 2003, PRL 91,
 * 071301, eq. 2 with Omega_m = 0). k = -(1/2)(1 + 3w) H^2.
 */
final class PhantomHistory implements ExpansionHistory {

    final double h0;
    final double w;
    final double q;
    final double tRip;
    private final double latest;

    PhantomHistory(double h0Kms, double w, double stopBeforeRipGyr) {
        this.h0 = Units.hubbleToPerGyr(h0Kms);
        this.w = w;
        this.q = 1.5 * (1 + w);
        this.tRip = 1 / (-q * h0);
        this.latest = tRip - stopBeforeRipGyr;
    }

    private double base(double t) {
        if (!(t >= earliestGyr() && t <= latest)) {
            throw new ExpansionRangeException(t, "outside the test history");
        }
        return 1 + q * h0 * t;
    }

    @Override
    public double scaleFactor(double t) {
        return Math.pow(base(t), 1 / q);
    }

    @Override
    public double hubbleRate(double t) {
        return h0 / base(t);
    }

    @Override
    public double totalAcceleration(double t) {
        return darkEnergyAcceleration(t);
    }

    @Override
    public double darkEnergyAcceleration(double t) {
        double b = base(t);
        return -0.5 * (1 + 3 * w) * h0 * h0 / (b * b);
    }

    @Override
    public double darkEnergyAccelerationRate(double t) {
        double b = base(t);
        return (1 + 3 * w) * h0 * h0 * q * h0 / (b * b * b);
    }

    @Override
    public double matterAcceleration(double t) {
        base(t);
        return 0;
    }

    @Override
    public double darkEnergyDensity(double t) {
        double b = base(t);
        return criticalDensityToday() / (b * b);
    }

    @Override
    public double criticalDensityToday() {
        return 3 * h0 * h0 / (8 * Math.PI * Units.G);
    }

    @Override
    public double earliestGyr() {
        return -5;
    }

    @Override
    public double latestGyr() {
        return latest;
    }
}
