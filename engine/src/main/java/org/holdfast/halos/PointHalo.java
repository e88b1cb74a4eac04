package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * A point mass with Plummer softening eps: potential -G M / sqrt(r^2 + eps^2) (Plummer 1911,
 * MNRAS 71, 460; the usual softening of N-body gravity, Aarseth 1963). With eps = 0 it is a bare
 * Newtonian point.
 */
public final class PointHalo extends HaloProfile {

    private final double eps;

    public PointHalo(double massMsun, double softeningKpc) {
        super(massMsun);
        if (!(softeningKpc >= 0) || Double.isInfinite(softeningKpc)) {
            throw new IllegalArgumentException("softening_kpc must be zero or positive, got " + softeningKpc);
        }
        this.eps = softeningKpc;
    }

    /** The softening length, kpc. */
    public double softeningKpc() {
        return eps;
    }

    @Override
    public String kind() {
        return "point";
    }

    @Override
    public double density(double r) {
        if (eps == 0) {
            return r == 0 ? Double.POSITIVE_INFINITY : 0;
        }
        double q = 1 + r * r / (eps * eps);
        return 3 * massMsun / (4 * Math.PI * eps * eps * eps) * Math.pow(q, -2.5);
    }

    @Override
    public double enclosedMass(double r) {
        if (eps == 0) {
            return massMsun;
        }
        double s2 = r * r + eps * eps;
        return massMsun * r * r * r / (s2 * Math.sqrt(s2));
    }

    @Override
    public double potential(double r) {
        return -Units.G * massMsun / Math.sqrt(r * r + eps * eps);
    }

    @Override
    public double potentialMoment(double s) {
        return -Units.G * massMsun * (Math.sqrt(s * s + eps * eps) - eps);
    }

    @Override
    public double pullOverR(double r) {
        double s2 = r * r + eps * eps;
        return Units.G * massMsun / (s2 * Math.sqrt(s2));
    }

    @Override
    public double extentKpc() {
        return eps == 0 ? 0 : Double.POSITIVE_INFINITY;
    }

    @Override
    public double lengthKpc() {
        return eps;
    }

    @Override
    public Object shapeKey() {
        return java.util.List.of(kind(), massMsun, eps);
    }
}
