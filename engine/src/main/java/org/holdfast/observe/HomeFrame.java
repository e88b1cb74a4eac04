package org.holdfast.observe;

import java.util.List;

import org.holdfast.units.Units;
import org.joml.Matrix3d;
import org.joml.Matrix3dc;
import org.joml.Vector3d;

/**
 * Turns what an observer sees into states relative to the centre of the home galaxy (axes as
 * in the package note), and back. Immutable; one per {@link ObserverSite}.
 *
 * <p>Position: r_home = T (r_helio - R0 x), with r_helio in Galactic axes and T the rotation
 * about y by theta = asin(h / R0) that lifts the observer to height h. Velocity:
 * v_home = T v_helio + (U, V, W). Proper motions become transverse velocity
 * 4.740470 km/s per mas/yr per kpc (1 au per Julian year; {@link Units#KMS_PER_MAS_YR_KPC}).
 */
public final class HomeFrame {

    private final ObserverSite observer;
    private final Matrix3dc tilt;
    private final Matrix3dc skyToHome;
    private final double[] observerKpc;

    public HomeFrame(ObserverSite observer) {
        this.observer = observer;
        double r0 = observer.distanceToCentreKpc();
        double h = observer.heightKpc();
        if (!(r0 > 0) || !(Math.abs(h) < r0)) {
            throw new IllegalArgumentException("need R0 > 0 and |h| < R0, got R0 = " + r0 + ", h = " + h);
        }
        this.tilt = new Matrix3d().rotationY(Math.asin(h / r0));
        this.skyToHome = new Matrix3d(tilt).mul(GalacticRotation.icrsToGalactic());
        Vector3d o = tilt.transform(new Vector3d(-r0, 0, 0));
        this.observerKpc = new double[] {o.x, o.y, o.z};
    }

    /** The observer this frame belongs to. */
    public ObserverSite observer() {
        return observer;
    }

    /** The rotation from ICRS axes to home-frame axes (read-only). */
    public Matrix3dc icrsToHome() {
        return skyToHome;
    }

    /** Where the observer stands: (-sqrt(R0^2 - h^2), 0, h) kpc. */
    public double[] observerPositionKpc() {
        return observerKpc.clone();
    }

    /**
     * A heliocentric state in Galactic axes (kpc, km/s) as a home-frame state.
     */
    public MemberState helioToHome(double[] helioPosKpc, double[] helioVelKms) {
        Vector3d r = new Vector3d(helioPosKpc[0] - observer.distanceToCentreKpc(), helioPosKpc[1], helioPosKpc[2]);
        tilt.transform(r);
        Vector3d v = tilt.transform(new Vector3d(helioVelKms[0], helioVelKms[1], helioVelKms[2]));
        v.add(observer.uKms(), observer.vKms(), observer.wKms());
        return new MemberState(toArray(r), toArray(v), List.of());
    }

    /**
     * An observed member as a home-frame state. Without proper motions the member's velocity
     * relative to the home centre is the line-of-sight part (the heliocentric v_los plus the
     * observer's own motion along that line) plus the assumed transverse part of the member
     * ({@link ObservedMember#assumedRaKms}, zero in a central run).
     */
    public MemberState toHome(ObservedMember m) {
        Vector3d uIcrs = GalacticRotation.unitVector(m.raDeg(), m.decDeg(), new Vector3d());
        Vector3d u = skyToHome.transform(uIcrs, new Vector3d());
        double[] o = observerKpc;
        Vector3d r = new Vector3d(u).mul(m.distanceKpc()).add(o[0], o[1], o[2]);
        Vector3d v;
        if (m.hasProperMotion()) {
            Vector3d vIcrs = helioVelocityIcrs(m);
            v = skyToHome.transform(vIcrs, new Vector3d());
            v.add(observer.uKms(), observer.vKms(), observer.wKms());
        } else {
            double along = m.vLosKms() + u.x * observer.uKms() + u.y * observer.vKms() + u.z * observer.wKms();
            v = new Vector3d(u).mul(along);
            if (m.assumedRaKms() != 0 || m.assumedDecKms() != 0) {
                Vector3d[] basis = skyBasis(m.raDeg(), m.decDeg());
                v.add(skyToHome.transform(new Vector3d(basis[1]).mul(m.assumedRaKms())
                        .fma(m.assumedDecKms(), basis[2]), new Vector3d()));
            }
        }
        return new MemberState(toArray(r), toArray(v), m.warnings());
    }

    /**
     * The inverse of {@link #toHome} for a member with proper motions: what the observer would
     * see of a home-frame state. Returns {ra_deg, dec_deg, distance_kpc, v_los_kms,
     * pm_ra_mas_yr, pm_dec_mas_yr}.
     */
    public double[] observe(double[] positionKpc, double[] velocityKms) {
        double[] o = observerKpc;
        Matrix3d homeToIcrs = new Matrix3d(skyToHome).transpose();
        Vector3d r = homeToIcrs.transform(new Vector3d(positionKpc[0] - o[0], positionKpc[1] - o[1], positionKpc[2] - o[2]));
        Vector3d v = homeToIcrs.transform(new Vector3d(velocityKms[0] - observer.uKms(),
                velocityKms[1] - observer.vKms(), velocityKms[2] - observer.wKms()));
        double d = r.length();
        double ra = GalacticRotation.longitudeDeg(r);
        double dec = GalacticRotation.latitudeDeg(r);
        Vector3d[] basis = skyBasis(ra, dec);
        double k = Units.KMS_PER_MAS_YR_KPC * d;
        return new double[] {ra, dec, d, v.dot(basis[0]), v.dot(basis[1]) / k, v.dot(basis[2]) / k};
    }

    /** Heliocentric velocity in ICRS axes from v_los and both proper motions. */
    private static Vector3d helioVelocityIcrs(ObservedMember m) {
        Vector3d[] basis = skyBasis(m.raDeg(), m.decDeg());
        double k = Units.KMS_PER_MAS_YR_KPC * m.distanceKpc();
        return new Vector3d(basis[0]).mul(m.vLosKms())
                .fma(k * m.pmRaMasYr(), basis[1])
                .fma(k * m.pmDecMasYr(), basis[2]);
    }

    /**
     * The local sky basis at (ra, dec): radial unit vector, then the unit vectors of increasing
     * RA and of increasing Dec (e.g. Green 1985, Spherical Astronomy, ch. on proper motion;
     * common practice).
     */
    static Vector3d[] skyBasis(double raDeg, double decDeg) {
        double a = Math.toRadians(raDeg);
        double d = Math.toRadians(decDeg);
        double ca = Math.cos(a);
        double sa = Math.sin(a);
        double cd = Math.cos(d);
        double sd = Math.sin(d);
        return new Vector3d[] {
            new Vector3d(cd * ca, cd * sa, sd),
            new Vector3d(-sa, ca, 0),
            new Vector3d(-sd * ca, -sd * sa, cd)
        };
    }

    private static double[] toArray(Vector3d v) {
        return new double[] {v.x, v.y, v.z};
    }
}
