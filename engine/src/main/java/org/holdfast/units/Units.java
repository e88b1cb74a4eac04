package org.holdfast.units;

/**
 * Physical constants and unit conversions. Internally holdfast measures length in kpc, time in
 * Gyr and mass in solar masses; km/s, km/s/Mpc and SI appear only at the edges, converted here.
 *
 * <p>Every defining value carries its source. Derived values are computed from those, never
 * typed in, so that the whole set stays consistent to round-off.
 */
public final class Units {

    /** Nominal solar mass parameter GM_sun in m^3 s^-2 (IAU 2015 Resolution B3). */
    public static final double GM_SUN_SI = 1.3271244e20;

    /** Astronomical unit in m, exact (IAU 2012 Resolution B2). */
    public static final double AU_M = 149_597_870_700.0;

    /** Parsec in m: 648000/pi au (IAU 2015 Resolution B2 definition of the parsec). */
    public static final double PC_M = 648_000.0 / Math.PI * AU_M;

    /** Kiloparsec in m. */
    public static final double KPC_M = 1e3 * PC_M;

    /** Megaparsec in km. */
    public static final double MPC_KM = 1e6 * PC_M / 1e3;

    /** Julian year in s: 365.25 days of 86400 s (IAU definition). */
    public static final double JULIAN_YEAR_S = 365.25 * 86_400.0;

    /** One Gyr in s. */
    public static final double GYR_S = 1e9 * JULIAN_YEAR_S;

    /** Newton's constant in m^3 kg^-1 s^-2 (CODATA 2018); used only for SI densities. */
    public static final double G_SI = 6.6743e-11;

    /** Solar mass in kg, from GM_sun and CODATA 2018 G (carries G's 2e-5 relative uncertainty). */
    public static final double MSUN_KG = GM_SUN_SI / G_SI;

    /** Speed of light in km/s (exact, SI definition). */
    public static final double C_KMS = 299_792.458;

    /** Boltzmann constant in J/K, exact (SI 2019). */
    public static final double K_BOLTZMANN_SI = 1.380649e-23;

    /** Reduced Planck constant in J s, exact (SI 2019). */
    public static final double HBAR_SI = 1.054571817e-34;

    /** Speed of light in m/s, exact. */
    public static final double C_SI = 299_792_458.0;

    /** Newton's constant in kpc^3 Msun^-1 Gyr^-2 (about 4.49850e-6), from GM_sun, kpc and Gyr. */
    public static final double G = GM_SUN_SI * GYR_S * GYR_S / (KPC_M * KPC_M * KPC_M);

    /** One km/s in kpc/Gyr (about 1.02271). */
    public static final double KMS_TO_KPC_PER_GYR = 1e3 * GYR_S / KPC_M;

    /** One kpc/Gyr in km/s. */
    public static final double KPC_PER_GYR_TO_KMS = 1.0 / KMS_TO_KPC_PER_GYR;

    /** Speed of light in kpc/Gyr (about 306,601), from the exact SI value, kpc and Gyr. */
    public static final double C = C_KMS * KMS_TO_KPC_PER_GYR;

    /**
     * The fraction of c above which the Newtonian model of a group is doubtful: at v = 0.1 c the
     * relativistic corrections, of order (v/c)^2, reach one per cent (common practice).
     */
    public static final double NEWTONIAN_LIMIT_FRACTION_OF_C = 0.1;

    /** One km/s/Mpc in 1/Gyr (1/977.792). */
    public static final double KMS_PER_MPC_TO_PER_GYR = GYR_S / MPC_KM;

    /** Density: one Msun/kpc^3 in kg/m^3. */
    public static final double MSUN_PER_KPC3_TO_KG_PER_M3 = MSUN_KG / (KPC_M * KPC_M * KPC_M);

    /** Transverse speed in km/s of 1 mas/yr at 1 kpc: 1 au/yr in km/s (about 4.740470). */
    public static final double KMS_PER_MAS_YR_KPC = AU_M / 1e3 / JULIAN_YEAR_S;

    /** One Myr in Gyr. */
    public static final double MYR = 1e-3;

    private Units() {
    }

    /** Converts a Hubble rate from km/s/Mpc to 1/Gyr. */
    public static double hubbleToPerGyr(double kmsPerMpc) {
        return kmsPerMpc * KMS_PER_MPC_TO_PER_GYR;
    }

    /** Converts a Hubble rate from 1/Gyr to km/s/Mpc. */
    public static double hubbleToKmsPerMpc(double perGyr) {
        return perGyr / KMS_PER_MPC_TO_PER_GYR;
    }

    /** Converts a speed from km/s to kpc/Gyr. */
    public static double kmsToKpcPerGyr(double kms) {
        return kms * KMS_TO_KPC_PER_GYR;
    }

    /** Converts a speed from kpc/Gyr to km/s. */
    public static double kpcPerGyrToKms(double kpcPerGyr) {
        return kpcPerGyr * KPC_PER_GYR_TO_KMS;
    }
}
