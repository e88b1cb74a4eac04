package org.holdfast.weighing;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.CosmologyReader;
import org.holdfast.schema.Node;

/**
 * A weighing file: the pair, optionally the cosmology and an independent mass, any number an
 * uncertain one (normal, log-normal, uniform, as in scenarios):
 *
 * <pre>
 * [pair]
 * separation_kpc = { mean = 770, sigma = 40 }
 * radial_velocity_kms = { mean = -109.3, sigma = 4.4 }
 * tangential_velocity_kms = 0          # optional, default 0 (its size is used)
 * age_gyr = { mean = 13.798, sigma = 0.037 }   # optional, default the cosmology's age
 *
 * [cosmology]                          # optional: needed for the dark-energy masses
 * h0 = 67.3
 * omega_m = 0.314
 *
 * [independent_mass]                   # optional: for the bound on dark energy
 * mass_msun = 4.0e12
 * sigma_msun = 1.0e12
 * </pre>
 *
 * @param separationKpc today's separation
 * @param radialKms radial velocity
 * @param tangentialKms tangential speed
 * @param ageGyr the age, NaN for the cosmology's own
 * @param cosmology the cosmology, or null
 * @param independentMassMsun an independent mass estimate, NaN if none
 * @param independentSigmaMsun its standard error
 */
public record WeighingInput(double separationKpc, double radialKms, double tangentialKms, double ageGyr,
        Cosmology cosmology, double independentMassMsun, double independentSigmaMsun) {

    /** Reads the root of a weighing file; errors name file, line and key. */
    public static WeighingInput read(Node root) {
        root.allowOnly("pair", "cosmology", "independent_mass");
        Node pair = root.requireTable("pair");
        pair.allowOnly("separation_kpc", "radial_velocity_kms", "tangential_velocity_kms", "age_gyr");
        double r = pair.positive("separation_kpc");
        double vr = pair.number("radial_velocity_kms");
        double vt = Math.abs(pair.number("tangential_velocity_kms", 0.0));
        double age = pair.has("age_gyr") ? pair.positive("age_gyr") : Double.NaN;
        Node c = root.table("cosmology");
        Cosmology cosmology = c == null ? null : CosmologyReader.read(c);
        if (cosmology == null && Double.isNaN(age)) {
            throw pair.error(null, "give age_gyr, or a [cosmology] whose age is used");
        }
        double m = Double.NaN;
        double s = Double.NaN;
        Node ind = root.table("independent_mass");
        if (ind != null) {
            ind.allowOnly("mass_msun", "sigma_msun");
            m = ind.positive("mass_msun");
            s = ind.positive("sigma_msun");
        }
        return new WeighingInput(r, vr, vt, age, cosmology, m, s);
    }
}
