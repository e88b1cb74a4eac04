package org.holdfast.observe;

import org.joml.Matrix3d;
import org.joml.Matrix3dc;
import org.joml.Vector3d;

/**
 * The rotation from ICRS equatorial axes to Galactic axes, built from the three angles that
 * define the Galactic system in the Hipparcos catalogue (ESA 1997, The Hipparcos and Tycho
 * Catalogues, ESA SP-1200, vol. 1, sec. 1.5.3): the north Galactic pole at ICRS
 * RA 192.85948 deg, Dec +27.12825 deg, and the Galactic longitude 122.93192 deg of the north
 * celestial pole. {@code v_gal = R v_icrs}.
 */
public final class GalacticRotation {

    /** ICRS right ascension of the north Galactic pole, deg (ESA 1997, sec. 1.5.3). */
    public static final double POLE_RA_DEG = 192.85948;

    /** ICRS declination of the north Galactic pole, deg (ESA 1997, sec. 1.5.3). */
    public static final double POLE_DEC_DEG = 27.12825;

    /** Galactic longitude of the north celestial pole, deg (ESA 1997, sec. 1.5.3). */
    public static final double CELESTIAL_POLE_L_DEG = 122.93192;

    private static final Matrix3dc ICRS_TO_GALACTIC = new Matrix3d()
            .rotationZ(Math.toRadians(CELESTIAL_POLE_L_DEG) - Math.PI)
            .rotateY(Math.toRadians(POLE_DEC_DEG) - Math.PI / 2)
            .rotateZ(-Math.toRadians(POLE_RA_DEG));

    private static final Matrix3dc GALACTIC_TO_ICRS = new Matrix3d(ICRS_TO_GALACTIC).transpose();

    private GalacticRotation() {
    }

    /** The rotation matrix R (read-only). */
    public static Matrix3dc icrsToGalactic() {
        return ICRS_TO_GALACTIC;
    }

    /** Its inverse, the transpose R^T (read-only). */
    public static Matrix3dc galacticToIcrs() {
        return GALACTIC_TO_ICRS;
    }

    /** Rotates an ICRS vector into Galactic axes, writing into {@code dest}. */
    public static Vector3d toGalactic(Vector3d icrs, Vector3d dest) {
        return ICRS_TO_GALACTIC.transform(icrs, dest);
    }

    /** Rotates a Galactic vector into ICRS axes, writing into {@code dest}. */
    public static Vector3d toIcrs(Vector3d galactic, Vector3d dest) {
        return GALACTIC_TO_ICRS.transform(galactic, dest);
    }

    /**
     * The unit vector toward longitude {@code lonDeg}, latitude {@code latDeg} of a spherical
     * system (RA/Dec or l/b): (cos lat cos lon, cos lat sin lon, sin lat).
     */
    public static Vector3d unitVector(double lonDeg, double latDeg, Vector3d dest) {
        double lon = Math.toRadians(lonDeg);
        double lat = Math.toRadians(latDeg);
        return dest.set(Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat));
    }

    /** Longitude in [0, 360) deg of a vector (0 at the pole). */
    public static double longitudeDeg(Vector3d v) {
        double lon = Math.toDegrees(Math.atan2(v.y, v.x));
        return lon < 0 ? lon + 360 : lon;
    }

    /** Latitude in [-90, 90] deg of a vector. */
    public static double latitudeDeg(Vector3d v) {
        return Math.toDegrees(Math.atan2(v.z, Math.hypot(v.x, v.y)));
    }
}
