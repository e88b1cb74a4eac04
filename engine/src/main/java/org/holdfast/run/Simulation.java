package org.holdfast.run;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.BackgroundTide;
import org.holdfast.forces.Bodies;
import org.holdfast.forces.CoulombLog;
import org.holdfast.forces.DynamicalFriction;
import org.holdfast.forces.KernelTable;
import org.holdfast.forces.PairGravity;
import org.holdfast.forces.TracerField;
import org.holdfast.forces.Tracers;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.Halos;
import org.holdfast.integrators.Integrator;
import org.holdfast.integrators.SymmetricStepSize;
import org.holdfast.units.Units;

/**
 * One galaxy group evolved in an expanding background. {@link #create} moves the group to its
 * centre-of-mass frame, builds the halos, the pair kernels and the tracers; {@link #run} steps
 * it from the start to the end time, landing exactly on every snapshot time, and tells the
 * observers. The simulation is its own {@link RunView}.
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
    private final Integrator integrator;
    private final SymmetricStepSize stepSize;
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

    private Simulation(RunSettings settings, ExpansionHistory history, GroupSystem system, double[] offset,
            double[] velocity) {
        this.settings = settings;
        this.history = history;
        this.system = system;
        this.integrator = Integrator.of(settings.scheme());
        this.stepSize = settings.fixedStep() ? null : new SymmetricStepSize(settings.accuracy(), 2);
        this.frameOffset = offset;
        this.frameVelocity = velocity;
        this.mergers = settings.mergers()
                ? new Mergers(settings.mergeWithinKpc(), history, settings.darkEnergyForce()) : null;
        this.stripping = settings.dynamicalFriction() ? new Stripping() : null;
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
        checkSettings(settings);
        List<GalaxySpec> gs = group.galaxies();
        List<HaloProfile> halos = new ArrayList<>();
        for (GalaxySpec g : gs) {
            try {
                halos.add(Halos.build(g.halo(), g.massMsun(), history.criticalDensityToday()));
                checkStars(g.stars());
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("galaxy '" + g.name() + "': " + e.getMessage(), e);
            }
        }
        KernelTable table = new KernelTable();
        int[] shapes = table.addAll(halos);
        Bodies bodies = new Bodies(gs.size());
        double[] cm = new double[3];
        double[] cv = new double[3];
        centreOfMass(gs, halos, cm, cv);
        for (int i = 0; i < gs.size(); i++) {
            GalaxySpec g = gs.get(i);
            double[] pos = new double[3];
            double[] vel = new double[3];
            for (int k = 0; k < 3; k++) {
                pos[k] = g.positionKpc()[k] - cm[k];
                vel[k] = Units.kmsToKpcPerGyr(g.velocityKms()[k]) - cv[k];
            }
            bodies.add(g.name(), halos.get(i), shapes[i], pos, vel);
        }
        Tracers tracers = seedTracers(group, bodies, settings, history);
        BackgroundTide tide = new BackgroundTide(history, settings.darkEnergyForce(), settings.backgroundMatter());
        DynamicalFriction friction = settings.dynamicalFriction() ? friction(gs, bodies, settings) : null;
        GroupSystem system = new GroupSystem(bodies, tracers, new PairGravity(table), tide,
                new TracerField(threads), friction, settings.startGyr());
        Simulation sim = new Simulation(settings, history, system, cm, cv);
        system.updateAccelerations();
        sim.energy0 = system.energyBudget();
        sim.energyNow = sim.energy0;
        sim.energyScale = energyScale(system);
        return sim;
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

    /** Steps from startGyr to untilGyr, calling the observers; returns why and how it stopped. */
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
        StopReason reason = null;
        while (reason == null && system.time() != end) {
            if (cancelled) {
                reason = new StopReason(StopReason.Kind.CANCELLED, "cancelled at " + fmt(system.time()) + " Gyr");
                break;
            }
            double target = clock.next(system.time());
            double h = chooseStep(target);
            if (h == 0) {
                reason = new StopReason(StopReason.Kind.NON_FINITE,
                        "step size fell to zero at " + fmt(system.time()) + " Gyr");
                break;
            }
            double before = system.time();
            integrator.step(system, h);
            steps++;
            // a step chosen to land on the target lands there exactly, whatever the sum of sub-steps rounds to
            boolean onTarget = h == target - before;
            if (onTarget) {
                system.setTime(target);
            }
            reason = checkFinite();
            if (reason != null) {
                break;
            }
            if (mergers != null && mergers.check(system)) {
                updateEnergy();
            }
            // tidal stripping of satellites (run.Stripping), between steps like mergers
            if (stripping != null && stripping.apply(system, mergers)) {
                updateEnergy();
            }
            if (system.bodies.count() <= 64) {
                updateEnergy();
            }
            for (RunObserver o : observers) {
                o.afterStep(this);
            }
            if (onTarget && system.time() != end) {
                snapshot(observers);
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

    private double maxResidual;

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

    /** The signed step toward target: fixed or adaptive, landing on it, every sub-step inside the history. */
    private double chooseStep(double target) {
        double t = system.time();
        double toTarget = target - t;
        double room = historyRoom(t, Math.signum(toTarget));
        boolean clipped = room < Math.abs(toTarget);
        double limit = clipped ? Math.copySign(room, toTarget) : toTarget;
        double h;
        if (stepSize == null) {
            h = Math.copySign(settings.stepMyr() * Units.MYR, limit);
        } else {
            h = stepSize.choose(integrator, system, limit);
        }
        if (Math.abs(h) >= Math.abs(limit) * (1 - 1e-9)) {
            h = limit;
        }
        return h;
    }

    /** The longest step in direction dir whose sub-steps all stay inside the expansion history. */
    private double historyRoom(double t, double dir) {
        double ahead = dir > 0 ? history.latestGyr() - t : t - history.earliestGyr();
        double behind = dir > 0 ? t - history.earliestGyr() : history.latestGyr() - t;
        double over = integrator.maxTimeFraction();
        double under = -integrator.minTimeFraction();
        double room = ahead / over;
        if (under > 0) {
            room = Math.min(room, behind / under);
        }
        return Math.max(room, 0);
    }

    private StopReason checkFinite() {
        int i = system.bodies.firstNonFinite();
        if (i >= 0) {
            return new StopReason(StopReason.Kind.NON_FINITE, "non-finite position or velocity of '"
                    + system.bodies.name[i] + "' at " + fmt(system.time()) + " Gyr");
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

    /** Asks a running loop to stop after the current step. */
    public void cancel() {
        cancelled = true;
    }

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.6g", t);
    }

    private static double energyScale(GroupSystem s) {
        double w = Math.abs(s.gravity.energy(s.bodies));
        if (w > 0) {
            return w;
        }
        double other = s.kineticEnergy() + Math.abs(s.energyBudget() - s.kineticEnergy());
        return other > 0 ? other : 1;
    }

    private static void centreOfMass(List<GalaxySpec> gs, List<HaloProfile> halos, double[] cm, double[] cv) {
        double total = 0;
        for (int i = 0; i < gs.size(); i++) {
            double m = halos.get(i).mass();
            total += m;
            for (int k = 0; k < 3; k++) {
                cm[k] += m * gs.get(i).positionKpc()[k];
                cv[k] += m * Units.kmsToKpcPerGyr(gs.get(i).velocityKms()[k]);
            }
        }
        for (int k = 0; k < 3; k++) {
            cm[k] /= total;
            cv[k] /= total;
        }
    }

    private static Tracers seedTracers(GroupSpec group, Bodies bodies, RunSettings settings, ExpansionHistory h) {
        long count = group.tracerCount();
        if (count > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("count: " + count + " tracers is more than one run can hold");
        }
        Tracers t = new Tracers((int) count);
        int at = 0;
        List<GalaxySpec> gs = group.galaxies();
        for (int i = 0; i < gs.size(); i++) {
            StarsSpec s = gs.get(i).stars();
            if (s == null || s.count() == 0) {
                continue;
            }
            double[] pos = {bodies.x[i], bodies.y[i], bodies.z[i]};
            double[] vel = {bodies.vx[i], bodies.vy[i], bodies.vz[i]};
            if ("disk".equals(s.shape())) {
                TracerSeeding.disk(t, at, i, s, bodies.halo[i], pos, vel, settings.seed(), i);
            } else {
                TracerSeeding.sphere(t, at, i, s, bodies.halo[i], pos, vel, settings.seed(), i);
            }
            at += s.count();
        }
        if (group.flow() != null && group.flow().count() > 0) {
            TracerSeeding.flow(t, at, group.flow(), h.hubbleRate(settings.startGyr()), settings.seed(), gs.size());
        }
        return t;
    }

    private static DynamicalFriction friction(List<GalaxySpec> gs, Bodies bodies, RunSettings settings) {
        java.util.Map<String, CoulombLog> own = new java.util.HashMap<>();
        for (GalaxySpec g : gs) {
            if (g.coulombLog() != null) {
                own.put(g.name(), g.coulombLog());
            }
        }
        DynamicalFriction f = new DynamicalFriction(settings.coulombLog(), own);
        f.refresh(bodies);
        return f;
    }

    private static void checkStars(StarsSpec s) {
        if (s == null) {
            return;
        }
        if (!StarsSpec.SHAPES.contains(s.shape())) {
            throw new IllegalArgumentException("stars.shape: unknown shape '" + s.shape() + "' (one of " + StarsSpec.SHAPES + ")");
        }
        if (!(s.radiusKpc() > 0)) {
            throw new IllegalArgumentException("stars.radius_kpc must be positive, got " + s.radiusKpc());
        }
        if ("disk".equals(s.shape())) {
            TracerSeeding.unit(s.normal());
        }
    }

    private static void checkSettings(RunSettings s) {
        if (s.fixedStep() ? !(s.stepMyr() > 0) : !(s.accuracy() > 0)) {
            throw new IllegalArgumentException(s.fixedStep() ? "step_myr must be positive" : "accuracy must be positive");
        }
    }

    /** The system being stepped (for tests in this package). */
    GroupSystem system() {
        return system;
    }

    /** The integrator in use. */
    public Integrator integrator() {
        return integrator;
    }

    @Override
    public void close() {
        system.field.close();
    }

    // ---- RunView ----

    @Override
    public double tGyr() {
        return system.time();
    }

    @Override
    public double scaleFactor() {
        return history.scaleFactor(system.time());
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
        return system.bodies.x;
    }

    @Override
    public double[] bodyY() {
        return system.bodies.y;
    }

    @Override
    public double[] bodyZ() {
        return system.bodies.z;
    }

    @Override
    public double[] bodyVx() {
        return system.bodies.vx;
    }

    @Override
    public double[] bodyVy() {
        return system.bodies.vy;
    }

    @Override
    public double[] bodyVz() {
        return system.bodies.vz;
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
