package org.holdfast.run;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.BackgroundTide;
import org.holdfast.forces.Bodies;
import org.holdfast.group.CoulombLog;
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
import org.holdfast.units.Units;
import org.holdfast.integrators.Scheme;

/**
 * Builds a {@link Simulation}: moves the group to its centre-of-mass frame, builds the halos, the
 * pair kernels, the tracers and the forces, and sets the energy budget's reference.
 */
final class RunBuilder {

    private RunBuilder() {
    }

    /**
     * Builds a simulation.
     *
     * @param threads tracer threads, 0 for all cores
     * @throws IllegalArgumentException for an unphysical member, naming it and the key
     */
    static Simulation build(GroupSpec group, RunSettings settings, ExpansionHistory history, int threads) {
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
        system.updateAccelerations();
        if (tracers.count > 0) {
            system.field.accelerate(tracers, bodies, tide.coefficient(settings.startGyr()));
        }
        Simulation sim = new Simulation(settings, history, system, cm, cv);
        sim.startBudget(energyScale(system));
        return sim;
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

    static void checkSettings(RunSettings s) {
        if (s.fixedStep() ? !(s.stepMyr() > 0) : !(s.accuracy() > 0)) {
            throw new IllegalArgumentException(s.fixedStep() ? "step_myr must be positive" : "accuracy must be positive");
        }
        if (s.scheme() == Scheme.IAS15 && !s.fixedStep() && !(s.accuracy() < 1e-3)) {
            throw new IllegalArgumentException("accuracy: for ias15 the step-control parameter epsilon must be below 1e-3"
                    + " (default 1e-9), got " + s.accuracy());
        }
    }

}
