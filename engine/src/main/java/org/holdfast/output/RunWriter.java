package org.holdfast.output;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.fates.FateRun;
import org.holdfast.fates.FateTracker;
import org.holdfast.fates.MemberFate;
import org.holdfast.group.GalaxySpec;
import org.holdfast.run.NewtonianLimitWatch;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.Simulation;
import org.holdfast.scenario.Scenario;
import org.holdfast.units.Units;

/**
 * Evolves a scenario into a run folder: the resolved scenario before the first step, the HDF5
 * snapshots and {@code tracks.csv} as the run goes, {@code summary.json} and the pictures at
 * the end. This is the job behind {@code holdfast evolve}; the viewer uses it too, to evolve a
 * scenario while it plays. Other observers (progress, a live display) may watch the same loop;
 * they see each snapshot after it has been written.
 */
public final class RunWriter {

    private final Scenario scenario;
    private final String version;
    private final RunFolder folder;
    private final NewtonianLimitWatch limit = new NewtonianLimitWatch();

    /**
     * Creates the folder (which {@link RunFolder#choose} has checked) with the scenario's copy
     * and its resolved form.
     *
     * @param version the program version recorded in every file
     */
    public RunWriter(Scenario scenario, Path dir, String version) {
        this.scenario = scenario;
        this.version = version;
        this.folder = RunFolder.create(dir, scenario.file());
        folder.writeJson(RunFolder.RESOLVED, resolved(scenario, version));
    }

    /** The run folder. */
    public Path dir() {
        return folder.dir();
    }

    /** When a member's speed first passed the Newtonian limit (after {@link #run}). */
    public NewtonianLimitWatch newtonianLimit() {
        return limit;
    }

    /**
     * Runs the simulation (built from the scenario) with the fate tracker, the folder's writers
     * and then {@code watchers}, and writes the pictures and, last, the summary. A cancelled run is written
     * like any other, with its stop reason.
     */
    public FateRun.Outcome run(Simulation sim, List<RunObserver> watchers) {
        return run(sim, FateRun.tracker(scenario), watchers);
    }

    /** As {@link #run(Simulation, List)}, with a fate tracker the watchers may ask for the events so far. */
    public FateRun.Outcome run(Simulation sim, FateTracker fates, List<RunObserver> watchers) {
        RunRecorder recorder = new RunRecorder(scenario.expansion(), scenario.run().darkEnergyForce(),
                FateRun.analysisIntervalGyr(scenario.run()));
        List<RunObserver> observers = new ArrayList<>();
        observers.add(recorder);
        observers.add(limit);
        observers.add(new SnapshotWriter(folder.dir(), scenario.name(), version));
        TrackWriter tracks = new TrackWriter(folder.dir());
        observers.add(tracks);
        FateWriter why = new FateWriter(folder.dir(), fates);
        observers.add(why);
        observers.addAll(watchers);
        FateRun.Outcome r;
        try {
            r = FateRun.run(scenario, sim, fates, observers);
        } finally {
            tracks.close();
            why.close();
        }
        if (!jvmShuttingDown()) {
            // the pictures need AWT, which refuses to start once the JVM is quitting (Ctrl+C)
            RunPlots.write(folder.dir(), recorder, r.events(), scenario.name());
        }
        // the summary comes last: a folder with one holds a whole run, pictures included
        folder.writeJson(RunFolder.SUMMARY, summary(scenario, version, r, limit));
        return r;
    }

    private static boolean jvmShuttingDown() {
        Thread probe = new Thread(() -> { });
        try {
            Runtime.getRuntime().addShutdownHook(probe);
            Runtime.getRuntime().removeShutdownHook(probe);
            return false;
        } catch (IllegalStateException e) {
            return true;
        }
    }

    private static Map<String, Object> resolved(Scenario s, String version) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("scenario", s.name());
        m.put("description", s.description());
        m.put("file", s.file().toString());
        m.put("version", version);
        m.put("cosmology", Provenance.cosmology(s.cosmology(), s.expansion()));
        m.put("run", Provenance.run(s.run()));
        List<Map<String, Object>> gs = new ArrayList<>();
        for (GalaxySpec g : s.group().galaxies()) {
            gs.add(Provenance.member(g, g.positionKpc(), g.velocityKms()));
        }
        m.put("galaxies_as_given", gs);
        m.put("tracers", Provenance.tracers(s));
        m.put("uncertain", Provenance.uncertain(s.uncertain()));
        m.put("warnings", s.warnings());
        return m;
    }

    private static Map<String, Object> summary(Scenario s, String version, FateRun.Outcome r,
            NewtonianLimitWatch limit) {
        RunView v = r.simulation();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("scenario", s.name());
        m.put("version", version);
        m.put("start_gyr", s.run().startGyr());
        m.put("end_gyr", r.result().endGyr());
        m.put("stop_reason", r.result().reason().key());
        m.put("stop_message", r.result().reason().message());
        m.put("steps", r.result().steps());
        m.put("wall_s", r.result().wallSeconds());
        m.put("energy_budget_error", r.result().maxEnergyResidual());
        m.put("frame", Map.of("name", "centre of mass",
                "offset_kpc", v.frameOffsetKpc(),
                "velocity_kms", scaled(v.frameVelocity(), Units.KPC_PER_GYR_TO_KMS)));
        m.put("cosmology", Provenance.cosmology(s.cosmology(), s.expansion()));
        m.put("run", Provenance.run(s.run()));
        m.put("verdict", r.verdict().key());
        m.put("bound_until_gyr", Provenance.finiteOrNull(r.boundUntilGyr()));
        // when a member's speed relative to the centre of mass first passed 0.1 c (null: never)
        m.put("newtonian_limit_passed_gyr", Provenance.finiteOrNull(limit.passedGyr()));
        m.put("newtonian_limit_member", limit.member());
        // the member's speed then, km/s (just above 0.1 c); null, like the two above, when no member passed it
        m.put("newtonian_limit_kms", Provenance.finiteOrNull(limit.speedKpcPerGyr() * Units.KPC_PER_GYR_TO_KMS));
        List<Map<String, Object>> members = new ArrayList<>();
        for (MemberFate f : r.members()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("name", f.name());
            e.put("fate", f.fate().key());
            e.put("at_gyr", Provenance.finiteOrNull(f.atGyr()));
            e.put("left_gyr", Provenance.finiteOrNull(f.leftGyr()));
            e.put("with", f.with());
            e.put("stripped_msun", v.strippedMassMsun(f.name()));
            members.add(e);
        }
        m.put("members", members);
        List<Map<String, Object>> events = new ArrayList<>();
        for (RunEvent ev : r.events()) {
            events.add(Map.of("t_gyr", ev.tGyr(), "kind", ev.type().key(), "members", ev.members()));
        }
        m.put("events", events);
        List<Map<String, Object>> finals = new ArrayList<>();
        double k = Units.KPC_PER_GYR_TO_KMS;
        for (int i = 0; i < v.bodyCount(); i++) {
            Map<String, Object> g = new LinkedHashMap<>();
            g.put("name", v.bodyName(i));
            g.put("mass_msun", v.bodyMass()[i]);
            g.put("position_kpc", new double[] {v.bodyX()[i], v.bodyY()[i], v.bodyZ()[i]});
            g.put("velocity_kms", new double[] {v.bodyVx()[i] * k, v.bodyVy()[i] * k, v.bodyVz()[i] * k});
            finals.add(g);
        }
        m.put("galaxies", finals);
        m.put("uncertain", Provenance.uncertain(s.uncertain()));
        return m;
    }

    private static double[] scaled(double[] a, double f) {
        return new double[] {a[0] * f, a[1] * f, a[2] * f};
    }
}
