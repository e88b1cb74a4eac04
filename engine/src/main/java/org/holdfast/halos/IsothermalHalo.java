package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * Singular isothermal sphere truncated at R (Binney &amp; Tremaine 2008, eq. 4.103):
 * rho = M / (4 pi R r^2), M(&lt;r) = M r / R, flat circular speed sqrt(G M / R) inside R;
 * Phi = -(G M / R)(1 + ln(R / r)) inside, -G M / r outside.
 */
public final class IsothermalHalo extends HaloProfile {

    private final double rTrunc;

    public IsothermalHalo(double massMsun, double truncationKpc) {
        super(massMsun);
        this.rTrunc = Halos.positive(truncationKpc, "truncation_kpc");
    }

    @Override
    public String kind() {
        return "isothermal";
    }

    @Override
    public double density(double r) {
        return r > rTrunc ? 0 : massMsun / (4 * Math.PI * rTrunc * r * r);
    }

    @Override
    public double enclosedMass(double r) {
        return r >= rTrunc ? massMsun : massMsun * r / rTrunc;
    }

    @Override
    public double potential(double r) {
        if (r >= rTrunc) {
            return -Units.G * massMsun / r;
        }
        return -Units.G * massMsun / rTrunc * (1 + Math.log(rTrunc / r));
    }

    @Override
    public double potentialMoment(double s) {
        double inner = Math.min(s, rTrunc);
        double psi = inner == 0 ? 0
                : -Units.G * massMsun / rTrunc * inner * inner / 2 * (1.5 + Math.log(rTrunc / inner));
        if (s > rTrunc) {
            psi -= Units.G * massMsun * (s - rTrunc);
        }
        return psi;
    }

    @Override
    public double pullOverR(double r) {
        return Units.G * enclosedMass(r) / (r * r * r);
    }

    @Override
    public double extentKpc() {
        return rTrunc;
    }

    @Override
    public double lengthKpc() {
        return rTrunc;
    }

    @Override
    public Object shapeKey() {
        return java.util.List.of(kind(), massMsun, rTrunc);
    }
}
