package org.holdfast.forces;

import org.holdfast.expansion.ExpansionHistory;

/**
 * The homogeneous cosmic background acting in the group's centre-of-mass frame: a = c(t) r,
 * with c = k(t) (dark energy, k = -(4 pi G/3)(rho_de + 3 p_de/c^2)) and, optionally, the mean
 * matter term -(4 pi G/3) rho_m(t) (the Newtonian limit of the Friedmann acceleration equation,
 * e.g. Peebles 1993, Principles of Physical Cosmology, eq. 5.15). Its potential per unit mass
 * is -(1/2) c(t) r^2, whose explicit time derivative -(1/2) c'(t) r^2 is the work the energy
 * budget accumulates.
 */
public final class BackgroundTide {

    private final ExpansionHistory history;
    private final boolean darkEnergy;
    private final boolean matter;

    public BackgroundTide(ExpansionHistory history, boolean darkEnergy, boolean matter) {
        this.history = history;
        this.darkEnergy = darkEnergy;
        this.matter = matter;
    }

    /** c(t) in 1/Gyr^2. */
    public double coefficient(double tGyr) {
        double c = 0;
        if (darkEnergy) {
            c += history.darkEnergyAcceleration(tGyr);
        }
        if (matter) {
            c += history.matterAcceleration(tGyr);
        }
        return c;
    }

    /** dc/dt in 1/Gyr^3; the matter term scales as a^-3, so its rate is -3 H times itself. */
    public double rate(double tGyr) {
        double r = 0;
        if (darkEnergy) {
            r += history.darkEnergyAccelerationRate(tGyr);
        }
        if (matter) {
            r -= 3 * history.hubbleRate(tGyr) * history.matterAcceleration(tGyr);
        }
        return r;
    }

    /** Whether any term is switched on. */
    public boolean active() {
        return darkEnergy || matter;
    }

    /** The expansion history the terms come from. */
    public ExpansionHistory history() {
        return history;
    }

    /** Adds c r to each body's acceleration. */
    public void accelerate(Bodies b, double c) {
        for (int i = 0; i < b.count(); i++) {
            b.ax[i] += c * b.x[i];
            b.ay[i] += c * b.y[i];
            b.az[i] += c * b.z[i];
        }
    }

    /** Sum of m r^2 over the bodies (the potential is -(1/2) c times this). */
    public static double secondMoment(Bodies b) {
        CompensatedSum s = new CompensatedSum();
        for (int i = 0; i < b.count(); i++) {
            s.add(b.mass[i] * (b.x[i] * b.x[i] + b.y[i] * b.y[i] + b.z[i] * b.z[i]));
        }
        return s.value();
    }
}
