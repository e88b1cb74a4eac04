package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.holdfast.fates.FateReport;
import org.holdfast.fates.FateRun;
import org.holdfast.fates.MemberFate;
import org.holdfast.group.GalaxySpec;
import org.holdfast.output.Provenance;
import org.holdfast.output.RunFolder;
import org.holdfast.output.RunPlots;
import org.holdfast.output.RunRecorder;
import org.holdfast.output.SnapshotWriter;
import org.holdfast.output.TrackWriter;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.Simulation;
import org.holdfast.scenario.Scenario;
import org.holdfast.units.Units;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast evolve}: runs a scenario, decides the fates, writes a run folder. */
@Command(name = "evolve",
        mixinStandardHelpOptions = true,
        header = "Evolve a group, decide every member's fate, write a run folder.",
        description = {
            "Evolves a galaxy group forward (or backward) in its expanding universe, says for",
            "each member whether and when it stays bound, merges, escapes or is ripped away,",
            "and writes a run folder: summary.json, tracks.csv, HDF5 snapshots, pictures.",
            "",
            "Example:",
            "  holdfast evolve scenarios/hollin-group.toml --set cosmology.dark_energy.w0=-1.3"
        })
public final class EvolveCommand implements Callable<Integer> {

    @Mixin
    ScenarioOptions scenario;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Run folder to write (must not exist or be empty); default: a new folder named after the scenario.")
    Path out;

    @Option(names = "--until", paramLabel = "GYR",
            description = "End time in Gyr from today, replacing [run] until_gyr (negative: into the past).")
    Double until;

    @Option(names = "--quiet", description = "Print nothing but errors.")
    boolean quiet;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.read(until == null ? Double.NaN : until);
        Path dirPath = RunFolder.choose(out, s.file());
        Simulation sim = FateRun.build(s, 0);
        PrintWriter o = spec.commandLine().getOut();
        if (!quiet) {
            o.printf(Locale.ROOT, "evolving \"%s\": %d galaxies, %,d tracers, %s to %s (Gyr from today)%n",
                    s.name(), s.group().galaxies().size(), s.group().tracerCount(), fmt(s.run().startGyr()),
                    fmt(s.run().untilGyr()));
            o.println("  in the group's centre-of-mass frame; writing to " + dirPath);
            String note = scenario.uncertainNote(s);
            if (note != null) {
                o.println("  " + note);
            }
            for (String w : s.warnings()) {
                o.println("  warning: " + w);
            }
            o.flush();
        }
        RunFolder folder = RunFolder.create(dirPath, s.file());
        folder.writeJson(RunFolder.RESOLVED, resolved(s));
        RunRecorder recorder = new RunRecorder(s.expansion(), s.run().darkEnergyForce(),
                FateRun.analysisIntervalGyr(s.run()));
        List<RunObserver> observers = new ArrayList<>();
        observers.add(recorder);
        observers.add(new SnapshotWriter(folder.dir(), s.name(), Version.number()));
        TrackWriter tracks = new TrackWriter(folder.dir());
        observers.add(tracks);
        if (!quiet) {
            observers.add(new RunProgress(o, RunProgress.onTerminal(), s.run().startGyr(), s.run().untilGyr()));
        }
        FateRun.Outcome r;
        try {
            r = FateRun.run(s, sim, observers);
        } finally {
            tracks.close();
        }
        folder.writeJson(RunFolder.SUMMARY, summary(s, r));
        RunPlots.write(folder.dir(), recorder, r.events(), s.name());
        if (!quiet) {
            report(o, s, r, folder.dir());
        }
        r.simulation().close();
        return 0;
    }

    private static void report(PrintWriter o, Scenario s, FateRun.Outcome r, Path dir) {
        o.printf(Locale.ROOT, "%nstopped at t = %s Gyr after %,d steps in %.1f s: %s%n", fmt(r.result().endGyr()),
                r.result().steps(), r.result().wallSeconds(), r.result().reason().message());
        o.printf(Locale.ROOT, "energy budget closes to %.2e (largest relative residual)%n%n",
                r.result().maxEnergyResidual());
        o.println("What becomes of each member:");
        o.print(FateReport.table(r.members()));
        o.println();
        o.println(FateReport.verdict(r.verdict(), r.boundUntilGyr()));
        o.println();
        o.println("Timeline:");
        o.print(FateReport.timeline(r.events()));
        o.println();
        o.println("Run folder: " + dir + " (summary.json, tracks.csv, snapshots/, distances.png, energy.png, hubble.png)");
        o.flush();
    }

    private static Map<String, Object> resolved(Scenario s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("scenario", s.name());
        m.put("description", s.description());
        m.put("file", s.file().toString());
        m.put("version", Version.number());
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

    private static Map<String, Object> summary(Scenario s, FateRun.Outcome r) {
        RunView v = r.simulation();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("scenario", s.name());
        m.put("version", Version.number());
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
        List<Map<String, Object>> members = new ArrayList<>();
        for (MemberFate f : r.members()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("name", f.name());
            e.put("fate", f.fate().key());
            e.put("at_gyr", Provenance.finiteOrNull(f.atGyr()));
            e.put("with", f.with());
            members.add(e);
        }
        m.put("members", members);
        List<Map<String, Object>> events = new ArrayList<>();
        for (RunEvent ev : r.events()) {
            events.add(Map.of("t_gyr", ev.tGyr(), "kind", ev.kind(), "members", ev.members()));
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

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.4g", t);
    }
}
