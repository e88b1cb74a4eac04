package org.holdfast.expansion;

import java.util.Locale;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * w(a) given as a table of points, interpolated by a natural cubic spline in ln a (Commons
 * Math {@link SplineInterpolator}). Outside the table w is held at its first or last value, so
 * the far past and far future behave as constant-w dark energy with the end values.
 *
 * <p>The density integral ln f = -3 &int; (1 + w) d ln a is done exactly, piece by piece, on
 * the spline's own polynomials: no quadrature error enters.
 */
public final class TabulatedW implements DarkEnergyModel {

    private final String source;
    private final double[] x;      // ln a at the knots
    private final double[][] c;    // per piece: w = c0 + c1 d + c2 d^2 + c3 d^3, d = x - x_i
    private final double[] cum;    // integral of w dx from x_0 to x_i
    private final double wFirst;
    private final double wLast;
    private final double offsetToday; // integral of w dx from x_0 to 0 (today)

    /**
     * @param a scale factors, strictly increasing, all &gt; 0, with at least two points
     * @param w equation of state at each
     * @param source where the table came from, for {@link #describe()}
     */
    public TabulatedW(double[] a, double[] w, String source) {
        if (a.length != w.length || a.length < 2) {
            throw new IllegalArgumentException("need at least two (a, w) points");
        }
        this.source = source;
        int n = a.length;
        x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.log(a[i]);
        }
        c = new double[n - 1][4];
        if (n == 2) {
            c[0][0] = w[0];
            c[0][1] = (w[1] - w[0]) / (x[1] - x[0]);
        } else {
            PolynomialSplineFunction spline = new SplineInterpolator().interpolate(x, w);
            PolynomialFunction[] pieces = spline.getPolynomials();
            for (int i = 0; i < n - 1; i++) {
                double[] k = pieces[i].getCoefficients();
                System.arraycopy(k, 0, c[i], 0, Math.min(4, k.length));
            }
        }
        cum = new double[n];
        for (int i = 1; i < n; i++) {
            cum[i] = cum[i - 1] + pieceIntegral(i - 1, x[i] - x[i - 1]);
        }
        wFirst = w[0];
        wLast = w[n - 1];
        offsetToday = integralW(0.0);
    }

    private double pieceIntegral(int i, double d) {
        double[] k = c[i];
        return d * (k[0] + d * (k[1] / 2 + d * (k[2] / 3 + d * k[3] / 4)));
    }

    /** Index of the piece holding xv, for xv inside the table. */
    private int piece(double xv) {
        int lo = 0;
        int hi = x.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (x[mid] <= xv) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Integral of w d ln a from x_0 to xv (held values outside the table). */
    private double integralW(double xv) {
        if (xv <= x[0]) {
            return (xv - x[0]) * wFirst;
        }
        int last = x.length - 1;
        if (xv >= x[last]) {
            return cum[last] + (xv - x[last]) * wLast;
        }
        int i = piece(xv);
        return cum[i] + pieceIntegral(i, xv - x[i]);
    }

    /** w, dw/dx and d^2w/dx^2 at x = ln a, into out[0..2]. */
    private void wx(double xv, double[] out) {
        if (xv <= x[0] || xv >= x[x.length - 1]) {
            out[0] = xv <= x[0] ? wFirst : wLast;
            out[1] = 0.0;
            out[2] = 0.0;
            return;
        }
        int i = piece(xv);
        double d = xv - x[i];
        double[] k = c[i];
        out[0] = k[0] + d * (k[1] + d * (k[2] + d * k[3]));
        out[1] = k[1] + d * (2 * k[2] + d * 3 * k[3]);
        out[2] = 2 * k[2] + d * 6 * k[3];
    }

    @Override
    public double w(double a) {
        double[] o = new double[3];
        wx(Math.log(a), o);
        return o[0];
    }

    @Override
    public double dwda(double a) {
        double[] o = new double[3];
        wx(Math.log(a), o);
        return o[1] / a;
    }

    @Override
    public double d2wda2(double a) {
        double[] o = new double[3];
        wx(Math.log(a), o);
        return (o[2] - o[1]) / (a * a);
    }

    @Override
    public double lnDensityRatio(double lnA) {
        return -3.0 * (lnA + integralW(lnA) - offsetToday);
    }

    /** The table's points: {a[], w[]}, copies (to write them out and read them back). */
    public double[][] knots() {
        int n = x.length;
        double[] a = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = Math.exp(x[i]);
            w[i] = i < n - 1 ? c[i][0] : wLast;
        }
        return new double[][] {a, w};
    }

    /** Smallest and largest tabulated scale factor. */
    public double[] range() {
        return new double[] {Math.exp(x[0]), Math.exp(x[x.length - 1])};
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "w(a) table %s (%d points, a = %.4g to %.4g; w held constant outside)",
                source, x.length, Math.exp(x[0]), Math.exp(x[x.length - 1]));
    }
}
