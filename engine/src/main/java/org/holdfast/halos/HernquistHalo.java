package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * Hernquist (1990, ApJ 356, 359, eqs. 2, 3 and 5): rho = M a / (2 pi r (r + a)^3),
 * M(&lt;r) = M r^2 / (r + a)^2, Phi = -G M / (r + a).
 */
public final class HernquistHalo extends HaloProfile {

    private final double a;

    public HernquistHalo(double massMsun, double scaleKpc) {
        super(massMsun);
        this.a = Halos.positive(scaleKpc, "scale_kpc");
    }

    @Override
    public String kind() {
        return "hernquist";
    }

    @Override
    public double density(double r) {
        double ra = r + a;
        return massMsun * a / (2 * Math.PI * r * ra * ra * ra);
    }

    @Override
    public double enclosedMass(double r) {
        double q = r / (r + a);
        return massMsun * q * q;
    }

    @Override
    public double potential(double r) {
        return -Units.G * massMsun / (r + a);
    }

    @Override
    public double potentialMoment(double s) {
        // integral of -G M s / (s + a) ds = -G M (s - a ln(1 + s/a))
        return -Units.G * massMsun * (s - a * Math.log1p(s / a));
    }

    @Override
    public double pullOverR(double r) {
        double ra = r + a;
        return Units.G * massMsun / (r * ra * ra);
    }

    @Override
    public double extentKpc() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public double lengthKpc() {
        return a;
    }

    @Override
    public Object shapeKey() {
        return java.util.List.of(kind(), massMsun, a);
    }
}
