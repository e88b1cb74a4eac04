package org.holdfast.observe;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.schema.Node;
import org.joml.Vector3d;

/**
 * Reads a member's {@code observed = { ... }} table:
 * <pre>
 * observed = { ra_deg = 10.7, dec_deg = 41.3,        # or l_deg, b_deg (Galactic)
 *              distance_kpc = 780,                   # or distance_modulus = 24.46
 *              v_los_kms = -300,                     # heliocentric
 *              pm_ra_mas_yr = 0.05, pm_dec_mas_yr = -0.03 }   # optional, both or neither
 * </pre>
 * Without proper motions the member is assumed to have no transverse motion relative to the
 * home galaxy's centre, and the returned member carries a warning that says so.
 */
public final class ObservedReader {

    public static final String RA = "ra_deg";
    public static final String DEC = "dec_deg";
    public static final String L = "l_deg";
    public static final String B = "b_deg";
    public static final String DISTANCE = "distance_kpc";
    public static final String MODULUS = "distance_modulus";
    public static final String V_LOS = "v_los_kms";
    public static final String PM_RA = "pm_ra_mas_yr";
    public static final String PM_DEC = "pm_dec_mas_yr";

    /**
     * Accepted distance moduli, 10 to 40 mag (1 kpc to 1 Gpc); anything else is a mistake such
     * as an apparent magnitude typed in the wrong key.
     */
    public static final double MIN_MODULUS = 10;
    public static final double MAX_MODULUS = 40;

    private ObservedReader() {
    }

    /**
     * @param observed the {@code observed} table of a member
     * @throws org.holdfast.schema.ScenarioException naming file, line and key for a missing,
     *     doubled or out-of-range value
     */
    public static ObservedMember read(Node observed) {
        return read(observed, new UnmeasuredMotion(UnmeasuredMotion.NONE, 0));
    }

    /**
     * As {@link #read(Node)}, filling an unmeasured transverse velocity in draws as
     * {@code unmeasured} says (zero in a central run).
     */
    public static ObservedMember read(Node observed, UnmeasuredMotion unmeasured) {
        observed.allowOnly(RA, DEC, L, B, DISTANCE, MODULUS, V_LOS, PM_RA, PM_DEC);
        double[] radec = skyPosition(observed);
        double d = distance(observed);
        double vLos = observed.number(V_LOS);
        List<String> warnings = new ArrayList<>();
        double pmRa = Double.NaN;
        double pmDec = Double.NaN;
        if (observed.has(PM_RA) || observed.has(PM_DEC)) {
            requireBoth(observed, PM_RA, PM_DEC);
            pmRa = observed.number(PM_RA);
            pmDec = observed.number(PM_DEC);
        } else {
            warnings.add(observed.where(null) + ": " + observed.path() + ": no proper motion given;"
                    + " assumed no motion across the line of sight relative to the home galaxy's centre"
                    + (unmeasured.draws() ? " (in --sample draws: each transverse component drawn from a normal of"
                            + " sigma " + String.format(java.util.Locale.ROOT, "%.4g", unmeasured.sigmaKms()) + " km/s, [observer] unmeasured_transverse)" : ""));
        }
        double tRa = 0;
        double tDec = 0;
        if (!Double.isFinite(pmRa) && unmeasured.draws()) {
            tRa = observed.assumedNormal(UnmeasuredMotion.KEY, 0, 0, unmeasured.sigmaKms());
            tDec = observed.assumedNormal(UnmeasuredMotion.KEY, 1, 0, unmeasured.sigmaKms());
        }
        return new ObservedMember(observed.path(), radec[0], radec[1], d, vLos, pmRa, pmDec, warnings, tRa, tDec);
    }

    private static double[] skyPosition(Node n) {
        boolean icrs = n.has(RA) || n.has(DEC);
        boolean galactic = n.has(L) || n.has(B);
        if (icrs && galactic) {
            String a = first(n, RA, DEC);
            String b = first(n, L, B);
            throw n.error(n.lineOf(a) > n.lineOf(b) ? a : b,
                    "give the sky position once: either ra_deg/dec_deg or l_deg/b_deg");
        }
        if (!icrs && !galactic) {
            throw n.error(null, "missing sky position: give ra_deg and dec_deg (ICRS) or l_deg and b_deg (Galactic)");
        }
        if (icrs) {
            requireBoth(n, RA, DEC);
            return new double[] {longitude(n, RA), latitude(n, DEC)};
        }
        requireBoth(n, L, B);
        Vector3d u = GalacticRotation.unitVector(longitude(n, L), latitude(n, B), new Vector3d());
        GalacticRotation.toIcrs(u, u);
        return new double[] {GalacticRotation.longitudeDeg(u), GalacticRotation.latitudeDeg(u)};
    }

    private static double distance(Node n) {
        if (n.has(DISTANCE) && n.has(MODULUS)) {
            throw n.error(n.lineOf(DISTANCE) > n.lineOf(MODULUS) ? DISTANCE : MODULUS,
                    "give the distance once: either distance_kpc or distance_modulus");
        }
        if (n.has(DISTANCE)) {
            return n.positive(DISTANCE);
        }
        if (!n.has(MODULUS)) {
            throw n.error(null, "missing distance: give distance_kpc or distance_modulus");
        }
        double mu = n.number(MODULUS);
        if (!(mu >= MIN_MODULUS && mu <= MAX_MODULUS)) {
            throw n.error(MODULUS, "must be between " + MIN_MODULUS + " and " + MAX_MODULUS
                    + " mag (1 kpc to 1 Gpc), got " + mu);
        }
        return kpcFromModulus(mu);
    }

    /** Distance in kpc from a distance modulus mu = 5 log10(d / 10 pc). */
    public static double kpcFromModulus(double mu) {
        return Math.pow(10.0, mu / 5.0 - 2.0);
    }

    /** Whichever of two keys present comes first in the file. */
    private static String first(Node n, String a, String b) {
        if (!n.has(a)) {
            return b;
        }
        return !n.has(b) || n.lineOf(a) <= n.lineOf(b) ? a : b;
    }

    private static void requireBoth(Node n, String a, String b) {
        if (!n.has(a)) {
            throw n.error(b, "needs " + a + " as well");
        }
        if (!n.has(b)) {
            throw n.error(a, "needs " + b + " as well");
        }
    }

    /** A longitude in [-360, 360] deg, wrapped into [0, 360) (so a draw may cross zero). */
    private static double longitude(Node n, String key) {
        double v = n.number(key);
        if (!(v >= -360 && v <= 360)) {
            throw n.error(key, "must be in [-360, 360] degrees, got " + v);
        }
        double w = v % 360.0;
        return w < 0 ? w + 360.0 : w;
    }

    private static double latitude(Node n, String key) {
        double v = n.number(key);
        if (!(v >= -90 && v <= 90)) {
            throw n.error(key, "must be in [-90, 90] degrees, got " + v);
        }
        return v;
    }
}
