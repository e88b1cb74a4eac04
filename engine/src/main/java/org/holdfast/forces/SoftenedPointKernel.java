package org.holdfast.forces;

import org.holdfast.units.Units;

/**
 * Two softened point masses: w = -G / sqrt(d^2 + eps_1^2 + eps_2^2), the usual combination of
 * Plummer softenings (common practice). Exact when either softening is zero: it is then the
 * potential of the other's Plummer sphere at the point.
 */
public final class SoftenedPointKernel implements PairKernel {

    private final double eps2;

    public SoftenedPointKernel(double eps1Kpc, double eps2Kpc) {
        this.eps2 = eps1Kpc * eps1Kpc + eps2Kpc * eps2Kpc;
    }

    @Override
    public double energy(double d) {
        return -Units.G / Math.sqrt(d * d + eps2);
    }

    @Override
    public double pullOverD(double d) {
        double s2 = d * d + eps2;
        return Units.G / (s2 * Math.sqrt(s2));
    }

    @Override
    public double lengthKpc() {
        return Math.sqrt(eps2);
    }
}
