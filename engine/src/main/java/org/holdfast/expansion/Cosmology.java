package org.holdfast.expansion;

import java.util.Locale;

import org.holdfast.units.Units;

/**
 * The parameters of a homogeneous universe and its Friedmann equation,
 * H^2 = H0^2 E^2(a), E^2 = Omega_m a^-3 + Omega_r a^-4 + Omega_k a^-2 + Omega_de f(a)
 * (common practice; e.g. Peebles 1993, Principles of Physical Cosmology, eq. 13.3, from
 * memory), with Omega_de = 1 - Omega_m - Omega_r - Omega_k so that E(1) = 1.
 * Immutable; {@link #solve()} turns it into a lookup table.
 */
public final class Cosmology {

    /** CMB temperature today in K (Fixsen 2009, ApJ 707, 916). */
    public static final double T_CMB_K = 2.7255;

    /** Effective number of massless neutrino species (Mangano et al. 2005, Nucl. Phys. B 729, 221). */
    public static final double N_EFF = 3.046;

    /** Default far-future horizon of the table, Gyr after today, when no rip or crunch comes first. */
    public static final double DEFAULT_HORIZON_GYR = 1000.0;

    private final double h0Kms;
    private final double omegaM;
    private final double omegaR;
    private final double omegaK;
    private final double omegaDe;
    private final DarkEnergyModel darkEnergy;

    /**
     * @param h0Kms Hubble constant in km/s/Mpc, &gt; 0
     * @param omegaM matter density parameter today, &gt;= 0
     * @param omegaR radiation density parameter today, &gt;= 0
     * @param omegaK curvature parameter (positive: open)
     * @throws InvalidCosmologyException naming the first parameter out of range
     */
    public Cosmology(double h0Kms, double omegaM, double omegaR, double omegaK, DarkEnergyModel darkEnergy) {
        check("h0", h0Kms, h0Kms > 0, "must be > 0 km/s/Mpc (the universe expands today)");
        // outside this range the expansion table's fixed early start (10 kyr) leaves the history it
        // can describe (h0 = 1e-300 made its integration fail); measured values are near 70
        check("h0", h0Kms, h0Kms >= 1e-3 && h0Kms < 1e6, "must be from 0.001 to 1e6 km/s/Mpc");
        check("omega_m", omegaM, omegaM >= 0 && omegaM < 1e6, "must be >= 0");
        check("omega_r", omegaR, omegaR >= 0 && omegaR < 1e6, "must be >= 0");
        check("omega_k", omegaK, Math.abs(omegaK) < 1e6, "must be a finite number of modest size");
        if (!(omegaM + omegaR > 0)) {
            throw new InvalidCosmologyException("omega_m", "omega_m + omega_r must be > 0: without matter or"
                    + " radiation there is no Big Bang at a finite time in the past");
        }
        if (!Double.isFinite(darkEnergy.wToday())) {
            throw new InvalidCosmologyException("w0", "w today is not a finite number");
        }
        this.h0Kms = h0Kms;
        this.omegaM = omegaM;
        this.omegaR = omegaR;
        this.omegaK = omegaK;
        this.omegaDe = 1.0 - omegaM - omegaR - omegaK;
        this.darkEnergy = darkEnergy;
    }

    private static void check(String name, double v, boolean ok, String why) {
        if (!Double.isFinite(v) || !ok) {
            throw new InvalidCosmologyException(name, why + " (got " + String.format(Locale.ROOT, "%.6g", v) + ")");
        }
    }

    /**
     * Radiation density today from the CMB temperature and massless neutrinos:
     * rho_gamma c^2 = (pi^2/15) (k T)^4 / (hbar c)^3 (Stefan–Boltzmann, common practice) and
     * Omega_r = Omega_gamma (1 + (7/8)(4/11)^(4/3) N_eff) (Kolb &amp; Turner 1990, The Early
     * Universe, eq. 3.72, from memory).
     */
    public static double radiationFromCmb(double h0Kms, double tCmbK, double nEff) {
        double kt = Units.K_BOLTZMANN_SI * tCmbK;
        double hbarC = Units.HBAR_SI * Units.C_SI;
        double energyDensity = Math.PI * Math.PI / 15.0 * kt * kt * kt * kt / (hbarC * hbarC * hbarC);
        double rhoGamma = energyDensity / (Units.C_SI * Units.C_SI);
        double h0PerS = h0Kms / Units.MPC_KM;
        double rhoCrit = 3.0 * h0PerS * h0PerS / (8.0 * Math.PI * Units.G_SI);
        return rhoGamma / rhoCrit * (1.0 + 7.0 / 8.0 * Math.pow(4.0 / 11.0, 4.0 / 3.0) * nEff);
    }

    public double h0Kms() {
        return h0Kms;
    }

    /** H0 in 1/Gyr. */
    public double h0PerGyr() {
        return Units.hubbleToPerGyr(h0Kms);
    }

    public double omegaM() {
        return omegaM;
    }

    public double omegaR() {
        return omegaR;
    }

    public double omegaK() {
        return omegaK;
    }

    /** Omega_de = 1 - Omega_m - Omega_r - Omega_k. */
    public double omegaDe() {
        return omegaDe;
    }

    public DarkEnergyModel darkEnergy() {
        return darkEnergy;
    }

    /** Hubble time 1/H0 in Gyr. */
    public double hubbleTimeGyr() {
        return 1.0 / h0PerGyr();
    }

    /** Critical density today 3 H0^2/(8 pi G) in Msun/kpc^3. */
    public double criticalDensity() {
        double h = h0PerGyr();
        return 3.0 * h * h / (8.0 * Math.PI * Units.G);
    }

    /** Dark-energy density today in kg/m^3. */
    public double darkEnergyDensityTodayKgM3() {
        return omegaDe * criticalDensity() * Units.MSUN_PER_KPC3_TO_KG_PER_M3;
    }

    /** Deceleration parameter today, q0 = Omega_m/2 + Omega_r + Omega_de (1 + 3 w0)/2. */
    public double q0() {
        return 0.5 * omegaM + omegaR + 0.5 * omegaDe * (1.0 + 3.0 * darkEnergy.wToday());
    }

    /** E^2 = (H/H0)^2 at ln a. Zero parameters contribute nothing even where their power overflows. */
    public double e2(double lnA) {
        double s = 0;
        if (omegaM != 0) {
            s += omegaM * Math.exp(-3 * lnA);
        }
        if (omegaR != 0) {
            s += omegaR * Math.exp(-4 * lnA);
        }
        if (omegaK != 0) {
            s += omegaK * Math.exp(-2 * lnA);
        }
        if (omegaDe != 0) {
            s += omegaDe * Math.exp(darkEnergy.lnDensityRatio(lnA));
        }
        return s;
    }

    /** (a''/a)/H0^2 = -[Omega_m a^-3 + 2 Omega_r a^-4 + Omega_de f (1 + 3w)]/2 at ln a. */
    public double accelerationOverH02(double lnA) {
        double s = 0;
        if (omegaM != 0) {
            s += omegaM * Math.exp(-3 * lnA);
        }
        if (omegaR != 0) {
            s += 2 * omegaR * Math.exp(-4 * lnA);
        }
        if (omegaDe != 0) {
            s += omegaDe * Math.exp(darkEnergy.lnDensityRatio(lnA)) * (1 + 3 * darkEnergy.w(Math.exp(lnA)));
        }
        return -0.5 * s;
    }

    /** The same universe with a different dark-energy model (Omega_de unchanged). */
    public Cosmology withDarkEnergy(DarkEnergyModel model) {
        return new Cosmology(h0Kms, omegaM, omegaR, omegaK, model);
    }

    /** Solves the expansion history with the default table ({@link #DEFAULT_HORIZON_GYR}). */
    public ExpansionTable solve() {
        return solve(DEFAULT_HORIZON_GYR);
    }

    /** Solves the expansion history up to {@code horizonGyr} after today (or the rip or crunch). */
    public ExpansionTable solve(double horizonGyr) {
        return new TableBuilder(this, TableBuilder.Options.standard(horizonGyr)).build();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "H0 = %.4g km/s/Mpc, Omega_m = %.5g, Omega_r = %.4g, Omega_k = %.4g,"
                + " Omega_de = %.5g, dark energy: %s", h0Kms, omegaM, omegaR, omegaK, omegaDe, darkEnergy.describe());
    }
}
