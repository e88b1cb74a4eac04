package org.holdfast.run;

import org.holdfast.forces.BackgroundTide;
import org.holdfast.forces.Bodies;
import org.holdfast.forces.CompensatedSum;
import org.holdfast.forces.DynamicalFriction;
import org.holdfast.forces.PairGravity;
import org.holdfast.forces.TracerField;
import org.holdfast.forces.Tracers;
import org.holdfast.integrators.SecondOrderSystem;
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
 *
 * <p>For {@link org.holdfast.integrators.Ias15} the same forces are a {@link SecondOrderSystem}
 * over the coordinates x..., y..., z... of the bodies, and the two work integrals are its extra
 * rates: the explicit time derivative of the tidal potential, -(1/2) c'(t) sum m r^2, and the
 * power of the drag, sum m f . v; the integrator's Radau quadrature integrates them on the
 * orbit itself (exact for polynomials of degree 14 in time).
 *
 * <p>Tracers move with the bodies' kicks and drifts only when {@link #tracersAlong} is set; the
 * run integrates them on their own steps against the bodies' dense output.
 */
final class GroupSystem implements TrialSystem, SecondOrderSystem {

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
    /** Energy budget change booked by taking out the centre of mass's drift ({@link #recentre}). */
    private double recentredEnergy;
    /** Whether kicks, drifts and force updates move the tracers too (off: they are stepped on their own). */
    boolean tracersAlong;
    private final CompensatedSum kinetic = new CompensatedSum();
    private final CompensatedSum budget = new CompensatedSum();

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
        if (!trial && tracersAlong && tracers.count > 0) {
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
        if (!trial && tracersAlong && tracers.count > 0) {
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
        if (!trial && tracersAlong && tracers.count > 0) {
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

    // ---- as a second-order system, for IAS15 ----

    @Override
    public int size() {
        return 3 * bodies.count();
    }

    @Override
    public int rateCount() {
        return 2;
    }

    @Override
    public void evaluate(double time, double[] pos, double[] vel, double[] acc, double[] rates) {
        copyIn(time, pos, vel);
        Bodies b = bodies;
        int n = b.count();
        java.util.Arrays.fill(b.ax, 0, n, 0);
        java.util.Arrays.fill(b.ay, 0, n, 0);
        java.util.Arrays.fill(b.az, 0, n, 0);
        gravity.accelerate(b);
        double work = 0;
        if (tide.active()) {
            double c = tide.coefficient(time);
            if (c != 0) {
                tide.accelerate(b, c);
            }
            double q = 0;
            for (int i = 0; i < n; i++) {
                q += b.mass[i] * (b.x[i] * b.x[i] + b.y[i] * b.y[i] + b.z[i] * b.z[i]);
            }
            work = -0.5 * tide.rate(time) * q;
        }
        double power = 0;
        if (friction != null) {
            copyAccelerations(acc);
            friction.accelerate(b);
            for (int i = 0; i < n; i++) {
                power += b.mass[i] * ((b.ax[i] - acc[i]) * b.vx[i] + (b.ay[i] - acc[n + i]) * b.vy[i]
                        + (b.az[i] - acc[2 * n + i]) * b.vz[i]);
            }
        }
        copyAccelerations(acc);
        rates[0] = work;
        rates[1] = power;
    }

    /** Copies the bodies' accelerations into a flat x..., y..., z... array. */
    private void copyAccelerations(double[] acc) {
        Bodies b = bodies;
        int n = b.count();
        System.arraycopy(b.ax, 0, acc, 0, n);
        System.arraycopy(b.ay, 0, acc, n, n);
        System.arraycopy(b.az, 0, acc, 2 * n, n);
    }

    /** Copies the bodies' positions and velocities into flat x..., y..., z... arrays. */
    void copyOut(double[] pos, double[] vel) {
        Bodies b = bodies;
        int n = b.count();
        System.arraycopy(b.x, 0, pos, 0, n);
        System.arraycopy(b.y, 0, pos, n, n);
        System.arraycopy(b.z, 0, pos, 2 * n, n);
        System.arraycopy(b.vx, 0, vel, 0, n);
        System.arraycopy(b.vy, 0, vel, n, n);
        System.arraycopy(b.vz, 0, vel, 2 * n, n);
    }

    /** Sets the state from flat arrays and the clock (the integrator's state after a step). */
    void copyIn(double time, double[] pos, double[] vel) {
        Bodies b = bodies;
        int n = b.count();
        System.arraycopy(pos, 0, b.x, 0, n);
        System.arraycopy(pos, n, b.y, 0, n);
        System.arraycopy(pos, 2 * n, b.z, 0, n);
        System.arraycopy(vel, 0, b.vx, 0, n);
        System.arraycopy(vel, n, b.vy, 0, n);
        System.arraycopy(vel, 2 * n, b.vz, 0, n);
        t = time;
    }

    /**
     * Sets the two work integrals from their totals since the start (the integrator's
     * quadrature), on top of what split steps had accumulated before.
     */
    void setWorkIntegrals(double tidal, double drag) {
        work.set(tidal);
        frictionWork.set(drag);
    }

    /** The tidal work so far. */
    double tidalWork() {
        return work.value();
    }

    /** Kinetic energy of the bodies, Msun kpc^2/Gyr^2. */
    double kineticEnergy() {
        CompensatedSum k = kinetic;
        k.set(0);
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
        double kin = kineticEnergy();
        CompensatedSum e = budget;
        e.set(0);
        e.add(kin);
        e.add(gravity.energy(bodies));
        if (tide.active()) {
            e.add(-0.5 * tide.coefficient(t) * BackgroundTide.secondMoment(bodies));
        }
        e.add(-work.value());
        e.add(-frictionWork.value());
        e.add(mergerEnergy);
        e.add(strippedEnergy);
        e.add(recentredEnergy);
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

    /**
     * Takes out the drift of the bodies' centre of mass (mass-weighted position and velocity)
     * once it exceeds the given fraction of the group's extent (the farthest member from the
     * centre of mass) or of its rms speed: bodies and tracers are shifted by the same offset and
     * velocity, and the change of the budget is booked, before minus after.
     *
     * <p>The background term c(t) r acts on the centre of mass too: an offset d of it obeys
     * d'' = c(t) d, which grows as exp(&int; sqrt(c) dt) where c &gt; 0 (the linear instability of
     * d'' = c d is common practice), so the rounding left in it (about 1e-16 of the group's size
     * per step) would in time swamp the members' own motion. Tidal stripping also moves it a
     * little by design; this takes that out too. Pair gravity depends only on differences of
     * positions, so the shift changes the budget by its kinetic energy and the background
     * potential -(1/2) c sum m r^2 alone: with S = sum m r and P = sum m v,
     * sum m |r - d|^2 - sum m r^2 = M d^2 - 2 d . S and the same for the velocities.
     * Nothing is allocated.
     *
     * @return whether the bodies were moved (the stepper must then restart)
     */
    boolean recentre(double fraction) {
        Bodies b = bodies;
        int n = b.count();
        double m = 0;
        double sx = 0;
        double sy = 0;
        double sz = 0;
        double px = 0;
        double py = 0;
        double pz = 0;
        for (int i = 0; i < n; i++) {
            double mi = b.mass[i];
            m += mi;
            sx += mi * b.x[i];
            sy += mi * b.y[i];
            sz += mi * b.z[i];
            px += mi * b.vx[i];
            py += mi * b.vy[i];
            pz += mi * b.vz[i];
        }
        if (!(m > 0)) {
            return false;
        }
        double dx = sx / m;
        double dy = sy / m;
        double dz = sz / m;
        double ux = px / m;
        double uy = py / m;
        double uz = pz / m;
        double extent2 = 0;
        double speed2 = 0;
        for (int i = 0; i < n; i++) {
            double ex = b.x[i] - dx;
            double ey = b.y[i] - dy;
            double ez = b.z[i] - dz;
            extent2 = Math.max(extent2, ex * ex + ey * ey + ez * ez);
            double wx = b.vx[i] - ux;
            double wy = b.vy[i] - uy;
            double wz = b.vz[i] - uz;
            speed2 += b.mass[i] * (wx * wx + wy * wy + wz * wz);
        }
        speed2 /= m;
        double d2 = dx * dx + dy * dy + dz * dz;
        double u2 = ux * ux + uy * uy + uz * uz;
        double f2 = fraction * fraction;
        if (!(d2 > f2 * extent2) && !(u2 > f2 * speed2)) {
            return false;
        }
        double kineticChange = 0.5 * (m * u2 - 2 * (ux * px + uy * py + uz * pz));
        double potentialChange = 0;
        if (tide.active()) {
            potentialChange = -0.5 * tide.coefficient(t) * (m * d2 - 2 * (dx * sx + dy * sy + dz * sz));
        }
        recentredEnergy -= kineticChange + potentialChange;
        for (int i = 0; i < n; i++) {
            b.x[i] -= dx;
            b.y[i] -= dy;
            b.z[i] -= dz;
            b.vx[i] -= ux;
            b.vy[i] -= uy;
            b.vz[i] -= uz;
        }
        Tracers s = tracers;
        for (int i = 0; i < s.count; i++) {
            s.x[i] -= dx;
            s.y[i] -= dy;
            s.z[i] -= dz;
            s.vx[i] -= ux;
            s.vy[i] -= uy;
            s.vz[i] -= uz;
        }
        return true;
    }

    /** Budget change booked by {@link #recentre} so far, Msun kpc^2/Gyr^2. */
    double recentredEnergy() {
        return recentredEnergy;
    }

    /** Books the orbital energy a merger removed: the budget before minus after. */
    void addMergerEnergy(double removed) {
        mergerEnergy += removed;
    }
}
