package org.holdfast.forces;

import org.holdfast.halos.HaloProfile;
import org.holdfast.units.Units;

/**
 * The exact mutual gravity of two extended halos ({@link InteractionIntegral}) tabulated once
 * on a logarithmic grid of d, with a cubic Hermite interpolant in ln d that uses the exact
 * slopes at the nodes. The pull is the derivative of that same interpolant, so force and
 * energy agree to round-off and the pair conserves energy exactly as a pair potential should.
 *
 * <p>Below the grid (d &lt; 1e-4 of the smaller length) the energy continues as W0 + c d^2,
 * joining value and slope (the harmonic core of two overlapping smooth halos). Above it: when
 * both halos are truncated the grid ends at R_1 + R_2, beyond which Newton's theorem makes
 * the interaction exactly -G M_1 M_2 / d; otherwise it ends at 1e4 lengths and continues as
 * alpha / d + beta / d^2 joining value and slope.
 */
public final class TabulatedKernel implements PairKernel {

    /** Grid nodes per decade of d. */
    static final int PER_DECADE = 64;

    private final double uLo;
    private final double du;
    private final double dLo;
    private final double dHi;
    /** w and dw/du per unit mass product at the nodes. */
    private final double[] w;
    private final double[] g;
    private final double coreW0;
    private final double coreC;
    private final boolean exactFar;
    private final double farAlpha;
    private final double farBeta;
    private final double length;

    public TabulatedKernel(HaloProfile h1, HaloProfile h2) {
        double norm = 1.0 / (h1.mass() * h2.mass());
        double minLen = Math.min(h1.lengthKpc(), h2.lengthKpc());
        double maxLen = Math.max(h1.lengthKpc(), h2.lengthKpc());
        exactFar = Double.isFinite(h1.extentKpc()) && Double.isFinite(h2.extentKpc());
        dLo = 1e-4 * minLen;
        dHi = exactFar ? h1.extentKpc() + h2.extentKpc() : 1e4 * maxLen;
        int nodes = (int) Math.ceil(Math.log10(dHi / dLo) * PER_DECADE) + 1;
        uLo = Math.log(dLo);
        du = (Math.log(dHi) - uLo) / (nodes - 1);
        w = new double[nodes];
        g = new double[nodes];
        for (int k = 0; k < nodes; k++) {
            double d = k == nodes - 1 ? dHi : Math.exp(uLo + k * du);
            double[] v = InteractionIntegral.evaluate(h1, h2, d);
            w[k] = v[0] * norm;
            g[k] = v[1] * norm * d;
        }
        double slopeLo = g[0] / dLo;
        coreC = slopeLo / (2 * dLo);
        coreW0 = w[0] - coreC * dLo * dLo;
        double wHi = w[nodes - 1];
        double slopeHi = g[nodes - 1] / dHi;
        farBeta = -dHi * dHi * (wHi + slopeHi * dHi);
        farAlpha = dHi * (2 * wHi + slopeHi * dHi);
        length = Math.hypot(h1.lengthKpc(), h2.lengthKpc());
    }

    @Override
    public double energy(double d) {
        if (d <= dLo) {
            return coreW0 + coreC * d * d;
        }
        if (d >= dHi) {
            return exactFar ? -Units.G / d : farAlpha / d + farBeta / (d * d);
        }
        double x = (Math.log(d) - uLo) / du;
        int k = Math.min((int) x, w.length - 2);
        double t = x - k;
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * w[k] + (t3 - 2 * t2 + t) * du * g[k]
                + (-2 * t3 + 3 * t2) * w[k + 1] + (t3 - t2) * du * g[k + 1];
    }

    @Override
    public double pullOverD(double d) {
        if (d <= dLo) {
            return 2 * coreC;
        }
        if (d >= dHi) {
            return exactFar ? Units.G / (d * d * d) : -(farAlpha / d + 2 * farBeta / (d * d)) / (d * d);
        }
        double x = (Math.log(d) - uLo) / du;
        int k = Math.min((int) x, w.length - 2);
        double t = x - k;
        double t2 = t * t;
        double dwdu = ((6 * t2 - 6 * t) * (w[k] - w[k + 1])
                + (3 * t2 - 4 * t + 1) * du * g[k] + (3 * t2 - 2 * t) * du * g[k + 1]) / du;
        return dwdu / (d * d);
    }

    @Override
    public double lengthKpc() {
        return length;
    }

    /** Number of grid nodes (for tests and memory estimates). */
    public int nodeCount() {
        return w.length;
    }
}
