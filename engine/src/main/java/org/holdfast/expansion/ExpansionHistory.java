package org.holdfast.expansion;

/**
 * The expansion history of a homogeneous universe, as the rest of holdfast reads it: the
 * clock (scale factor against time) and the strength of the dark-energy and mean-matter
 * accelerations that act on a galaxy group. Time {@code tGyr} is in Gyr from today (a = 1 at
 * t = 0; future positive, past negative, the Big Bang at t = -age).
 *
 * <p>The dynamics calls {@link #darkEnergyAcceleration} at every kick of every body, so
 * implementations must make it cheap (a table lookup, not an integral).
 *
 * <p>Every lookup outside {@code [earliestGyr(), latestGyr()]} throws
 * {@link ExpansionRangeException}; no method ever returns NaN.
 */
public interface ExpansionHistory {

    /** Scale factor a(t), 1 today. */
    double scaleFactor(double tGyr);

    /** Hubble rate H(t) = a'/a in 1/Gyr (negative while a contracting universe recollapses). */
    double hubbleRate(double tGyr);

    /** The whole acceleration term a''/a in 1/Gyr^2. */
    double totalAcceleration(double tGyr);

    /**
     * The dark-energy part of a''/a, k(t) = -(4 pi G/3)(rho_de + 3 p_de/c^2)
     * = -(1/2) H0^2 Omega_de f(a) (1 + 3 w(a)), in 1/Gyr^2. A body at r from the centre of mass
     * feels k(t) r: positive k pushes apart.
     */
    double darkEnergyAcceleration(double tGyr);

    /** dk/dt in 1/Gyr^3, for the work of the time-varying dark-energy potential. */
    double darkEnergyAccelerationRate(double tGyr);

    /** The mean-matter part of a''/a, -(4 pi G/3) rho_m(t) = -(1/2) H0^2 Omega_m a^-3, in 1/Gyr^2. */
    double matterAcceleration(double tGyr);

    /** Dark-energy density at t in Msun/kpc^3. */
    double darkEnergyDensity(double tGyr);

    /** Critical density today, 3 H0^2/(8 pi G), in Msun/kpc^3. */
    double criticalDensityToday();

    /** Earliest valid time: the Big Bang (minus the age), or the table's start. */
    double earliestGyr();

    /**
     * Latest valid time: the big rip or the crunch when there is one (lookups stop a little
     * before the singularity), otherwise the end of the table.
     */
    double latestGyr();
}
