package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * Plummer sphere (Plummer 1911, MNRAS 71, 460; Binney &amp; Tremaine 2008, eq. 2.44a):
 * Phi = -G M / sqrt(r^2 + b^2), M(&lt;r) = M r^3 / (r^2 + b^2)^(3/2).
 */
public final class PlummerHalo extends HaloProfile {

    private final double b;

    public PlummerHalo(double massMsun, double scaleKpc) {
        super(massMsun);
        this.b = Halos.positive(scaleKpc, "scale_kpc");
    }

    @Override
    public String kind() {
        return "plummer";
    }

    @Override
    public double density(double r) {
        return 3 * massMsun / (4 * Math.PI * b * b * b) * Math.pow(1 + r * r / (b * b), -2.5);
    }

    @Override
    public double enclosedMass(double r) {
        double s2 = r * r + b * b;
        return massMsun * r * r * r / (s2 * Math.sqrt(s2));
    }

    @Override
    public double potential(double r) {
        return -Units.G * massMsun / Math.sqrt(r * r + b * b);
    }

    @Override
    public double potentialMoment(double s) {
        return -Units.G * massMsun * (Math.sqrt(s * s + b * b) - b);
    }

    @Override
    public double pullOverR(double r) {
        double s2 = r * r + b * b;
        return Units.G * massMsun / (s2 * Math.sqrt(s2));
    }

    @Override
    public double extentKpc() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public double lengthKpc() {
        return b;
    }

    @Override
    public Object shapeKey() {
        return java.util.List.of(kind(), massMsun, b);
    }
}
