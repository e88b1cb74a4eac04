package org.holdfast.forces;

import java.util.Arrays;

import org.holdfast.halos.HaloProfile;
import org.holdfast.units.Units;

/**
 * The interaction energy of two rigid spherical halos at centre distance d, and its derivative,
 * by direct quadrature. The energy is W(d) = integral of dM_1(r) &lt;Phi_2&gt;(r, d), where the mean
 * of halo 2's potential over the sphere of radius r around halo 1's centre is
 * &lt;Phi_2&gt; = (Psi_2(d + r) - Psi_2(|d - r|)) / (2 r d), Psi_2(s) = integral_0^s Phi_2(s') s' ds'
 * (the shell average of a spherical potential, from writing the surface integral in the
 * distance s to the other centre; e.g. Binney &amp; Tremaine 2008, sec. 2.2.1, the same step as
 * in Newton's theorems). Differentiating under the integral gives dW/dd exactly, using
 * Psi_2'(s) = Phi_2(s) s.
 *
 * <p>The r integral runs in ln r with 8-point Gauss–Legendre panels at most 0.35 wide in ln r,
 * split at d, at both halos' lengths and edges; the innermost mass (below 1e-6 of the smaller
 * length) sees Phi_2(d), and for an untruncated halo 1 the mass beyond 1e6 lengths sees
 * -G M_2 / r (Newton's first theorem), both in closed form. Where one of r and d is below 1e-4 of
 * the other the shell mean is its Taylor series, Phi_2 + (x^2/6) 4 pi G rho_2 with x the smaller
 * (the mean of a function over a small sphere; Poisson's equation), which avoids cancellation.
 */
public final class InteractionIntegral {

    private static final double[] GL_X = {
        -0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
        0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363};
    private static final double[] GL_W = {
        0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
        0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763};
    private static final double MAX_PANEL = 0.35;

    private InteractionIntegral() {
    }

    /**
     * W(d) and dW/dd of halos 1 and 2 (masses included, kpc^2/Gyr^2 Msun and per kpc).
     *
     * @return {W, dW/dd}
     */
    public static double[] evaluate(HaloProfile h1, HaloProfile h2, double d) {
        double len1 = h1.lengthKpc();
        double rLo = 1e-6 * Math.min(d, len1);
        boolean finite1 = Double.isFinite(h1.extentKpc());
        double rHi = finite1 ? h1.extentKpc() : 1e6 * Math.max(d, Math.max(len1, reach(h2)));
        double[] cuts = breakpoints(h1, h2, d, rLo, rHi);
        double w = 0;
        double dw = 0;
        double cw = 0;
        double cdw = 0;
        for (int p = 0; p + 1 < cuts.length; p++) {
            double u0 = Math.log(cuts[p]);
            double u1 = Math.log(cuts[p + 1]);
            int pieces = Math.max(1, (int) Math.ceil((u1 - u0) / MAX_PANEL));
            double du = (u1 - u0) / pieces;
            for (int k = 0; k < pieces; k++) {
                double mid = u0 + (k + 0.5) * du;
                double pw = 0;
                double pdw = 0;
                for (int g = 0; g < GL_X.length; g++) {
                    double r = Math.exp(mid + 0.5 * du * GL_X[g]);
                    double dm = 4 * Math.PI * r * r * r * h1.density(r) * 0.5 * du * GL_W[g];
                    if (dm == 0) {
                        continue;
                    }
                    double mean = shellMean(h2, r, d);
                    pw += dm * mean;
                    pdw += dm * shellMeanSlope(h2, r, d, mean);
                }
                // Neumaier summation across panels
                double t = w + pw;
                cw += Math.abs(w) >= Math.abs(pw) ? (w - t) + pw : (pw - t) + w;
                w = t;
                double s = dw + pdw;
                cdw += Math.abs(dw) >= Math.abs(pdw) ? (dw - s) + pdw : (pdw - s) + dw;
                dw = s;
            }
        }
        double head = h1.enclosedMass(rLo);
        w += head * h2.potential(d);
        dw += head * Units.G * h2.enclosedMass(d) / (d * d);
        if (!finite1) {
            w += h2.mass() * (h1.potential(rHi) + Units.G * h1.enclosedMass(rHi) / rHi);
        }
        return new double[] {w + cw, dw + cdw};
    }

    private static double reach(HaloProfile h) {
        double e = h.extentKpc();
        return Double.isFinite(e) ? e : h.lengthKpc();
    }

    private static double[] breakpoints(HaloProfile h1, HaloProfile h2, double d, double rLo, double rHi) {
        double e2 = h2.extentKpc();
        double l2 = h2.lengthKpc();
        double[] base = {rLo, rHi, d, h1.lengthKpc(), h1.extentKpc(), Math.abs(d - e2), d + e2,
            Math.abs(d - l2), d + l2, l2};
        // a mesh graded toward r = d, where the shell touches halo 2's centre and its cusp
        double[] raw = Arrays.copyOf(base, base.length + 16);
        for (int k = 1; k <= 8; k++) {
            raw[base.length + 2 * k - 2] = d * (1 - Math.pow(10, -k));
            raw[base.length + 2 * k - 1] = d * (1 + Math.pow(10, -k));
        }
        double[] inside = Arrays.stream(raw).filter(r -> r >= rLo && r <= rHi && Double.isFinite(r)).sorted()
                .distinct().toArray();
        return inside;
    }

    /** Mean of halo 2's potential over a sphere of radius r whose centre is d from halo 2's. */
    static double shellMean(HaloProfile h2, double r, double d) {
        if (r < 1e-4 * d) {
            // Taylor series: the mean over a small sphere is Phi + r^2/6 laplacian(Phi) = Phi + r^2/6 4 pi G rho
            return h2.potential(d) + r * r / 6 * 4 * Math.PI * Units.G * h2.density(d);
        }
        if (d < 1e-4 * r) {
            // the same series in the offset d: the mean over a sphere of radius r about halo 2's centre is Phi_2(r)
            return h2.potential(r) + d * d / 6 * 4 * Math.PI * Units.G * h2.density(r);
        }
        return (h2.potentialMoment(d + r) - h2.potentialMoment(Math.abs(d - r))) / (2 * r * d);
    }

    /** d/dd of {@link #shellMean}. */
    static double shellMeanSlope(HaloProfile h2, double r, double d, double mean) {
        if (r < 1e-4 * d) {
            return Units.G * h2.enclosedMass(d) / (d * d);
        }
        if (d < 1e-4 * r) {
            return d / 3 * 4 * Math.PI * Units.G * h2.density(r);
        }
        double far = d + r;
        double near = Math.abs(d - r);
        double diff = h2.potential(far) * far - (near == 0 ? 0 : h2.potential(near) * (d - r));
        return diff / (2 * r * d) - mean / d;
    }
}
