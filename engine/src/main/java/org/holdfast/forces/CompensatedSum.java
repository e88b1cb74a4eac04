package org.holdfast.forces;

/**
 * Kahan–Babuska–Neumaier compensated sum (Neumaier 1974, ZAMM 54, 39), for energy and
 * momentum diagnostics where many terms of both signs cancel.
 */
public final class CompensatedSum {

    private double sum;
    private double compensation;

    /** Adds one term. */
    public CompensatedSum add(double x) {
        double t = sum + x;
        if (Math.abs(sum) >= Math.abs(x)) {
            compensation += (sum - t) + x;
        } else {
            compensation += (x - t) + sum;
        }
        sum = t;
        return this;
    }

    /** The sum so far. */
    public double value() {
        return sum + compensation;
    }

    /** Back to zero. */
    public CompensatedSum reset() {
        sum = 0;
        compensation = 0;
        return this;
    }

    /** Sets the value (for restoring a saved state). */
    public CompensatedSum set(double value) {
        sum = value;
        compensation = 0;
        return this;
    }
}
