package org.holdfast.run;

/**
 * Read-only view of a running simulation, in the centre-of-mass frame, internal units
 * (kpc, kpc/Gyr, Msun, Gyr). Arrays are the live structure-of-arrays state: index i for bodies,
 * j for tracers; never modify them.
 */
public interface RunView {

    /** Current time, Gyr from today. */
    double tGyr();

    /** Scale factor at the current time. */
    double scaleFactor();

    /** Steps taken so far. */
    long steps();

    /** Number of massive bodies now (mergers reduce it). */
    int bodyCount();

    /** Name of body i. */
    String bodyName(int i);

    /** Body masses. */
    double[] bodyMass();

    /** Body positions, kpc. */
    double[] bodyX();

    double[] bodyY();

    double[] bodyZ();

    /** Body velocities, kpc/Gyr. */
    double[] bodyVx();

    double[] bodyVy();

    double[] bodyVz();

    /** Number of massless tracers. */
    int tracerCount();

    /** Tracer positions, kpc. */
    double[] tracerX();

    double[] tracerY();

    double[] tracerZ();

    /** Tracer velocities, kpc/Gyr. */
    double[] tracerVx();

    double[] tracerVy();

    double[] tracerVz();

    /** Index of the body a tracer's stars belong to, or -1 for flow tracers. */
    int[] tracerHost();

    /** Energy budget now: kinetic + pair potential + dark-energy potential - accumulated work. */
    double energyBudget();

    /**
     * Relative residual of the energy budget since the start, |E(t) - E(0)| divided by the
     * binding-energy scale (documented by the implementation).
     */
    double energyResidual();

    /** The initial centre-of-mass position in the user's frame (kpc), subtracted from every body. */
    double[] frameOffsetKpc();

    /** The initial centre-of-mass velocity in the user's frame (kpc/Gyr). */
    double[] frameVelocity();

    /**
     * The interaction energy of bodies i and j at distance d per unit product of their masses
     * (kpc^2 Gyr^-2 Msun^-1): their pair kernel, so overlapping halos are judged by their own
     * interaction; point masses, -G / d, by default.
     */
    default double pairEnergy(int i, int j, double dKpc) {
        return -org.holdfast.units.Units.G / dKpc;
    }

    /** Mass tidal stripping has taken from a member so far, Msun (0 for none, or an unknown name). */
    default double strippedMassMsun(String name) {
        return 0;
    }

    /** Events recorded by the simulation itself so far (mergers), in time order. */
    default java.util.List<RunEvent> events() {
        return java.util.List.of();
    }
}
