package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * Navarro, Frenk &amp; White (1996, ApJ 462, 563, eq. 3; 1997, ApJ 490, 493) profile
 * rho = rho_s / (x (1 + x)^2), x = r / r_s, truncated sharply at radius R (no mass outside).
 * M(&lt;r) = 4 pi rho_s r_s^3 mu(x), mu(x) = ln(1 + x) - x / (1 + x). Inside R the potential is
 * that of the untruncated profile, -G 4 pi rho_s r_s^3 ln(1 + x) / r, shifted by a constant so
 * that it joins -G M / r at R.
 */
public final class NfwHalo extends HaloProfile {

    private final double rs;
    private final double rTrunc;
    /** 4 pi rho_s r_s^3, Msun. */
    private final double m0;
    /** Constant added inside R: -Phi_untruncated(R) - G M / R. */
    private final double shift;

    /**
     * @param massMsun the whole mass inside the truncation radius
     * @param scaleKpc r_s
     * @param truncationKpc R
     */
    public NfwHalo(double massMsun, double scaleKpc, double truncationKpc) {
        super(massMsun);
        this.rs = Halos.positive(scaleKpc, "scale_kpc");
        this.rTrunc = Halos.positive(truncationKpc, "truncation_kpc");
        this.m0 = massMsun / mu(rTrunc / rs);
        this.shift = Units.G * m0 * Math.log1p(rTrunc / rs) / rTrunc - Units.G * massMsun / rTrunc;
    }

    /** mu(x) = ln(1 + x) - x / (1 + x). */
    public static double mu(double x) {
        return x < 1e-4 ? x * x * (0.5 - x * (2.0 / 3 - 0.75 * x)) : Math.log1p(x) - x / (1 + x);
    }

    /** Scale radius r_s, kpc. */
    public double scaleKpc() {
        return rs;
    }

    @Override
    public String kind() {
        return "nfw";
    }

    @Override
    public double density(double r) {
        if (r > rTrunc) {
            return 0;
        }
        double x = r / rs;
        return m0 / (4 * Math.PI * rs * rs * rs) / (x * (1 + x) * (1 + x));
    }

    @Override
    public double enclosedMass(double r) {
        return r >= rTrunc ? massMsun : m0 * mu(r / rs);
    }

    @Override
    public double potential(double r) {
        if (r >= rTrunc) {
            return -Units.G * massMsun / r;
        }
        double x = r / rs;
        double lnOverR = x < 1e-8 ? (1 - 0.5 * x) / rs : Math.log1p(x) / r;
        return -Units.G * m0 * lnOverR + shift;
    }

    @Override
    public double potentialMoment(double s) {
        double inner = Math.min(s, rTrunc);
        // integral of -G m0 ln(1 + s/rs) ds = -G m0 ((s + rs) ln(1 + s/rs) - s)
        double psi = -Units.G * m0 * ((inner + rs) * Math.log1p(inner / rs) - inner) + shift * inner * inner / 2;
        if (s > rTrunc) {
            psi -= Units.G * massMsun * (s - rTrunc);
        }
        return psi;
    }

    @Override
    public double pullOverR(double r) {
        return Units.G * (r >= rTrunc ? massMsun : m0 * mu(r / rs)) / (r * r * r);
    }

    @Override
    public double extentKpc() {
        return rTrunc;
    }

    @Override
    public double lengthKpc() {
        return rs;
    }

    @Override
    public Object shapeKey() {
        return java.util.List.of(kind(), massMsun, rs, rTrunc);
    }
}
