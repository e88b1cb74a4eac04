package org.holdfast.integrators;

/**
 * IAS15 (Rein &amp; Spiegel 2015, MNRAS 446, 1424): a 15th-order implicit integrator for
 * x'' = f(t, x, x') on Gauss–Radau spacings (Everhart 1985), with the acceleration over a step
 * written as a polynomial a(s) = a0 + b0 s + ... + b6 s^7 (s = fraction of the step, eq. 4),
 * its coefficients found by a predictor–corrector iteration run until they stop changing at
 * round-off (sec. 2.4; a velocity-dependent force such as dynamical friction is evaluated at the
 * predicted velocities, sec. 2.5), and its own step control: the next step is
 * h (epsilon / e_b)^(1/7), e_b = max|b6| / max|a| (eq. 11–12), a step is redone when that falls
 * below a quarter of the step just taken. Positions, velocities and the clock are updated with
 * compensated summation (sec. 2.3), so the error stays at round-off (Brouwer's law).
 *
 * <p>Every step leaves its polynomial behind: {@link #sample} gives positions and velocities
 * anywhere inside the last step to the order of the scheme ({@link DenseOutput}). The extra
 * rates of the system are integrated with the Radau quadrature on the same nodes (exact for
 * polynomials of degree 14), from the values of the last iteration.
 *
 * <p>Nothing is allocated per step. Arrays are sized for the largest system at construction;
 * {@link #reset} may shrink the system (after a merger).
 */
public final class Ias15 implements DenseOutput {

    /** Gauss–Radau spacings on [0, 1] (Everhart 1985; Rein &amp; Spiegel 2015, table 1). */
    static final double[] NODES = {0.0, 0.0562625605369221464656521910318, 0.180240691736892364987579942780,
        0.352624717113169637373907769648, 0.547153626330555383001448554766, 0.734210177215410531523210605558,
        0.885320946839095768090359771030, 0.977520613561287501891174488626};
    /** Default step-control parameter (Rein &amp; Spiegel 2015, sec. 3.2). */
    public static final double DEFAULT_EPSILON = 1e-9;
    private static final double SAFETY = 0.25;
    private static final double PC_EPSILON = 1e-16;
    private static final int PC_MAX = 12;
    private static final int MAX_REJECTIONS = 60;
    /** C[k][m]: coefficient of s^(m+1) in s (s - h1) ... (s - h_(k-1)): Newton to power basis. */
    private static final double[][] C = new double[8][7];
    /** D[k][m]: divided difference of s^(m+1) on h0..hk: power to Newton basis. */
    private static final double[][] D = new double[8][7];
    /** Sum over the nodes of |1 / prod (h_k - h_j)|: how much b6 amplifies noise in the accelerations. */
    private static final double B6_GAIN = b6Gain();
    /** Radau quadrature weights on the nodes, for the integral over [0, 1]. */
    static final double[] WEIGHTS = radauWeights();
    private static final double[] X_DIV = {6, 12, 20, 30, 42, 56, 72};
    private static final double[] V_DIV = {2, 3, 4, 5, 6, 7, 8};

    static {
        for (int k = 1; k < 8; k++) {
            double[] p = {1};
            for (int j = 0; j < k; j++) {
                double[] q = new double[p.length + 1];
                for (int d = 0; d < p.length; d++) {
                    q[d + 1] += p[d];
                    q[d] -= NODES[j] * p[d];
                }
                p = q;
            }
            for (int m = 0; m < k; m++) {
                C[k][m] = p[m + 1];
            }
        }
        // complete homogeneous symmetric polynomials: h_d(x0..xk) = h_d(x0..x(k-1)) + xk h_(d-1)(x0..xk)
        double[][] hs = new double[8][8];
        for (int k = 0; k < 8; k++) {
            hs[k][0] = 1;
            for (int d = 1; d < 8; d++) {
                hs[k][d] = (k > 0 ? hs[k - 1][d] : 0) + NODES[k] * hs[k][d - 1];
            }
        }
        for (int k = 1; k < 8; k++) {
            for (int m = k - 1; m < 7; m++) {
                D[k][m] = hs[k][m + 1 - k];
            }
        }
    }

    private final int capacity;
    private final int rateCount;
    private final double epsilon;
    private int n;
    private double t;
    private double tc;
    private final double[] x;
    private final double[] v;
    private final double[] csx;
    private final double[] csv;
    private final double[] x0;
    private final double[] v0;
    private final double[] a0;
    private final double[] xs;
    private final double[] vs;
    private final double[] as;
    private final double[] b;
    private final double[] g;
    private final double[] e;
    private final double[] bDense;
    private final double[] nodeRates;
    private final double[] q;
    private final double[] rateScratch;
    private final double[] qc;
    private double t0;
    private double hDone;
    private double hNext;
    private boolean haveB;
    private boolean haveE;
    private long evaluations;
    private long rejections;

    /**
     * @param capacity the most coordinates the system will have
     * @param rateCount the system's extra rates
     * @param epsilon the step-control parameter; 0 or NaN for fixed steps (no control)
     */
    public Ias15(int capacity, int rateCount, double epsilon) {
        this.capacity = capacity;
        this.rateCount = rateCount;
        this.epsilon = epsilon > 0 ? epsilon : 0;
        x = new double[capacity];
        v = new double[capacity];
        csx = new double[capacity];
        csv = new double[capacity];
        x0 = new double[capacity];
        v0 = new double[capacity];
        a0 = new double[capacity];
        xs = new double[capacity];
        vs = new double[capacity];
        as = new double[capacity];
        b = new double[7 * capacity];
        g = new double[8 * capacity];
        e = new double[7 * capacity];
        bDense = new double[7 * capacity];
        nodeRates = new double[8 * Math.max(rateCount, 1)];
        rateScratch = new double[Math.max(rateCount, 1)];
        q = new double[Math.max(rateCount, 1)];
        qc = new double[Math.max(rateCount, 1)];
    }

    /**
     * Starts (or restarts, after the state was changed from outside) from time t with n
     * coordinates x and velocities v; forgets the acceleration polynomial of the last step.
     */
    public void reset(double time, int size, double[] pos, double[] vel) {
        if (size > capacity) {
            throw new IllegalArgumentException(size + " coordinates, capacity " + capacity);
        }
        n = size;
        t = time;
        tc = 0;
        System.arraycopy(pos, 0, x, 0, size);
        System.arraycopy(vel, 0, v, 0, size);
        java.util.Arrays.fill(csx, 0);
        java.util.Arrays.fill(csv, 0);
        haveB = false;
        haveE = false;
        t0 = time;
        hDone = 0;
    }

    /** Sets the next step to try (signed like the direction of the run). */
    public void setNextStep(double h) {
        hNext = h;
    }

    /** The step the controller proposes next (signed). */
    public double nextStep() {
        return hNext;
    }

    /** Current time. */
    public double time() {
        return t + tc;
    }

    /** Current positions (live; length at least the size). */
    public double[] positions() {
        return x;
    }

    /** Current velocities (live). */
    public double[] velocities() {
        return v;
    }

    /** The integrated extra quantities since construction (live; one per rate). */
    public double[] integrals() {
        return q;
    }

    /** Force evaluations so far. */
    public long evaluations() {
        return evaluations;
    }

    /** Steps redone with a smaller step so far. */
    public long rejections() {
        return rejections;
    }

    /**
     * Takes one step, at most |limit| long (signed like limit): the controller's proposal, or
     * the fixed step limit itself without step control. Returns the step taken.
     */
    public double step(SecondOrderSystem s, double limit) {
        int len = n;
        s.evaluate(t + tc, x, v, a0, rateScratch);
        evaluations++;
        if (rateCount > 0) {
            System.arraycopy(rateScratch, 0, nodeRates, 0, rateCount);
        }
        System.arraycopy(x, 0, x0, 0, len);
        System.arraycopy(v, 0, v0, 0, len);
        double h = epsilon == 0 || hNext == 0 || Math.signum(hNext) != Math.signum(limit)
                || Math.abs(hNext) > Math.abs(limit) ? limit : hNext;
        if (!haveB) {
            java.util.Arrays.fill(b, 0, 7 * capacity, 0);
        }
        double hNew;
        double ebRejected = Double.NaN;
        while (true) {
            newtonFromPower(len);
            double amax = iterate(s, h, len);
            hNew = proposal(h, amax, len);
            if (epsilon == 0 || Math.abs(hNew) >= SAFETY * Math.abs(h) || !Double.isFinite(hNew) || hNew == 0
                    || rejectedInARow >= MAX_REJECTIONS) {
                break;
            }
            // a redone step at least four times shorter should see its b6 fall by 4^7; where it barely
            // falls, the estimate is the round-off of the forces (a time-dependent force whose
            // argument has lost digits, as k(t) close to a rip): shorter steps would not help
            if (!Double.isNaN(ebRejected) && lastEb > 0.1 * ebRejected) {
                hNew = h;
                break;
            }
            ebRejected = lastEb;
            rejectedInARow++;
            rejections++;
            rescale(hNew / h, len);
            haveE = false;
            h = hNew;
        }
        rejectedInARow = 0;
        accept(h, len);
        hNext = epsilon == 0 ? h : Math.copySign(Math.min(Math.abs(hNew), Math.abs(h) / SAFETY), h);
        if (!Double.isFinite(hNext) || hNext == 0) {
            hNext = h;
        }
        predict(hNext / h, len);
        return h;
    }

    private int rejectedInARow;
    private double lastEb;
    /** The predictor-corrector's last relative correction of b6 when it stalled above round-off; 0 if it converged. */
    private double noise;
    /** An error estimate within this factor of the stalled corrections is taken for noise. */
    private static final double NOISE_FACTOR = 10;

    /** g = D b: the Newton coefficients of the current polynomial. */
    private void newtonFromPower(int len) {
        for (int k = 1; k < 8; k++) {
            int gk = k * capacity;
            for (int i = 0; i < len; i++) {
                double sum = 0;
                for (int m = k - 1; m < 7; m++) {
                    sum += D[k][m] * b[m * capacity + i];
                }
                g[gk + i] = sum;
            }
        }
    }

    /** The predictor–corrector iteration; returns max |a| at the last node. */
    private double iterate(SecondOrderSystem s, double h, int len) {
        double err = 2;
        double errLast = 3;
        double amax = 0;
        noise = 0;
        for (int it = 0; it < PC_MAX; it++) {
            if (err < PC_EPSILON) {
                break;
            }
            if (it > 2 && err >= errLast) {
                // the corrections stopped shrinking: b6 is known only to about their size
                noise = Math.max(err, errLast);
                break;
            }
            errLast = err;
            double dmax = 0;
            for (int sub = 1; sub < 8; sub++) {
                double sn = NODES[sub];
                predictAt(sn, h, len);
                s.evaluate(t + (tc + sn * h), xs, vs, as, rateSlot(sub));
                evaluations++;
                dmax = correct(sub, sn, len);
            }
            amax = maxAbs(as, len);
            err = amax > 0 ? dmax / amax : (dmax > 0 ? 1 : 0);
            if (it == PC_MAX - 1 && err >= PC_EPSILON) {
                noise = err;
            }
        }
        return amax;
    }

    /** Where the system writes the rates of node sub (copied into nodeRates by {@link #correct}). */
    private double[] rateSlot(int sub) {
        currentSlot = sub;
        return rateScratch;
    }

    private int currentSlot;

    /** Positions and velocities at fraction sn of the step from the current polynomial. */
    private void predictAt(double sn, double h, int len) {
        double hs = h * sn;
        for (int i = 0; i < len; i++) {
            double px = b[6 * capacity + i] / X_DIV[6];
            double pv = b[6 * capacity + i] / V_DIV[6];
            for (int m = 5; m >= 0; m--) {
                px = px * sn + b[m * capacity + i] / X_DIV[m];
                pv = pv * sn + b[m * capacity + i] / V_DIV[m];
            }
            xs[i] = x0[i] + hs * (v0[i] + hs * (0.5 * a0[i] + sn * px));
            vs[i] = v0[i] + hs * (a0[i] + sn * pv);
        }
    }

    /** Updates g_sub and b from the new acceleration at node sub; returns max |change of b6|. */
    private double correct(int sub, double sn, int len) {
        if (rateCount > 0) {
            System.arraycopy(rateScratch, 0, nodeRates, currentSlot * rateCount, rateCount);
        }
        double dmax = 0;
        double[] c = C[sub];
        for (int i = 0; i < len; i++) {
            double tmp = (as[i] - a0[i]) / sn;
            for (int j = 1; j < sub; j++) {
                tmp = (tmp - g[j * capacity + i]) / (sn - NODES[j]);
            }
            int gi = sub * capacity + i;
            double delta = tmp - g[gi];
            g[gi] = tmp;
            for (int m = 0; m < sub; m++) {
                b[m * capacity + i] += c[m] * delta;
            }
            if (sub == 7) {
                dmax = Math.max(dmax, Math.abs(delta));
            }
        }
        return dmax;
    }

    /** The controller's next step from this step's b6 (eq. 11–12 of Rein &amp; Spiegel 2015). */
    private double proposal(double h, double amax, int len) {
        if (epsilon == 0) {
            return h;
        }
        double b6 = 0;
        for (int i = 0; i < len; i++) {
            b6 = Math.max(b6, Math.abs(b[6 * capacity + i]));
        }
        if (!(amax > 0) || !Double.isFinite(b6)) {
            return Double.isFinite(b6) ? h / SAFETY : h * SAFETY * SAFETY;
        }
        double eb = b6 / amax;
        lastEb = eb;
        if (eb == 0) {
            return h / SAFETY;
        }
        double b0 = 0;
        for (int i = 0; i < len; i++) {
            b0 = Math.max(b0, Math.abs(b[i]));
        }
        // round-off of the forces: their own (2^-52) and that of the clock, |da/dt| ulp(t) with
        // da/dt about b0 / h, carried to b6 by the seventh divided difference (gain B6_GAIN)
        double floor = B6_GAIN * (0x1p-52 + Math.ulp(t) * b0 / (Math.abs(h) * amax));
        double proposed = h * Math.pow(epsilon / eb, 1.0 / 7);
        if (eb <= NOISE_FACTOR * Math.max(noise, floor) && Math.abs(proposed) < Math.abs(h)) {
            // the estimate is within the forces' round-off: it cannot ask for a shorter step
            return h;
        }
        return proposed;
    }

    /** The same polynomial over a step ratio times as long: b_m scales with ratio^(m+1). */
    private void rescale(double ratio, int len) {
        double f = ratio;
        for (int m = 0; m < 7; m++) {
            for (int i = 0; i < len; i++) {
                b[m * capacity + i] *= f;
            }
            f *= ratio;
        }
    }

    private void accept(double h, int len) {
        for (int i = 0; i < len; i++) {
            double px = 0;
            double pv = 0;
            for (int m = 6; m >= 0; m--) {
                px += b[m * capacity + i] / X_DIV[m];
                pv += b[m * capacity + i] / V_DIV[m];
            }
            double dx = h * (v0[i] + h * (0.5 * a0[i] + px));
            double dv = h * (a0[i] + pv);
            double y = dx - csx[i];
            double sum = x[i] + y;
            csx[i] = (sum - x[i]) - y;
            x[i] = sum;
            y = dv - csv[i];
            sum = v[i] + y;
            csv[i] = (sum - v[i]) - y;
            v[i] = sum;
        }
        for (int r = 0; r < rateCount; r++) {
            double sum = 0;
            for (int k = 0; k < 8; k++) {
                sum += WEIGHTS[k] * nodeRates[k * rateCount + r];
            }
            double y = h * sum - qc[r];
            double tot = q[r] + y;
            qc[r] = (tot - q[r]) - y;
            q[r] = tot;
        }
        t0 = t + tc;
        hDone = h;
        System.arraycopy(b, 0, bDense, 0, 7 * capacity);
        // the clock as a sum t + tc of a double and its round-off (Knuth's two-sum)
        double hh = h + tc;
        double sum = t + hh;
        double bb = sum - t;
        tc = (t - (sum - bb)) + (hh - bb);
        t = sum;
    }

    /**
     * The polynomial of the next step, ratio times as long, from this one extended
     * (a(1 + ratio s')), plus the last prediction's miss (Everhart 1985).
     */
    private void predict(double ratio, int len) {
        for (int i = 0; i < len; i++) {
            double b0 = b[i];
            double b1 = b[capacity + i];
            double b2 = b[2 * capacity + i];
            double b3 = b[3 * capacity + i];
            double b4 = b[4 * capacity + i];
            double b5 = b[5 * capacity + i];
            double b6 = b[6 * capacity + i];
            double q1 = ratio;
            double q2 = q1 * q1;
            double q3 = q2 * q1;
            double q4 = q2 * q2;
            double q5 = q4 * q1;
            double q6 = q3 * q3;
            double q7 = q6 * q1;
            // coefficient of s'^j: q^j sum over m >= j-1 of binomial(m+1, j) b_m
            double e0 = q1 * (b0 + 2 * b1 + 3 * b2 + 4 * b3 + 5 * b4 + 6 * b5 + 7 * b6);
            double e1 = q2 * (b1 + 3 * b2 + 6 * b3 + 10 * b4 + 15 * b5 + 21 * b6);
            double e2 = q3 * (b2 + 4 * b3 + 10 * b4 + 20 * b5 + 35 * b6);
            double e3 = q4 * (b3 + 5 * b4 + 15 * b5 + 35 * b6);
            double e4 = q5 * (b4 + 6 * b5 + 21 * b6);
            double e5 = q6 * (b5 + 7 * b6);
            double e6 = q7 * b6;
            store(0, i, e0);
            store(1, i, e1);
            store(2, i, e2);
            store(3, i, e3);
            store(4, i, e4);
            store(5, i, e5);
            store(6, i, e6);
        }
        haveB = true;
        haveE = true;
    }

    private void store(int m, int i, double predicted) {
        int k = m * capacity + i;
        double miss = haveE ? b[k] - e[k] : 0;
        e[k] = predicted;
        b[k] = predicted + miss;
    }

    private static double maxAbs(double[] a, int len) {
        double m = 0;
        for (int i = 0; i < len; i++) {
            m = Math.max(m, Math.abs(a[i]));
        }
        return m;
    }

    // ---- dense output ----

    @Override
    public double stepStart() {
        return t0;
    }

    @Override
    public double stepEnd() {
        return t0 + hDone;
    }

    /** The last step taken (signed). */
    public double lastStep() {
        return hDone;
    }

    @Override
    public void sample(double time, double[] px, double[] pv) {
        double h = hDone;
        double sn = h == 0 ? 0 : (time - t0) / h;
        double hs = time - t0;
        for (int i = 0; i < n; i++) {
            double cx = bDense[6 * capacity + i] / X_DIV[6];
            double cv = bDense[6 * capacity + i] / V_DIV[6];
            for (int m = 5; m >= 0; m--) {
                cx = cx * sn + bDense[m * capacity + i] / X_DIV[m];
                cv = cv * sn + bDense[m * capacity + i] / V_DIV[m];
            }
            px[i] = x0[i] + hs * (v0[i] + hs * (0.5 * a0[i] + sn * cx));
            pv[i] = v0[i] + hs * (a0[i] + sn * cv);
        }
    }

    private static double b6Gain() {
        double sum = 0;
        for (int k = 0; k < NODES.length; k++) {
            double p = 1;
            for (int j = 0; j < NODES.length; j++) {
                if (j != k) {
                    p *= NODES[k] - NODES[j];
                }
            }
            sum += 1 / Math.abs(p);
        }
        return sum;
    }

    /**
     * Radau weights on [-1, 1]: 2 / n^2 at -1, (1 - x) / (n^2 P_(n-1)(x)^2) elsewhere (Abramowitz
     * &amp; Stegun 1964, eq. 25.4.31), halved for [0, 1].
     */
    private static double[] radauWeights() {
        int k = NODES.length;
        double[] w = new double[k];
        w[0] = 1.0 / (k * k);
        for (int j = 1; j < k; j++) {
            double xj = 2 * NODES[j] - 1;
            double p0 = 1;
            double p1 = xj;
            for (int d = 2; d < k; d++) {
                double p2 = ((2 * d - 1) * xj * p1 - (d - 1) * p0) / d;
                p0 = p1;
                p1 = p2;
            }
            w[j] = 0.5 * (1 - xj) / (k * k * p1 * p1);
        }
        return w;
    }
}
