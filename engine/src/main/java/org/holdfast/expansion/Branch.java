package org.holdfast.expansion;

import java.util.Locale;

import org.apache.commons.math3.ode.ContinuousOutputModel;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * A monotone piece of the expansion, parametrised by a variable sigma in which the time integral
 * has a smooth integrand: the elapsed time y(sigma) = &int; (dt/dsigma) dsigma is a pure
 * quadrature, done by the Dormand–Prince 8(5,3) integrator of Commons Math (Hairer, Norsett &amp;
 * Wanner 1993, Solving ODEs I, section II.5) with its dense output kept, and inverted by a
 * safeguarded Newton iteration. Being a quadrature and not an initial-value problem, the time
 * near either singularity keeps its relative accuracy.
 */
abstract class Branch implements FirstOrderDifferentialEquations {

    static final double REL_TOL = 1e-13;

    final Cosmology c;
    final double h0;
    private ContinuousOutputModel out;
    double lo = Double.NaN;
    double hi = Double.NaN;
    private double yLo;
    private double yHi;

    Branch(Cosmology c) {
        this.c = c;
        this.h0 = c.h0PerGyr();
    }

    /** dy/dsigma. */
    abstract double rate(double sigma);

    /** ln a at sigma. */
    abstract double lnA(double sigma);

    /** H at sigma, 1/Gyr. */
    abstract double hubble(double sigma);

    @Override
    public int getDimension() {
        return 1;
    }

    @Override
    public void computeDerivatives(double sigma, double[] y, double[] yDot) {
        yDot[0] = rate(sigma);
    }

    /** sqrt(E^2) at ln a, refusing H^2 &lt;= 0 with a clear message. */
    double e(double lnA) {
        double e2 = c.e2(lnA);
        if (!(e2 > 0) || Double.isInfinite(e2)) {
            throw new InvalidCosmologyException("cosmology", String.format(Locale.ROOT,
                    "H^2 = %.4g H0^2 at a = %.6g: the expansion is not defined there", e2, Math.exp(lnA)));
        }
        return Math.sqrt(e2);
    }

    /** Integrates y from sigma = from (where y = y0) to sigma = to, or until stop fires; appends. */
    void integrate(double from, double y0, double to, double absTol, EventHandler stop) {
        double span = Math.abs(to - from);
        DormandPrince853Integrator ig = new DormandPrince853Integrator(0.0, span, absTol, REL_TOL);
        ContinuousOutputModel part = new ContinuousOutputModel();
        ig.addStepHandler(part);
        if (stop != null) {
            ig.addEventHandler(stop, span / 64, 1e-12 * Math.max(1, span), 1000);
        }
        double[] y = {y0};
        double end = ig.integrate(this, from, y, to, y);
        if (out == null) {
            out = part;
        } else {
            out.append(part);
        }
        double a = out.getInitialTime();
        lo = Math.min(a, end);
        hi = Math.max(a, end);
        yLo = y(lo);
        yHi = y(hi);
    }

    /** y at sigma, from the dense output. */
    double y(double sigma) {
        out.setInterpolatedTime(sigma);
        return out.getInterpolatedState()[0];
    }

    /**
     * The sigma where y = target, by Newton's method kept inside a bracket (bisection when a
     * step would leave it).
     */
    double solve(double target, double guess) {
        double a = lo;
        double b = hi;
        double fa = yLo - target;
        double fb = yHi - target;
        if (fa == 0) {
            return a;
        }
        if (fb == 0) {
            return b;
        }
        if (fa * fb > 0) {
            double near = Math.abs(fa) < Math.abs(fb) ? a : b;
            if (Math.min(Math.abs(fa), Math.abs(fb)) <= 1e-12 * Math.abs(target)) {
                return near;
            }
            throw new IllegalStateException(String.format(Locale.ROOT,
                    "expansion table: time %.17g outside the integrated branch", target));
        }
        double x = guess >= a && guess <= b ? guess : 0.5 * (a + b);
        for (int it = 0; it < 200; it++) {
            double f = y(x) - target;
            if (f == 0) {
                return x;
            }
            if ((f < 0) == (fa < 0)) {
                a = x;
                fa = f;
            } else {
                b = x;
            }
            double next = x - f / rate(x);
            if (!(next > Math.min(a, b) && next < Math.max(a, b))) {
                next = 0.5 * (a + b);
            }
            double dx = Math.abs(next - x);
            x = next;
            if (dx <= 4e-16 * Math.abs(x) || Math.abs(b - a) <= 4e-16 * Math.abs(x) || dx == 0) {
                return x;
            }
        }
        return x;
    }

    /** From the Big Bang: sigma = sqrt(a), y = t - t_BB; dt/ds = 2/(s H). */
    static final class Early extends Branch {
        Early(Cosmology c) {
            super(c);
        }

        @Override
        double rate(double s) {
            return 2.0 / (s * h0 * e(2 * Math.log(s)));
        }

        @Override
        double lnA(double s) {
            return 2 * Math.log(s);
        }

        @Override
        double hubble(double s) {
            return h0 * e(2 * Math.log(s));
        }
    }

    /** Expanding: sigma = ln a, y = t - t_BB; dt/d ln a = 1/H. */
    static final class Expanding extends Branch {
        Expanding(Cosmology c) {
            super(c);
        }

        @Override
        double rate(double lnA) {
            return 1.0 / (h0 * e(lnA));
        }

        @Override
        double lnA(double lnA) {
            return lnA;
        }

        @Override
        double hubble(double lnA) {
            return h0 * e(lnA);
        }
    }

    /** Towards a big rip: sigma = ln a, y = t_rip - t; dy/d ln a = -1/H. */
    static final class ToRip extends Branch {
        ToRip(Cosmology c) {
            super(c);
        }

        @Override
        double rate(double lnA) {
            return -1.0 / (h0 * e(lnA));
        }

        @Override
        double lnA(double lnA) {
            return lnA;
        }

        @Override
        double hubble(double lnA) {
            return h0 * e(lnA);
        }
    }

    /**
     * Up to a turnaround at a_max: a = a_max (1 - y^2), y = t - t_BB. With P(a) = a^4 E^2 and
     * P(a_max) = 0, sqrt(P) ~ y sqrt(-P'(a_max) a_max), so dt/dy stays finite at the turnaround.
     * Below y = 0.01, where computing P directly would lose digits to cancellation, P/y^2 comes
     * from its Taylor series about a_max to third order (truncation error y^6 &lt; 1e-12).
     */
    static final class Turnaround extends Branch {
        private static final double SMALL = 1e-2;
        private final double aMax;
        private final double lnAMax;
        private final double p1;
        private final double p2;
        private final double p3;

        Turnaround(Cosmology c, double aMax) {
            super(c);
            this.aMax = aMax;
            this.lnAMax = Math.log(aMax);
            DarkEnergyModel de = c.darkEnergy();
            double w = de.w(aMax);
            double w1 = de.dwda(aMax);
            double w2 = de.d2wda2(aMax);
            double f = c.omegaDe() == 0 ? 0 : c.omegaDe() * Math.exp(de.lnDensityRatio(lnAMax));
            double a = aMax;
            // D = Omega_de a^4 f(a) and its derivatives, from d ln f / d ln a = -3 (1 + w)
            double d1 = a * a * a * f * (1 - 3 * w);
            double z = -3 * w * (1 - 3 * w) - 3 * a * w1;
            double d2 = a * a * f * z;
            double z1 = w1 * (-6 + 18 * w) - 3 * a * w2;
            double d3 = a * f * ((-1 - 3 * w) * z + a * z1);
            double dP = c.omegaM() + 2 * c.omegaK() * a + d1;
            if (!(dP < 0)) {
                throw new InvalidCosmologyException("cosmology", String.format(Locale.ROOT,
                        "H^2 touches 0 at a = %.6g without turning the expansion around", aMax));
            }
            // P / y^2 = -P1 a + P2 a^2 y^2 / 2 - P3 a^3 y^4 / 6, Pn the n-th derivative at a_max
            this.p1 = -dP * a;
            this.p2 = 0.5 * (2 * c.omegaK() + d2) * a * a;
            this.p3 = -d3 * a * a * a / 6;
        }

        /** sqrt(P(a)) / y. */
        private double rootOverY(double y) {
            if (y < SMALL) {
                double y2 = y * y;
                return Math.sqrt(p1 + y2 * (p2 + y2 * p3));
            }
            double l = lnA(y);
            double a2 = Math.exp(2 * l);
            return a2 * e(l) / y;
        }

        @Override
        double rate(double y) {
            double a = aMax * (1 - y * y);
            return -2 * aMax * a / (h0 * rootOverY(y));
        }

        @Override
        double lnA(double y) {
            return lnAMax + Math.log1p(-y * y);
        }

        @Override
        double hubble(double y) {
            double l = lnA(y);
            return h0 * y * rootOverY(y) / Math.exp(2 * l);
        }
    }
}
