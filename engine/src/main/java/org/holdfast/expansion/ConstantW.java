package org.holdfast.expansion;

import java.util.Locale;

/**
 * Constant equation of state w: rho_de is proportional to a^(-3(1+w)). Phantom when w &lt; -1
 * (Caldwell 2002, Phys. Lett. B 545, 23), which ends in a big rip when it dominates; w = -1 is a
 * cosmological constant (constant density, exactly).
 */
public final class ConstantW implements DarkEnergyModel {

    private final double w;

    public ConstantW(double w) {
        this.w = w;
    }

    @Override
    public double w(double a) {
        return w;
    }

    @Override
    public double dwda(double a) {
        return 0.0;
    }

    @Override
    public double d2wda2(double a) {
        return 0.0;
    }

    @Override
    public double lnDensityRatio(double lnA) {
        return w == -1.0 ? 0.0 : -3.0 * (1.0 + w) * lnA;
    }

    @Override
    public String describe() {
        if (w == -1.0) {
            return "cosmological constant (w = -1)";
        }
        return String.format(Locale.ROOT, "constant w = %s", Double.toString(w));
    }
}
