package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Planck 2018 results VI (Planck Collaboration 2020, A&amp;A 641, A6), Table 2, base-LambdaCDM
 * TT,TE,EE+lowE+lensing+BAO: H0 = 67.66, Omega_m = 0.3111, age 13.787 +- 0.020 Gyr.
 */
class PlanckCosmologyTest {

    private static Cosmology planck() {
        double h0 = 67.66;
        double omegaR = Cosmology.radiationFromCmb(h0, Cosmology.T_CMB_K, Cosmology.N_EFF);
        return new Cosmology(h0, 0.3111, omegaR, 0, new ConstantW(-1));
    }

    /**
     * The age lands within 0.3% of 13.787 Gyr. The residual (we find 13.786 Gyr) comes from the
     * neutrinos: Planck's Omega_m contains one 0.06 eV neutrino, which was relativistic early on,
     * whereas here it counts as matter at all times and the 3.046 species in Omega_r stay
     * massless forever.
     */
    @Test
    void ageIsCloseToThePublishedValue() {
        ExpansionTable t = planck().solve();
        assertEquals(13.787, t.ageGyr(), 0.003 * 13.787);
    }

    /**
     * rho_de = Omega_de 3 H0^2 / (8 pi G) = 5.92e-27 kg/m^3 (derived from the Planck values with
     * G = 6.6743e-11 SI, CODATA 2018; physics-references.md), quoted to three digits.
     */
    @Test
    void darkEnergyDensityToday() {
        ExpansionTable t = planck().solve();
        assertEquals(5.92e-27, t.darkEnergyDensityKgM3(0), 0.005e-27);
        assertEquals(t.cosmology().darkEnergyDensityTodayKgM3(), t.darkEnergyDensityKgM3(0), 1e-12 * 5.92e-27);
    }

    /**
     * Photons at 2.7255 K: Omega_gamma h^2 = 2.47e-5 (common practice; e.g. Dodelson 2003, Modern
     * Cosmology, eq. 2.70 — value from memory), and with 3.046 massless neutrinos a factor
     * 1 + 0.2271 N_eff more.
     */
    @Test
    void radiationFromTheCmbTemperature() {
        double h = 0.6766;
        double omegaGamma = Cosmology.radiationFromCmb(67.66, Cosmology.T_CMB_K, 0);
        assertEquals(2.47e-5, omegaGamma * h * h, 0.005e-5);
        double ratio = Cosmology.radiationFromCmb(67.66, Cosmology.T_CMB_K, 3.046) / omegaGamma;
        assertEquals(1 + 0.2271 * 3.046, ratio, 1e-4);
    }
}
