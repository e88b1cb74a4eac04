package org.holdfast.expansion;

import java.util.Locale;

/**
 * The w0–wa equation of state w(a) = w0 + wa (1 - a) (Chevallier &amp; Polarski 2001, IJMPD 10,
 * 213; Linder 2003, PRL 90, 091301, eq. 3), with the closed-form density
 * rho_de(a)/rho_de0 = a^(-3(1+w0+wa)) exp(-3 wa (1 - a)).
 */
public final class W0WaDarkEnergy implements DarkEnergyModel {

    private final double w0;
    private final double wa;

    public W0WaDarkEnergy(double w0, double wa) {
        this.w0 = w0;
        this.wa = wa;
    }

    public double w0() {
        return w0;
    }

    public double wa() {
        return wa;
    }

    @Override
    public double w(double a) {
        return w0 + wa * (1.0 - a);
    }

    @Override
    public double dwda(double a) {
        return -wa;
    }

    @Override
    public double d2wda2(double a) {
        return 0.0;
    }

    @Override
    public double lnDensityRatio(double lnA) {
        // -3 wa (1 - a) written with expm1 so that it stays exact for a near 1.
        return -3.0 * (1.0 + w0 + wa) * lnA + 3.0 * wa * Math.expm1(lnA);
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "w0 = %s, wa = %s", Double.toString(w0), Double.toString(wa));
    }
}
