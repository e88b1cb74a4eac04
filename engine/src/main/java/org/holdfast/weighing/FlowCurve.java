package org.holdfast.weighing;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.units.Units;

/**
 * The velocity-distance relation around a point mass: the radial velocity today of a galaxy at
 * distance r that left r = 0 at the Big Bang on a radial orbit in the field of the group and
 * the background K(t) (Lynden-Bell 1981, Observatory 101, 111; Sandage 1986, ApJ 307, 1;
 * Penarrubia et al. 2014, MNRAS 443, 2204, with dark energy). Solved once for a reference
 * mass; since r'' = -G M / r^2 + K(t) r keeps its form when r and M^(1/3) scale together, the
 * relation of any mass is v(r; M) = s v_ref(r / s), s = (M / M_ref)^(1/3).
 */
public final class FlowCurve {

    /** The reference mass of the tabulated relation. */
    public static final double REFERENCE_MSUN = 1e12;

    private final PolynomialSplineFunction v;
    private final PolynomialSplineFunction dv;
    private final double lnLo;
    private final double lnHi;
    private final double zeroKpc;
    private final double ageGyr;

    /**
     * @param field K(t), 1/Gyr^2
     * @param ageGyr the age
     * @param loKpc the smallest distance needed at the reference mass
     * @param hiKpc the largest
     * @param points how many distances to solve
     */
    public FlowCurve(DoubleUnaryOperator field, double ageGyr, double loKpc, double hiKpc, int points) {
        this.ageGyr = ageGyr;
        lnLo = Math.log(loKpc);
        lnHi = Math.log(hiKpc);
        double[] x = new double[points];
        double[] y = new double[points];
        for (int i = 0; i < points; i++) {
            x[i] = lnLo + (lnHi - lnLo) * i / (points - 1);
            y[i] = velocityKms(Math.exp(x[i]), field, ageGyr);
        }
        v = new SplineInterpolator().interpolate(x, y);
        dv = v.polynomialSplineDerivative();
        double z = Double.NaN;
        for (int i = 1; i < points; i++) {
            if (y[i - 1] < 0 && y[i] >= 0) {
                z = Math.exp(new BrentSolver(1e-13).solve(200, v::value, x[i - 1], x[i]));
                break;
            }
        }
        zeroKpc = z;
    }

    /**
     * The radial velocity (km/s) today of the orbit from r = 0 at the Big Bang that is at r
     * now, for the reference mass.
     */
    static double velocityKms(double rKpc, DoubleUnaryOperator field, double ageGyr) {
        double scale = Units.kpcPerGyrToKms(5 * (rKpc / ageGyr + Math.sqrt(2 * Units.G * REFERENCE_MSUN / rKpc)));
        return new BrentSolver(1e-12 * scale, 1e-12).solve(400, vv -> TimingSolver.mismatch(
                new PairMotion(rKpc, vv, 0, ageGyr), REFERENCE_MSUN, field), -scale, scale);
    }

    /** The scale s = (M / M_ref)^(1/3). */
    public static double scale(double massMsun) {
        return Math.cbrt(massMsun / REFERENCE_MSUN);
    }

    /** Whether distance r is tabulated for this mass. */
    public boolean covers(double rKpc, double massMsun) {
        double u = Math.log(rKpc / scale(massMsun));
        return u >= lnLo && u <= lnHi;
    }

    /** v(r; M) in km/s. */
    public double velocityKms(double rKpc, double massMsun) {
        double s = scale(massMsun);
        return s * v.value(Math.log(rKpc / s));
    }

    /** dv/dr (km/s per kpc) at r for mass M. */
    public double slope(double rKpc, double massMsun) {
        double s = scale(massMsun);
        double u = rKpc / s;
        return dv.value(Math.log(u)) / u;
    }

    /** The zero-velocity radius for mass M, kpc (NaN if outside the table). */
    public double zeroVelocityKpc(double massMsun) {
        return zeroKpc * scale(massMsun);
    }

    /** The age the relation is for. */
    public double ageGyr() {
        return ageGyr;
    }
}
