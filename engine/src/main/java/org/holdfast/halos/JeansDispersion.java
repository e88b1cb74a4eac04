package org.holdfast.halos;

import org.holdfast.units.Units;

/**
 * The one-dimensional velocity dispersion sigma(r) of a halo's own particles, from the
 * isotropic Jeans equation with zero pressure at the outer edge (Binney &amp; Tremaine 2008,
 * Galactic Dynamics, 2nd ed., eq. 4.216 with beta = 0):
 * <pre>
 *   rho(r) sigma^2(r) = integral from r to infinity of rho(s) G M(&lt;s) / s^2 ds.
 * </pre>
 * The truncated singular isothermal sphere has the closed form
 * sigma^2 = (v_c^2 / 2)(1 - r^2 / R^2) (the integral done by hand; v_c^2 / 2 without
 * truncation, Binney &amp; Tremaine 2008, eq. 4.103). Other profiles are integrated once on a
 * logarithmic grid (trapezoid rule in ln s) and interpolated.
 */
public final class JeansDispersion {

    private static final int POINTS = 4000;
    private static final double INNER = 1e-5;
    private static final double OUTER = 1e4;

    private final HaloProfile halo;
    private final double[] lnR;
    private final double[] lnPressure;
    private final double lnR0;
    private final double dLnR;
    private final double outerKpc;
    private final double sisSpeed2;

    private JeansDispersion(HaloProfile halo) {
        this.halo = halo;
        if (halo instanceof IsothermalHalo iso) {
            double rt = iso.extentKpc();
            sisSpeed2 = Units.G * halo.mass() / rt;
            lnR = null;
            lnPressure = null;
            lnR0 = 0;
            dLnR = 0;
            outerKpc = rt;
            return;
        }
        sisSpeed2 = Double.NaN;
        double length = halo.lengthKpc() > 0 ? halo.lengthKpc() : 1.0;
        double outer = Math.min(halo.extentKpc(), OUTER * length);
        outerKpc = outer;
        lnR0 = Math.log(INNER * length);
        dLnR = (Math.log(outer) - lnR0) / (POINTS - 1);
        lnR = new double[POINTS];
        lnPressure = new double[POINTS];
        double[] p = new double[POINTS];
        double next = integrand(outer);
        for (int k = POINTS - 2; k >= 0; k--) {
            double s = Math.exp(lnR0 + k * dLnR);
            double f = integrand(s);
            p[k] = p[k + 1] + 0.5 * dLnR * (f + next);
            next = f;
        }
        // an untruncated profile is cut at 10^4 inner lengths: its pressure there is negligible
        for (int k = 0; k < POINTS; k++) {
            lnR[k] = lnR0 + k * dLnR;
            lnPressure[k] = Math.log(Math.max(p[k], Double.MIN_NORMAL));
        }
    }

    /** The dispersion of a halo (tabulated now, for a profile without a closed form). */
    public static JeansDispersion of(HaloProfile halo) {
        return new JeansDispersion(halo);
    }

    /** rho G M / s^2 times s (the integrand in ln s). */
    private double integrand(double s) {
        return halo.density(s) * Units.G * halo.enclosedMass(s) / s;
    }

    /** The halo. */
    public HaloProfile halo() {
        return halo;
    }

    /** sigma(r) in kpc/Gyr; 0 where the halo has no mass. */
    public double sigma(double r) {
        if (!Double.isNaN(sisSpeed2)) {
            return r >= outerKpc ? 0 : Math.sqrt(0.5 * sisSpeed2 * (1 - (r / outerKpc) * (r / outerKpc)));
        }
        if (r >= outerKpc) {
            return 0;
        }
        double rho = halo.density(r);
        if (!(rho > 0)) {
            return 0;
        }
        double u = (Math.log(r) - lnR0) / dLnR;
        double pressure;
        if (u <= 0) {
            // inside the grid: the pressure is nearly constant for cored and cuspy profiles alike
            pressure = Math.exp(lnPressure[0]);
        } else {
            int k = Math.min((int) u, POINTS - 2);
            double f = u - k;
            if (k == POINTS - 2) {
                // last interval: interpolate linearly, the pressure drops to zero at the edge
                pressure = (1 - f) * Math.exp(lnPressure[k]) + f * Math.exp(lnPressure[k + 1]);
            } else {
                pressure = Math.exp((1 - f) * lnPressure[k] + f * lnPressure[k + 1]);
            }
        }
        return Math.sqrt(pressure / rho);
    }
}
