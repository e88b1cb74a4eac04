package org.holdfast.run;

import org.holdfast.forces.BackgroundTide;
import org.holdfast.forces.Bodies;
import org.holdfast.forces.CompensatedSum;
import org.holdfast.forces.DynamicalFriction;
import org.holdfast.forces.PairGravity;
import org.holdfast.forces.TracerField;
import org.holdfast.forces.Tracers;
import org.holdfast.integrators.TrialSystem;

/**
 * A group as the integrators see it: bodies under pair gravity and the background tide,
 * tracers in their field, one clock, and the energy budget
 * E = K + W + U(t) - integral of dU/dt|explicit dt, with U = -(1/2) c(t) sum m r^2.
 * The work integral is accumulated over each drift, where the positions move on straight lines
 * and only the clock runs, with 3-point Gauss–Legendre quadrature (exact for the quadratic
 * sum m r^2 times a cubic c'(t)).
 *
 * <p>With dynamical friction the budget also subtracts the work the drag has done (counted in
 * each kick), and it adds back the orbital energy that mergers took out of the pair sum, so a
 * budget that stays constant means the integration, not the physics, is accurate.
 */
final class GroupSystem implements TrialSystem {

    private static final double[] GL_NODES = {-Math.sqrt(0.6), 0, Math.sqrt(0.6)};
    private static final double[] GL_WEIGHTS = {5.0 / 9, 8.0 / 9, 5.0 / 9};

    final Bodies bodies;
    final Tracers tracers;
    final PairGravity gravity;
    final BackgroundTide tide;
    final TracerField field;
    /** Null when the run has no dynamical friction. */
    final DynamicalFriction friction;
    private double t;
    private boolean trial;
    private final CompensatedSum work = new CompensatedSum();
    private final double[] saved;
    private double savedT;
    private double savedWork;
    private final CompensatedSum frictionWork = new CompensatedSum();
    private final double[] savedDrag;
    private double savedFrictionWork;
    private double mergerEnergy;
    /** Energy budget change booked by tidal stripping (run.Stripping). */
    private double strippedEnergy;

    GroupSystem(Bodies bodies, Tracers tracers, PairGravity gravity, BackgroundTide tide, TracerField field,
            DynamicalFriction friction, double startGyr) {
        this.bodies = bodies;
        this.tracers = tracers;
        this.gravity = gravity;
        this.tide = tide;
        this.field = field;
        this.friction = friction;
        this.t = startGyr;
        this.saved = new double[9 * bodies.x.length];
        this.savedDrag = new double[3 * bodies.x.length];
    }

    double time() {
        return t;
    }

    /** Sets the clock exactly (to land on a snapshot time without round-off). */
    void setTime(double tGyr) {
        t = tGyr;
    }

    @Override
    public void kick(double h) {
        Bodies b = bodies;
        if (friction != null) {
            frictionWork.add(friction.work(b, h));
        }
        for (int i = 0; i < b.count(); i++) {
            b.vx[i] += h * b.ax[i];
            b.vy[i] += h * b.ay[i];
            b.vz[i] += h * b.az[i];
        }
        if (!trial && tracers.count > 0) {
            field.kick(tracers, h);
        }
    }

    @Override
    public void drift(double h) {
        Bodies b = bodies;
        if (tide.active()) {
            accumulateWork(h);
        }
        for (int i = 0; i < b.count(); i++) {
            b.x[i] += h * b.vx[i];
            b.y[i] += h * b.vy[i];
            b.z[i] += h * b.vz[i];
        }
        if (!trial && tracers.count > 0) {
            field.drift(tracers, h);
        }
        t += h;
    }

    private void accumulateWork(double h) {
        Bodies b = bodies;
        double q0 = 0;
        double p = 0;
        double v = 0;
        for (int i = 0; i < b.count(); i++) {
            double m = b.mass[i];
            q0 += m * (b.x[i] * b.x[i] + b.y[i] * b.y[i] + b.z[i] * b.z[i]);
            p += m * (b.x[i] * b.vx[i] + b.y[i] * b.vy[i] + b.z[i] * b.vz[i]);
            v += m * (b.vx[i] * b.vx[i] + b.vy[i] * b.vy[i] + b.vz[i] * b.vz[i]);
        }
        double sum = 0;
        for (int k = 0; k < 3; k++) {
            double s = 0.5 * h * (1 + GL_NODES[k]);
            double q = q0 + 2 * s * p + s * s * v;
            sum += GL_WEIGHTS[k] * (-0.5) * tide.rate(t + s) * q;
        }
        work.add(0.5 * h * sum);
    }

    @Override
    public void updateAccelerations() {
        Bodies b = bodies;
        double c = tide.coefficient(t);
        java.util.Arrays.fill(b.ax, 0, b.count(), 0);
        java.util.Arrays.fill(b.ay, 0, b.count(), 0);
        java.util.Arrays.fill(b.az, 0, b.count(), 0);
        gravity.accelerate(b);
        if (c != 0) {
            tide.accelerate(b, c);
        }
        if (friction != null) {
            friction.accelerate(b);
        }
        if (!trial && tracers.count > 0) {
            field.accelerate(tracers, b, c);
        }
    }

    @Override
    public double timescale() {
        double tau = gravity.timescale(bodies);
        if (tide.active()) {
            double c = tide.coefficient(t);
            double rate = tide.rate(t);
            // |c|^(-1/2) and |c'|^(-1/3): both shrink in proportion to the time left before a rip,
            // and neither collapses where c changes sign
            if (c != 0) {
                tau = Math.min(tau, 1 / Math.sqrt(Math.abs(c)));
            }
            if (rate != 0) {
                tau = Math.min(tau, 1 / Math.cbrt(Math.abs(rate)));
            }
        }
        if (friction != null) {
            tau = Math.min(tau, friction.timescale());
        }
        return tau;
    }

    @Override
    public void beginTrial() {
        bodies.copyStateTo(saved);
        savedT = t;
        savedWork = work.value();
        if (friction != null) {
            friction.save(savedDrag, bodies.count());
            savedFrictionWork = frictionWork.value();
        }
        trial = true;
    }

    @Override
    public void endTrial() {
        bodies.restoreStateFrom(saved);
        t = savedT;
        work.set(savedWork);
        if (friction != null) {
            friction.restore(savedDrag, bodies.count());
            frictionWork.set(savedFrictionWork);
        }
        trial = false;
    }

    /** Kinetic energy of the bodies, Msun kpc^2/Gyr^2. */
    double kineticEnergy() {
        CompensatedSum k = new CompensatedSum();
        Bodies b = bodies;
        for (int i = 0; i < b.count(); i++) {
            k.add(0.5 * b.mass[i] * (b.vx[i] * b.vx[i] + b.vy[i] * b.vy[i] + b.vz[i] * b.vz[i]));
        }
        return k.value();
    }

    /** The energy budget now. */
    /**
     * The size of the budget's tidal terms now: |dark-energy potential| + |work of its time
     * variation|. Near a big rip they outgrow the binding energy by many orders of magnitude,
     * and the budget's error is then measured against them.
     */
    double tidalTermsMagnitude() {
        double m = Math.abs(work.value());
        if (tide.active()) {
            m += Math.abs(0.5 * tide.coefficient(t) * BackgroundTide.secondMoment(bodies));
        }
        return m;
    }

    double energyBudget() {
        CompensatedSum e = new CompensatedSum();
        e.add(kineticEnergy());
        e.add(gravity.energy(bodies));
        if (tide.active()) {
            e.add(-0.5 * tide.coefficient(t) * BackgroundTide.secondMoment(bodies));
        }
        e.add(-work.value());
        e.add(-frictionWork.value());
        e.add(mergerEnergy);
        e.add(strippedEnergy);
        return e.value();
    }

    /** Work done by dynamical friction so far (negative: energy taken out), Msun kpc^2/Gyr^2. */
    double frictionWork() {
        return frictionWork.value();
    }

    /** Orbital energy mergers have taken out of the pair sum so far, Msun kpc^2/Gyr^2. */
    double mergerEnergy() {
        return mergerEnergy;
    }

    /** Books the energy change of moving stripped mass to its host: the budget before minus after. */
    void addStrippedEnergy(double removed) {
        strippedEnergy += removed;
    }

    /** Books the orbital energy a merger removed: the budget before minus after. */
    void addMergerEnergy(double removed) {
        mergerEnergy += removed;
    }
}
