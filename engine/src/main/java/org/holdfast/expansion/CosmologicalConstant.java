package org.holdfast.expansion;

/** A cosmological constant: w = -1 at all times, constant density. */
public final class CosmologicalConstant implements DarkEnergyModel {

    @Override
    public double w(double a) {
        return -1.0;
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
        return 0.0;
    }

    @Override
    public String describe() {
        return "cosmological constant (w = -1)";
    }
}
