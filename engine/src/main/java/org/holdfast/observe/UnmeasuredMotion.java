package org.holdfast.observe;

import java.util.List;

/**
 * How draws fill in the transverse velocity of a member observed without proper motions
 * ({@code [observer] unmeasured_transverse}). The central run always takes it as zero (no motion
 * across the line of sight relative to the home galaxy's centre); in {@code --sample} draws and
 * sweeps the ignorance is carried into the statistics:
 * <ul>
 * <li>{@code isotropic} (the default): each of the two transverse components is drawn from a
 *     normal distribution of mean 0 and sigma {@code transverse_sigma_kms} (default
 *     {@value #DEFAULT_SIGMA_KMS} km/s, of the order of the velocity dispersion of small groups;
 *     a choice, from memory), the transverse half of an isotropic Gaussian velocity ellipsoid;
 * <li>{@code none}: zero in draws too (the old assumption, for comparison).
 * </ul>
 * Each draw is recorded as the uncertain number {@code galaxy.NAME.observed.unmeasured_transverse_kms.0}
 * (toward increasing RA) and {@code .1} (toward increasing Dec), so the summary says which.
 *
 * @param mode one of {@link #MODES}
 * @param sigmaKms the one-dimensional dispersion of an isotropic draw, km/s
 */
public record UnmeasuredMotion(String mode, double sigmaKms) {

    public static final String ISOTROPIC = "isotropic";
    public static final String NONE = "none";
    public static final List<String> MODES = List.of(ISOTROPIC, NONE);
    public static final double DEFAULT_SIGMA_KMS = 100;

    /** The key of the assumed components inside an {@code observed} table. */
    public static final String KEY = "unmeasured_transverse_kms";

    /** The default: isotropic, 100 km/s. */
    public static final UnmeasuredMotion DEFAULT = new UnmeasuredMotion(ISOTROPIC, DEFAULT_SIGMA_KMS);

    /** Whether draws fill the transverse velocity in. */
    public boolean draws() {
        return ISOTROPIC.equals(mode) && sigmaKms > 0;
    }
}
