package org.holdfast.observe;

import org.holdfast.schema.Node;

/**
 * Reads the {@code [observer]} table:
 * <pre>
 * [observer]
 * galaxy = "Ossel"                       # the member the observer lives in (required)
 * distance_to_centre_kpc = 8.122         # default: GRAVITY Collaboration 2018
 * height_kpc = 0.0208                    # default: Bennett and Bovy 2019
 * velocity_kms = [12.9, 245.6, 7.78]     # U, V, W; default: Drimmel and Poggio 2018
 * </pre>
 * Any of the numbers may be uncertain when the scenario is opened with an uncertain reader.
 */
public final class ObserverReader {

    /** Keys of the table. */
    public static final String GALAXY = "galaxy";
    public static final String DISTANCE = "distance_to_centre_kpc";
    public static final String HEIGHT = "height_kpc";
    public static final String VELOCITY = "velocity_kms";
    public static final String UNMEASURED = "unmeasured_transverse";
    public static final String SIGMA = "transverse_sigma_kms";

    private ObserverReader() {
    }

    /**
     * The observer for a scenario that has observed members: reads {@code [observer]} from
     * the root table.
     *
     * @param root the scenario's root table
     * @param observed the first member's {@code observed} table, named in the error if the
     *     scenario has no {@code [observer]}
     */
    public static ObserverSite forObserved(Node root, Node observed) {
        Node table = root.table("observer");
        if (table == null) {
            throw observed.error(null, "a member given by observation needs an [observer] table"
                    + " naming the home galaxy (galaxy = \"NAME\")");
        }
        return read(table);
    }

    /**
     * How draws fill in unmeasured transverse velocities ({@link UnmeasuredMotion}), from the
     * {@code [observer]} table: {@code unmeasured_transverse} ("isotropic", the default, or
     * "none") and {@code transverse_sigma_kms} (default 100).
     */
    public static UnmeasuredMotion unmeasured(Node observer) {
        if (observer == null) {
            return UnmeasuredMotion.DEFAULT;
        }
        String mode = observer.has(UNMEASURED) ? observer.choice(UNMEASURED, UnmeasuredMotion.MODES)
                : UnmeasuredMotion.ISOTROPIC;
        double sigma = observer.has(SIGMA) ? observer.positive(SIGMA) : UnmeasuredMotion.DEFAULT_SIGMA_KMS;
        if (Double.isInfinite(sigma)) {
            throw observer.error(SIGMA, "must be finite");
        }
        return new UnmeasuredMotion(mode, sigma);
    }

    /**
     * @param observer the {@code [observer]} table
     * @throws org.holdfast.schema.ScenarioException naming file, line and key for an
     *     unknown key, a missing home galaxy, R0 <= 0, or |height| >= R0
     */
    public static ObserverSite read(Node observer) {
        observer.allowOnly(GALAXY, DISTANCE, HEIGHT, VELOCITY, UNMEASURED, SIGMA);
        String home = observer.string(GALAXY);
        if (home.isBlank()) {
            throw observer.error(GALAXY, "must name the member the observer lives in");
        }
        double r0 = observer.positive(DISTANCE, ObserverSite.DEFAULT_DISTANCE_TO_CENTRE_KPC);
        double h = observer.number(HEIGHT, ObserverSite.DEFAULT_HEIGHT_KPC);
        if (!(Math.abs(h) < r0)) {
            throw observer.error(HEIGHT, "must be smaller in size than " + DISTANCE + " ("
                    + r0 + " kpc), got " + h);
        }
        double[] v = observer.has(VELOCITY) ? observer.vector(VELOCITY, 3)
                : new double[] {ObserverSite.DEFAULT_U_KMS, ObserverSite.DEFAULT_V_KMS, ObserverSite.DEFAULT_W_KMS};
        return new ObserverSite(home, r0, h, v[0], v[1], v[2]);
    }
}
