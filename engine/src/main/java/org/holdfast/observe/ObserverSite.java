package org.holdfast.observe;

/**
 * Where the observer stands in the home galaxy and how it moves there, in the home frame
 * described in the package note.
 *
 * @param homeGalaxy name of the scenario member the observer lives in
 * @param distanceToCentreKpc distance from the observer to the home centre, R0
 * @param heightKpc height above the home midplane (toward the north Galactic pole)
 * @param uKms velocity toward the home centre
 * @param vKms velocity along the home disc's rotation
 * @param wKms velocity toward the north Galactic pole
 */
public record ObserverSite(String homeGalaxy, double distanceToCentreKpc, double heightKpc,
        double uKms, double vKms, double wKms) {

    /** Sun to Galactic centre distance, kpc (GRAVITY Collaboration 2018, A&A 615, L15). */
    public static final double DEFAULT_DISTANCE_TO_CENTRE_KPC = 8.122;

    /** Sun's height above the Galactic midplane, kpc: 20.8 pc (Bennett and Bovy 2019, MNRAS 482, 1417). */
    public static final double DEFAULT_HEIGHT_KPC = 0.0208;

    /** The Sun's velocity toward the Galactic centre, km/s (Drimmel and Poggio 2018, RNAAS 2, 210). */
    public static final double DEFAULT_U_KMS = 12.9;

    /** The Sun's velocity along the Galactic rotation, km/s (Drimmel and Poggio 2018). */
    public static final double DEFAULT_V_KMS = 245.6;

    /** The Sun's velocity toward the north Galactic pole, km/s (Drimmel and Poggio 2018). */
    public static final double DEFAULT_W_KMS = 7.78;

    /** An observer placed and moving as the defaults say, in the given home galaxy. */
    public static ObserverSite defaults(String homeGalaxy) {
        return new ObserverSite(homeGalaxy, DEFAULT_DISTANCE_TO_CENTRE_KPC, DEFAULT_HEIGHT_KPC,
                DEFAULT_U_KMS, DEFAULT_V_KMS, DEFAULT_W_KMS);
    }

    /** The velocity (U, V, W) as a new array, km/s. */
    public double[] velocityKms() {
        return new double[] {uKms, vKms, wKms};
    }
}
