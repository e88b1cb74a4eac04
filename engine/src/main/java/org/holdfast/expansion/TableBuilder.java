package org.holdfast.expansion;

import java.util.Locale;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Solves a {@link Cosmology} into an {@link ExpansionTable}. The landmarks come first: a scan of
 * H^2 back to a = 1e-12 (no bounce allowed) and forward to a = e^600 (a turnaround located by
 * Brent's method; a big rip when phantom dark energy dominates there). Then the elapsed time is
 * integrated as a quadrature on each branch ({@link Branch}) and the table nodes are laid out
 * uniformly in the segment variables of {@link Segment}. Every interval is checked at its
 * midpoint against the quadrature; where ln a, H or k is off by more than 2e-11 (relative),
 * the segment's spacing is halved and it is built again, as long as halving still gains at
 * least a factor 8 (a w(a) table whose spline has kinks converges more slowly; it then keeps
 * the spacing where the gain stalled).
 */
final class TableBuilder {

    /** How the table is laid out. */
    record Options(double horizonGyr, double stepScale, boolean refine) {
        static Options standard(double horizonGyr) {
            return new Options(horizonGyr, 1.0, true);
        }
    }

    static final double A_START = 1e-12;
    static final double A_SWITCH = 0.5;
    static final double FIRST_TAU_GYR = 1e-5;
    static final double EARLY_STEP = 0.05;
    static final double MID_STEP_HUBBLE = 0.01;
    static final double LATE_STEP = 0.05;
    static final double RIP_MARGIN = 1e-7;
    static final double LN_A_CAP = 600;
    static final double LN_RHO_CAP = 500;
    static final double SCAN_STEP = 0.05;
    static final double TOL = 2e-11;
    static final int MAX_INTERVALS = 1 << 18;

    private final Cosmology c;
    private final Options options;
    private final double h0;
    private double lCap;
    private double lMax = Double.NaN;
    private boolean rip;
    private double age;

    TableBuilder(Cosmology c, Options options) {
        if (!(options.horizonGyr() > 0) || Double.isInfinite(options.horizonGyr())) {
            throw new InvalidCosmologyException("horizon", "the far-future horizon must be a positive number of Gyr");
        }
        this.c = c;
        this.options = options;
        this.h0 = c.h0PerGyr();
    }

    ExpansionTable build() {
        scanPast();
        scanFuture();
        boolean recollapse = !Double.isNaN(lMax);
        double aMax = recollapse ? Math.exp(lMax) : Double.NaN;

        Branch.ToRip toRip = null;
        double tRip = Double.NaN;
        if (rip) {
            toRip = new Branch.ToRip(c);
            double tail = ripTail(lCap);
            toRip.integrate(lCap, tail, 0.0, Math.max(1e-300, 1e-13 * tail), null);
            tRip = toRip.y(0.0);
        }

        Branch.Early early = new Branch.Early(c);
        double tau0 = leadingTau(A_START);
        double s1 = Math.sqrt(A_SWITCH);
        early.integrate(Math.sqrt(A_START), tau0, s1, 1e-13 * tau0, null);
        double tau1 = early.y(s1);

        Branch midBranch;
        double tMidEnd;
        double tMax = Double.NaN;
        if (recollapse) {
            Branch.Turnaround y = new Branch.Turnaround(c, aMax);
            y.integrate(Math.sqrt(1 - A_SWITCH / aMax), tau1, 0.0, 1e-14 * tau1, null);
            age = y.y(Math.sqrt(1 - 1 / aMax));
            tMax = y.y(0.0) - age;
            tMidEnd = tMax;
            midBranch = y;
        } else {
            Branch.Expanding x = new Branch.Expanding(c);
            x.integrate(Math.log(A_SWITCH), tau1, 0.0, 1e-14 * tau1, null);
            age = x.y(0.0);
            double target = rip ? Math.min(options.horizonGyr(), 0.5 * tRip) : options.horizonGyr();
            double tauStop = (age + target) * (1 + 1e-9) + 1e-9;
            x.integrate(0.0, age, lCap, 1e-14 * age, stopAt(tauStop));
            tMidEnd = Math.min(target, x.y(x.hi) - age);
            midBranch = x;
        }
        double tBB = -age;
        double tauMin = Math.min(FIRST_TAU_GYR, 1e-6 * age);
        double earliest = tBB + tauMin;
        double t1 = tau1 - age;

        double scale = options.stepScale();
        Segment earlySeg = segment(Segment.EARLY, early, Math.log(tauMin), Math.log(tau1), EARLY_STEP * scale);
        Segment midSeg = segment(Segment.MID, midBranch, t1, tMidEnd, MID_STEP_HUBBLE / h0 * scale);
        Segment lateSeg = null;
        double latest = tMidEnd;
        if (recollapse) {
            latest = 2 * tMax - earliest;
        } else if (rip) {
            double rhoStart = tRip - tMidEnd;
            double rhoEnd = Math.max(RIP_MARGIN * (tRip - tBB),
                    Math.max(tRip - options.horizonGyr(), toRip.y(lCap) * (1 + 1e-9)));
            if (rhoEnd < rhoStart) {
                lateSeg = segment(Segment.LATE, toRip, -Math.log(rhoStart), -Math.log(rhoEnd), LATE_STEP * scale);
                latest = tRip - rhoEnd;
            }
        }
        return new ExpansionTable(c, earlySeg, midSeg, lateSeg, tBB, tRip, tMax, aMax, earliest, latest,
                options.horizonGyr());
    }

    // ---- landmarks ----------------------------------------------------------------------------

    private void scanPast() {
        double lStart = Math.log(A_START);
        for (double l = 0; l >= lStart; l -= SCAN_STEP) {
            double e2 = c.e2(l);
            if (Double.isNaN(e2) || Double.isInfinite(e2)) {
                throw new InvalidCosmologyException("cosmology", String.format(Locale.ROOT,
                        "H^2 is not a finite number at a = %.4g: check the dark-energy parameters", Math.exp(l)));
            }
            if (!(e2 > 0)) {
                double a = Math.exp(l);
                throw new InvalidCosmologyException("cosmology", String.format(Locale.ROOT,
                        "no Big Bang: going back in time H^2 falls to 0 near a = %.4g (z = %.4g), so this universe"
                        + " bounced instead of expanding from a = 0; holdfast needs a Big Bang in the past", a, 1 / a - 1));
            }
        }
    }

    private void scanFuture() {
        double de = c.omegaDe();
        double lnDe = de == 0 ? Double.NEGATIVE_INFINITY : Math.log(Math.abs(de));
        double prev = 0;
        lCap = LN_A_CAP;
        for (double l = SCAN_STEP; l <= LN_A_CAP; l += SCAN_STEP) {
            double lnRho = lnDe + c.darkEnergy().lnDensityRatio(l);
            if (de > 0 && lnRho > LN_RHO_CAP) {
                lCap = prev;
                break;
            }
            double scaled = scaledE2(l);
            if (Double.isNaN(scaled)) {
                throw new InvalidCosmologyException("cosmology", String.format(Locale.ROOT,
                        "H^2 is not a finite number at a = %.4g: check the dark-energy parameters", Math.exp(l)));
            }
            if (!(scaled > 0)) {
                lMax = new BrentSolver(1e-15, 1e-16).solve(500, this::scaledE2, prev, l);
                return;
            }
            prev = l;
        }
        rip = de > 0 && logSlopeOfH(lCap) > 0;
    }

    /**
     * a^n E^2 with n = 3 (or 4 without matter): the same sign as H^2 but free of underflow
     * where the matter term dominates the far future.
     */
    private double scaledE2(double l) {
        int n = c.omegaM() > 0 ? 3 : 4;
        double s = c.omegaM() > 0 ? c.omegaM() : c.omegaR();
        if (n == 3 && c.omegaR() != 0) {
            s += c.omegaR() * Math.exp(-l);
        }
        if (c.omegaK() != 0) {
            s += c.omegaK() * Math.exp((n - 2) * l);
        }
        if (c.omegaDe() != 0) {
            s += c.omegaDe() * Math.exp(c.darkEnergy().lnDensityRatio(l) + n * l);
        }
        return s;
    }

    /** d ln H / d ln a. */
    private double logSlopeOfH(double l) {
        double m = c.omegaM() * Math.exp(-3 * l);
        double r = c.omegaR() * Math.exp(-4 * l);
        double k = c.omegaK() * Math.exp(-2 * l);
        double f = c.omegaDe() * Math.exp(c.darkEnergy().lnDensityRatio(l));
        double w = c.darkEnergy().w(Math.exp(l));
        return 0.5 * (-3 * m - 4 * r - 2 * k - 3 * (1 + w) * f) / (m + r + k + f);
    }

    /**
     * Time left to the rip from ln a = l, where H grows as a power a^p of the scale factor:
     * &int; da/(a H) from a to infinity = 1/(p H(a)). Exact once the dark energy has constant w
     * and dominates, as it does here (a &gt;= e^(l) with rho_de e^500 times rho_crit).
     */
    private double ripTail(double l) {
        return 1.0 / (logSlopeOfH(l) * h0 * Math.sqrt(c.e2(l)));
    }

    /** t - t_BB at a tiny a, from radiation and matter (dark energy and curvature negligible there). */
    private double leadingTau(double a) {
        double r = c.omegaR();
        double m = c.omegaM();
        if (!(m > 0)) {
            return a * a / (2 * h0 * Math.sqrt(r));
        }
        // The integral of da / (a H) from 0 with H^2 = H0^2 (Or a^-4 + Om a^-3), worked out here
        // (common practice): t = 2/(3 H0 Om^2) [(x - 2 Or) sqrt(x + Or) + 2 Or^1.5], x = Om a, written
        // as (s - sr)^2 (s + 2 sr) with s = sqrt(x + Or), sr = sqrt(Or), s - sr = x / (s + sr), which
        // has no cancellation for any Or >= 0 (the radiation-only form overflowed for omega_r = 1e-308).
        double x = m * a;
        double s = Math.sqrt(x + r);
        double sr = Math.sqrt(r);
        double d = a / (s + sr); // (s - sr) / Om
        return 2.0 / (3 * h0) * d * d * (s + 2 * sr);
    }

    private static EventHandler stopAt(double yStop) {
        return new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return y[0] - yStop;
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                return Action.STOP;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        };
    }

    // ---- table layout ---------------------------------------------------------------------------

    private Segment segment(int kind, Branch b, double u0, double u1, double step) {
        int n = (int) Math.min(MAX_INTERVALS, Math.max(2, Math.ceil((u1 - u0) / step)));
        double previous = Double.POSITIVE_INFINITY;
        while (true) {
            Segment seg = new Segment(kind, u0, u1, n);
            double[] nodes = new double[(n + 1) * Segment.NODE];
            double[] sigma = new double[n + 1];
            double guess = Double.NaN;
            for (int i = 0; i <= n; i++) {
                sigma[i] = node(kind, b, seg.node(i), guess, nodes, i * Segment.NODE);
                guess = sigma[i];
            }
            seg.fill(nodes);
            if (!options.refine() || 2L * n > MAX_INTERVALS) {
                return seg;
            }
            double err = worstMidpointError(seg, b, sigma);
            // Stop when the error is small, or when halving gains less than third order: then the
            // input itself is not smooth (a w(a) table's spline has kinks in its derivatives at
            // the knots and ends) and more nodes would buy little.
            if (err <= TOL || err > previous / 8) {
                return seg;
            }
            previous = err;
            n *= 2;
        }
    }

    private double worstMidpointError(Segment seg, Branch b, double[] sigma) {
        double[] exact = new double[Segment.NODE];
        double kScale = 1e-3 * h0 * h0 * Math.abs(c.omegaDe());
        double worst = 0;
        for (int i = 0; i < seg.intervals; i++) {
            node(seg.kind, b, seg.u0 + (i + 0.5) * seg.h, 0.5 * (sigma[i] + sigma[i + 1]), exact, 0);
            double eL = Math.abs(Segment.value(seg.lnA, i, 0.5) - exact[0]);
            double eH = Math.abs(Segment.value(seg.hub, i, 0.5) - exact[3]) / Math.max(Math.abs(exact[3]), 1e-3 * h0);
            double eK = kScale == 0 ? 0
                    : Math.abs(Segment.value(seg.k, i, 0.5) - exact[6]) / Math.max(Math.abs(exact[6]), kScale);
            worst = Math.max(worst, Math.max(eL, Math.max(eH, eK)));
        }
        return worst;
    }

    /** Fills the NODE values of the node at u; returns its sigma on the branch. */
    private double node(int kind, Branch b, double u, double guess, double[] out, int off) {
        double target;
        double dtdu;
        double d2tdu2;
        if (kind == Segment.EARLY) {
            target = Math.exp(u);
            dtdu = target;
            d2tdu2 = target;
        } else if (kind == Segment.MID) {
            target = u + age;
            dtdu = 1;
            d2tdu2 = 0;
        } else {
            target = Math.exp(-u);
            dtdu = target;
            d2tdu2 = -target;
        }
        double sigma = b.solve(target, guess);
        physics(b.lnA(sigma), b.hubble(sigma), dtdu, d2tdu2, out, off);
        return sigma;
    }

    /**
     * L = ln a, H and k with their first two time derivatives, all in closed form from a and H:
     * dL/dt = H, dH/dt = a''/a - H^2, k = -(H0^2/2) Omega_de f (1 + 3w), d/dt = H d/dL. Turned
     * into u-derivatives with dt/du and d^2t/du^2.
     */
    private void physics(double l, double hub, double dtdu, double d2tdu2, double[] out, int off) {
        double a = Math.exp(l);
        double q = 0.5 * h0 * h0;
        double m = c.omegaM() == 0 ? 0 : c.omegaM() * Math.exp(-3 * l);
        double r = c.omegaR() == 0 ? 0 : c.omegaR() * Math.exp(-4 * l);
        double kk = 0;
        double kL = 0;
        double kLL = 0;
        if (c.omegaDe() != 0) {
            DarkEnergyModel de = c.darkEnergy();
            double w = de.w(a);
            double w1 = a * de.dwda(a);
            double w2 = a * a * de.d2wda2(a);
            double f = c.omegaDe() * Math.exp(de.lnDensityRatio(l));
            double g = -3 * (1 + w) * (1 + 3 * w) + 3 * w1;
            double gL = w1 * (-9 - 18 * w) + 3 * w2;
            kk = -q * f * (1 + 3 * w);
            kL = -q * f * g;
            kLL = -q * f * (-3 * (1 + w) * g + gL);
        }
        double acc = -q * (m + 2 * r) + kk;
        double accL = -q * (-3 * m - 8 * r) + kL;
        double hDot = acc - hub * hub;
        double hDdot = hub * accL - 2 * hub * hDot;
        double kDot = hub * kL;
        double kDdot = hDot * kL + hub * hub * kLL;
        double d2 = dtdu * dtdu;
        out[off] = l;
        out[off + 1] = hub * dtdu;
        out[off + 2] = hDot * d2 + hub * d2tdu2;
        out[off + 3] = hub;
        out[off + 4] = hDot * dtdu;
        out[off + 5] = hDdot * d2 + hDot * d2tdu2;
        out[off + 6] = kk;
        out[off + 7] = kDot * dtdu;
        out[off + 8] = kDdot * d2 + kDot * d2tdu2;
    }
}
