package org.holdfast.integrators;

/**
 * A test particle on a Kepler ellipse around a unit mass (G M = 1, semi-major axis 1, period
 * 2 pi), starting at pericentre, as a {@link SecondOrderSystem} (coordinates x, y) and a
 * {@link SplitSystem}; its exact position at any time from Kepler's equation solved by Newton's
 * method (common practice; e.g. Murray &amp; Dermott 1999, Solar System Dynamics, sec. 2.4).
 */
final class Kepler implements SecondOrderSystem, SplitSystem {

    final double ecc;
    double x;
    double y;
    double vx;
    double vy;
    double ax;
    double ay;
    double t;

    Kepler(double ecc) {
        this.ecc = ecc;
        x = 1 - ecc;
        vy = Math.sqrt((1 + ecc) / (1 - ecc));
        updateAccelerations();
    }

    @Override
    public int size() {
        return 2;
    }

    @Override
    public void evaluate(double time, double[] p, double[] v, double[] a, double[] rates) {
        double r2 = p[0] * p[0] + p[1] * p[1];
        double f = -1 / (r2 * Math.sqrt(r2));
        a[0] = f * p[0];
        a[1] = f * p[1];
    }

    @Override
    public void kick(double h) {
        vx += h * ax;
        vy += h * ay;
    }

    @Override
    public void drift(double h) {
        x += h * vx;
        y += h * vy;
        t += h;
    }

    @Override
    public void updateAccelerations() {
        double r2 = x * x + y * y;
        double f = -1 / (r2 * Math.sqrt(r2));
        ax = f * x;
        ay = f * y;
    }

    /** Specific orbital energy of a state. */
    static double energy(double px, double py, double pvx, double pvy) {
        return 0.5 * (pvx * pvx + pvy * pvy) - 1 / Math.sqrt(px * px + py * py);
    }

    /** The exact position at time t: {x, y}. */
    double[] exact(double time) {
        double mean = time % (2 * Math.PI);
        double ea = ecc < 0.8 ? mean : Math.PI;
        for (int k = 0; k < 60; k++) {
            double d = (ea - ecc * Math.sin(ea) - mean) / (1 - ecc * Math.cos(ea));
            ea -= d;
            if (Math.abs(d) < 1e-16) {
                break;
            }
        }
        return new double[] {Math.cos(ea) - ecc, Math.sqrt(1 - ecc * ecc) * Math.sin(ea)};
    }
}
