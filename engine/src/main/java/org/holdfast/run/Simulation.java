package org.holdfast.run;

import java.util.List;
import java.util.Locale;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.Tracers;
import org.holdfast.group.GroupSpec;
import org.holdfast.integrators.DenseOutput;
import org.holdfast.integrators.Integrator;
import org.holdfast.units.Units;
import org.holdfast.integrators.Scheme;

/**
 * One galaxy group evolved in an expanding background: the loop. {@link RunBuilder} builds it
 * (centre-of-mass frame, halos, pair kernels, tracers); {@link #run} steps the bodies with the
 * scheme's {@link GalaxyStepper} from the start to the end time without ever shortening a step
 * for an output: snapshots inside a step sample its dense output, mergers are located on it as
 * events, and the tracers follow on their own steps. The simulation is its own {@link RunView}
 * (during a snapshot inside a step, the view shows the sampled bodies).
 *
 * <p>Energy residual: |E(t) - E(0)| / max(|W(0)|, T(t)), the budget's drift relative to the
 * group's initial pair binding energy (with a single body, relative to K(0) + |U(0)|), or to the
 * current size T(t) = |dark-energy potential| + |work| of its tidal terms when that is larger:
 * near a big rip those terms grow many orders of magnitude beyond the binding energy, and the
 * residual is then the relative error of the terms being summed (common practice for sums
 * whose terms outgrow their result). For a bound group T stays well below |W(0)|.
 */
public final class Simulation implements RunView, AutoCloseable {

    /** Heap bytes per body, all arrays together (rounded up). */
    static final long BYTES_PER_BODY = 256;

    private final RunSettings settings;
    private final ExpansionHistory history;
    private final GroupSystem system;
    private final GalaxyStepper stepper;
    /** Null when members do not merge. */
    private final MergerEvents mergerEvents;
    private double tracerTime;
    private double workBefore;
    private double dragBefore;
    /** While an output inside a step is shown: the time and the bodies sampled there. */
    private boolean sampling;
    private double sampleT;
    private final double[] sampleX;
    private final double[] sampleV;
    private final double[][] shown;
    private final double[] frameOffset;
    private final double[] frameVelocity;
    /** Null when members do not merge (a backward run, or merge_within_kpc = 0). */
    private final Mergers mergers;
    /** Tidal stripping of satellites; null without dynamical friction (they come together). */
    private final Stripping stripping;
    private long steps;
    private double energy0;
    private double energyScale;
    private double energyNow;
    private double residual;
    private volatile boolean cancelled;

    Simulation(RunSettings settings, ExpansionHistory history, GroupSystem system, double[] offset,
            double[] velocity) {
        this.settings = settings;
        this.history = history;
        this.system = system;
        double fixed = settings.fixedStep() ? settings.stepMyr() * Units.MYR : Double.NaN;
        this.stepper = settings.scheme() == Scheme.IAS15
                ? new Ias15Stepper(system, settings.accuracy(), fixed)
                : new SplitStepper(system, Integrator.of(settings.scheme()), settings.accuracy(), fixed);
        this.frameOffset = offset;
        this.frameVelocity = velocity;
        this.mergers = settings.mergers()
                ? new Mergers(settings.mergeWithinKpc(), history, settings.darkEnergyForce()) : null;
        this.stripping = settings.dynamicalFriction() ? new Stripping() : null;
        this.mergerEvents = mergers == null ? null
                : new MergerEvents(mergers, history, settings.darkEnergyForce(), system.bodies.x.length);
        int cap = 3 * system.bodies.x.length;
        this.sampleX = new double[cap];
        this.sampleV = new double[cap];
        int n = system.bodies.x.length;
        this.shown = new double[6][n];
        this.tracerTime = settings.startGyr();
    }

    /** A simulation using every core for the tracers. */
    public static Simulation create(GroupSpec group, RunSettings settings, ExpansionHistory history) {
        return create(group, settings, history, 0);
    }

    /**
     * Builds a simulation.
     *
     * @param threads tracer threads, 0 for all cores
     * @throws IllegalArgumentException for an unphysical member, naming it and the key
     */
    public static Simulation create(GroupSpec group, RunSettings settings, ExpansionHistory history, int threads) {
        return RunBuilder.build(group, settings, history, threads);
    }

    /**
     * Heap a run of this group needs, in bytes, before anything is allocated: tracer and body
     * arrays plus the pair tables, so a reader can refuse what cannot fit.
     */
    public static long requiredBytes(GroupSpec group) {
        long n = group.galaxies().size();
        long tables = n * n * 16L * 600;
        return group.tracerCount() * Tracers.BYTES_PER_TRACER + n * BYTES_PER_BODY + tables;
    }

    /**
     * Steps from startGyr to untilGyr, calling the observers; returns why and how it stopped.
     * No step is shortened to land on a snapshot time: snapshots inside a step sample its dense
     * output (the bodies) and bring the tracers to that time on their own steps, so the snapshot
     * interval does not change the bodies' trajectory. Mergers are located on the dense output.
     */
    public RunResult run(List<RunObserver> observers) {
        long wall0 = System.nanoTime();
        double start = settings.startGyr();
        double until = settings.untilGyr();
        boolean limited = endsEarly();
        double end = plannedEndGyr();
        double every = settings.snapshotEveryMyr() * Units.MYR;
        SnapshotClock clock = SnapshotClock.of(start, end, every, history);
        observers.forEach(o -> o.init(this));
        snapshot(observers);
        double nextOut = clock.next(start);
        double dir = Math.signum(end - start);
        StopReason reason = null;
        while (reason == null && system.time() != end) {
            if (cancelled) {
                reason = new StopReason(StopReason.Kind.CANCELLED, "cancelled at " + fmt(system.time()) + " Gyr");
                break;
            }
            double t = system.time();
            double toEnd = end - t;
            double room = historyRoom(t, Math.signum(toEnd));
            double limit = room < Math.abs(toEnd) ? Math.copySign(room, toEnd) : toEnd;
            workBefore = system.tidalWork();
            dragBefore = system.frictionWork();
            double h = limit == 0 ? 0 : stepper.step(limit);
            if (h == 0) {
                reason = new StopReason(StopReason.Kind.NON_FINITE,
                        "step size fell to zero at " + fmt(system.time()) + " Gyr");
                break;
            }
            steps++;
            if (h == toEnd) {
                system.setTime(end);
            }
            reason = checkFinite(false);
            if (reason != null) {
                break;
            }
            double stepEnd = system.time();
            double event = mergerEvents == null ? Double.NaN : mergerEvents.locate(system.bodies, stepper.dense(), t, stepEnd);
            double upTo = Double.isNaN(event) ? stepEnd : event;
            while (dir * (nextOut - upTo) < 0 || (nextOut == upTo && !Double.isNaN(event))) {
                showSampled(observers, nextOut);
                nextOut = clock.next(nextOut);
            }
            if (!Double.isNaN(event)) {
                mergeAt(event);
            } else {
                advanceTracers(stepper.dense(), stepEnd);
                if (mergerEvents != null && mergerEvents.anyInside() && mergers.check(system)) {
                    afterMerger();
                }
            }
            reason = checkFinite(true);
            if (reason != null) {
                break;
            }
            // tidal stripping of satellites (run.Stripping), between steps like mergers: the masses
            // changed, so the integrator's predictor starts afresh as after a merger
            if (stripping != null && stripping.apply(system, mergers)) {
                afterMerger();
            }
            // the centre of mass's drift taken out (GroupSystem.recentre): the background term
            // amplifies it e-fold every 1/sqrt(c), so left alone it would swamp a long run
            if (system.recentre(RECENTRE_FRACTION)) {
                afterMerger();
                recentrings++;
            }
            if (system.bodies.count() <= 64) {
                updateEnergy();
            }
            for (RunObserver o : observers) {
                o.afterStep(this);
            }
            if (nextOut == system.time() && system.time() != end) {
                snapshot(observers);
                nextOut = clock.next(nextOut);
            }
        }
        if (reason == null) {
            snapshot(observers);
            reason = endReason(until, limited);
        }
        for (RunObserver o : observers) {
            o.finish(this, reason);
        }
        return new RunResult(reason, system.time(), steps, (System.nanoTime() - wall0) * 1e-9, maxResidual);
    }

    /** A snapshot at time t inside the last step: the bodies from its interpolant, the tracers stepped there. */
    private void showSampled(List<RunObserver> observers, double t) {
        advanceTracers(stepper.dense(), t);
        stepper.dense().sample(t, sampleX, sampleV);
        int n = system.bodies.count();
        for (int k = 0; k < 3; k++) {
            System.arraycopy(sampleX, k * n, shown[k], 0, n);
            System.arraycopy(sampleV, k * n, shown[3 + k], 0, n);
        }
        sampleT = t;
        sampling = true;
        try {
            for (RunObserver o : observers) {
                o.atSnapshot(this);
            }
        } finally {
            sampling = false;
        }
    }

    /** The located merger: the bodies set to the interpolant at t, the tracers brought there, then the merge. */
    private void mergeAt(double t) {
        advanceTracers(stepper.dense(), t);
        DenseOutput d = stepper.dense();
        d.sample(t, sampleX, sampleV);
        // the work integrals back to t, in proportion to the part of the step taken (error of
        // second order in the step on a small term: the step is cut at the merger)
        double frac = d.stepEnd() == d.stepStart() ? 1 : (t - d.stepStart()) / (d.stepEnd() - d.stepStart());
        system.setWorkIntegrals(workBefore + frac * (system.tidalWork() - workBefore),
                dragBefore + frac * (system.frictionWork() - dragBefore));
        system.copyIn(t, sampleX, sampleV);
        mergers.merge(system, mergerEvents.first(), mergerEvents.second());
        afterMerger();
    }

    private void afterMerger() {
        stepper.restart();
        if (system.tracers.count > 0) {
            system.field.accelerate(system.tracers, system.bodies, system.tide.coefficient(system.time()));
        }
        updateEnergy();
    }

    /** Moves the tracers from where they are to time t along the last step of the bodies. */
    private void advanceTracers(DenseOutput path, double t) {
        if (system.tracers.count == 0 || t == tracerTime) {
            return;
        }
        system.field.advance(system.tracers, path, system.bodies.count(), system.bodies.halo, system.tide, tracerTime, t,
                TRACER_ETA);
        tracerTime = t;
    }

    /**
     * Tracers take steps of at most this fraction of their own dynamical time (about 31 leapfrog
     * steps per circular orbit of a star): they are for pictures (the README gives the accuracy
     * measured).
     */
    static final double TRACER_ETA = 0.2;

    private double maxResidual;

    /**
     * The centre of mass is put back at the origin once its offset exceeds this fraction of the
     * group's extent (or its velocity this fraction of the rms speed): rounding starts it at
     * about 1e-16, so this comes rarely (about every 9 e-folds of its growth), and an offset this
     * small costs the members' relative positions nothing in double precision.
     */
    static final double RECENTRE_FRACTION = 1e-12;

    /** How many times the centre of mass has been put back at the origin. */
    private long recentrings;

    /** Whether the expansion history ends before run.until_gyr, so the run must stop short. */
    private boolean endsEarly() {
        double until = settings.untilGyr();
        return Math.max(history.earliestGyr(), Math.min(history.latestGyr(), until)) != until;
    }

    /**
     * Where {@link #run} ends unless something stops it sooner (a bad number, a cancel):
     * run.until_gyr, or just inside the expansion history where that ends first (before a big
     * rip or crunch, after the Big Bang). Known before the run starts.
     */
    public double plannedEndGyr() {
        double until = settings.untilGyr();
        double end = Math.max(history.earliestGyr(), Math.min(history.latestGyr(), until));
        if (endsEarly()) {
            double margin = 1e-7 * Math.max(Math.abs(end - settings.startGyr()), 1e-3);
            end += until > end ? -margin : margin;
        }
        return end;
    }

    private void snapshot(List<RunObserver> observers) {
        advanceTracers(stepper.dense(), system.time());
        updateEnergy();
        for (RunObserver o : observers) {
            o.atSnapshot(this);
        }
    }

    private void updateEnergy() {
        energyNow = system.energyBudget();
        residual = Math.abs(energyNow - energy0) / Math.max(energyScale, system.tidalTermsMagnitude());
        maxResidual = Math.max(maxResidual, residual);
    }

    /** The longest step in direction dir whose sub-steps all stay inside the expansion history. */
    private double historyRoom(double t, double dir) {
        double ahead = dir > 0 ? history.latestGyr() - t : t - history.earliestGyr();
        double behind = dir > 0 ? t - history.earliestGyr() : history.latestGyr() - t;
        double over = stepper.maxTimeFraction();
        double under = -stepper.minTimeFraction();
        double room = ahead / over;
        if (under > 0) {
            room = Math.min(room, behind / under);
        }
        return Math.max(room, 0);
    }

    private StopReason checkFinite(boolean tracers) {
        int i = system.bodies.firstNonFinite();
        if (i >= 0) {
            return new StopReason(StopReason.Kind.NON_FINITE, "non-finite position or velocity of '"
                    + system.bodies.name[i] + "' at " + fmt(system.time()) + " Gyr");
        }
        if (!tracers) {
            return null;
        }
        int j = system.tracers.count > 0 ? system.field.firstNonFinite(system.tracers) : -1;
        if (j >= 0) {
            int host = system.tracers.host[j];
            String whose = host >= 0 && host < system.bodies.count() ? "a star of '" + system.bodies.name[host] + "'"
                    : "a flow tracer";
            return new StopReason(StopReason.Kind.NON_FINITE, "non-finite position or velocity of tracer " + j
                    + " (" + whose + ") at " + fmt(system.time()) + " Gyr");
        }
        return null;
    }

    private StopReason endReason(double until, boolean limited) {
        double t = system.time();
        if (!limited) {
            return new StopReason(StopReason.Kind.REACHED_END, "reached " + fmt(t) + " Gyr");
        }
        if (until < t) {
            return new StopReason(StopReason.Kind.BEFORE_BIG_BANG,
                    "stopped at " + fmt(t) + " Gyr, just after the Big Bang at " + fmt(history.earliestGyr()) + " Gyr");
        }
        double last = history.latestGyr();
        if (history.hubbleRate(last) < 0) {
            return new StopReason(StopReason.Kind.BEFORE_CRUNCH,
                    "stopped at " + fmt(t) + " Gyr, before the big crunch (history ends at " + fmt(last) + " Gyr)");
        }
        if (history.darkEnergyAccelerationRate(last) > 0) {
            return new StopReason(StopReason.Kind.BEFORE_RIP,
                    "stopped at " + fmt(t) + " Gyr, before the big rip (history ends at " + fmt(last) + " Gyr)");
        }
        return new StopReason(StopReason.Kind.REACHED_END,
                "stopped at " + fmt(t) + " Gyr, where the expansion history ends");
    }

    /** Sets the budget's reference: the energy now and the scale residuals are measured against. */
    void startBudget(double scale) {
        energy0 = system.energyBudget();
        energyNow = energy0;
        energyScale = scale;
    }

    /** Asks a running loop to stop after the current step. */
    public void cancel() {
        cancelled = true;
    }

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.6g", t);
    }

    /** The system being stepped (for tests in this package). */
    GroupSystem system() {
        return system;
    }

    /** Force evaluations of the bodies so far (IAS15's iterations included; trial steps of the step chooser not). */
    public long forceEvaluations() {
        return stepper.evaluations();
    }

    /** How many times the centre of mass's drift has been taken out so far. */
    public long recentrings() {
        return recentrings;
    }

    /** The scheme in use. */
    public Scheme scheme() {
        return settings.scheme();
    }

    @Override
    public void close() {
        system.field.close();
    }

    // ---- RunView ----

    @Override
    public double tGyr() {
        return sampling ? sampleT : system.time();
    }

    @Override
    public double scaleFactor() {
        return history.scaleFactor(tGyr());
    }

    @Override
    public long steps() {
        return steps;
    }

    @Override
    public int bodyCount() {
        return system.bodies.count();
    }

    @Override
    public String bodyName(int i) {
        return system.bodies.name[i];
    }

    @Override
    public double[] bodyMass() {
        return system.bodies.mass;
    }

    @Override
    public double[] bodyX() {
        return sampling ? shown[0] : system.bodies.x;
    }

    @Override
    public double[] bodyY() {
        return sampling ? shown[1] : system.bodies.y;
    }

    @Override
    public double[] bodyZ() {
        return sampling ? shown[2] : system.bodies.z;
    }

    @Override
    public double[] bodyVx() {
        return sampling ? shown[3] : system.bodies.vx;
    }

    @Override
    public double[] bodyVy() {
        return sampling ? shown[4] : system.bodies.vy;
    }

    @Override
    public double[] bodyVz() {
        return sampling ? shown[5] : system.bodies.vz;
    }

    @Override
    public int tracerCount() {
        return system.tracers.count;
    }

    @Override
    public double[] tracerX() {
        return system.tracers.x;
    }

    @Override
    public double[] tracerY() {
        return system.tracers.y;
    }

    @Override
    public double[] tracerZ() {
        return system.tracers.z;
    }

    @Override
    public double[] tracerVx() {
        return system.tracers.vx;
    }

    @Override
    public double[] tracerVy() {
        return system.tracers.vy;
    }

    @Override
    public double[] tracerVz() {
        return system.tracers.vz;
    }

    @Override
    public int[] tracerHost() {
        return system.tracers.host;
    }

    @Override
    public double energyBudget() {
        return energyNow;
    }

    @Override
    public double energyResidual() {
        return residual;
    }

    @Override
    public double[] frameOffsetKpc() {
        return frameOffset.clone();
    }

    @Override
    public double[] frameVelocity() {
        return frameVelocity.clone();
    }

    @Override
    public List<RunEvent> events() {
        return mergers == null ? List.of() : List.copyOf(mergers.events());
    }

    /** Work dynamical friction has done so far (negative), Msun kpc^2/Gyr^2; 0 without friction. */
    public double frictionWork() {
        return system.frictionWork();
    }

    @Override
    public double pairEnergy(int i, int j, double dKpc) {
        org.holdfast.forces.Bodies b = system.bodies;
        return system.gravity.kernels().kernel(b.shape[i], b.shape[j]).energy(dKpc);
    }

    @Override
    public double strippedMassMsun(String name) {
        return stripping == null ? 0 : stripping.strippedByName().getOrDefault(name, 0.0);
    }

    /** Orbital energy taken out of the pair sum by mergers so far, Msun kpc^2/Gyr^2. */
    public double mergerEnergy() {
        return system.mergerEnergy();
    }
}
