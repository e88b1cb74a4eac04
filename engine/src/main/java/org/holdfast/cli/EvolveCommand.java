package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.holdfast.fates.FateReport;
import org.holdfast.fates.FateRun;
import org.holdfast.output.RunFolder;
import org.holdfast.output.RunPlots;
import org.holdfast.output.RunWriter;
import org.holdfast.run.NewtonianLimitWatch;
import org.holdfast.run.RunObserver;
import org.holdfast.run.Simulation;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;
import org.holdfast.units.Units;
import org.holdfast.console.Version;
import org.holdfast.console.RunProgress;

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
            description = "Run folder to write (must not exist, be empty, or hold a run killed before its end, which is"
                    + " started over); default: a new folder named after the scenario.")
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
        if (until != null && !Double.isFinite(until)) {
            throw new ScenarioException("--until", null, "must be a finite number of Gyr from today, got " + until);
        }
        Scenario s = scenario.read(until == null ? Double.NaN : until);
        Path dirPath = RunFolder.choose(out, s.file(), true);
        Simulation sim = FateRun.build(s, 0);
        boolean restarted;
        try {
            RunFolder.makeFolder(dirPath, "--out");
            restarted = RunFolder.clearInterrupted(dirPath);
        } catch (RuntimeException e) {
            sim.close();
            throw e;
        }
        PrintWriter o = spec.commandLine().getOut();
        if (!quiet) {
            o.printf(Locale.ROOT, "evolving \"%s\": %d galaxies, %,d tracers, %s to %s (Gyr from today)%n",
                    s.name(), s.group().galaxies().size(), s.group().tracerCount(), fmt(s.run().startGyr()),
                    fmt(s.run().untilGyr()));
            o.println("  in the group's centre-of-mass frame; writing to " + dirPath
                    + (restarted ? " (it held a run killed before its end: started over)" : ""));
            String note = scenario.uncertainNote(s);
            if (note != null) {
                o.println("  " + note);
            }
            for (String w : s.warnings()) {
                o.println("  warning: " + w);
            }
            o.flush();
        }
        RunWriter writer = new RunWriter(s, dirPath, Version.number());
        List<RunObserver> watchers = new ArrayList<>();
        if (!quiet) {
            watchers.add(new RunProgress(o, RunProgress.onTerminal(), s.run().startGyr(),
                    RunProgress.plannedEndGyr(s)));
        }
        // Ctrl+C (or a scheduler's SIGTERM) stops the run at its next step and lets it write its summary
        CountDownLatch written = new CountDownLatch(1);
        Thread onExit = new Thread(() -> {
            sim.cancel();
            try {
                written.await(60, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "holdfast-evolve-exit");
        Runtime.getRuntime().addShutdownHook(onExit);
        FateRun.Outcome r;
        try {
            r = writer.run(sim, watchers);
        } finally {
            written.countDown();
            try {
                Runtime.getRuntime().removeShutdownHook(onExit);
            } catch (IllegalStateException e) {
                // already shutting down: the hook has its answer
            }
        }
        if (!quiet) {
            report(o, r, writer.dir(), newtonianLimitLine(writer.newtonianLimit()));
        }
        r.simulation().close();
        return 0;
    }

    private static void report(PrintWriter o, FateRun.Outcome r, Path dir, String limitLine) {
        o.printf(Locale.ROOT, "%nstopped at t = %s Gyr after %,d steps in %.1f s: %s%n", fmt(r.result().endGyr()),
                r.result().steps(), r.result().wallSeconds(), r.result().reason().message());
        o.printf(Locale.ROOT, "energy budget closes to %.2e (largest relative residual)%n",
                r.result().maxEnergyResidual());
        if (limitLine != null) {
            o.println(limitLine);
        }
        o.println();
        o.println("What becomes of each member:");
        o.print(FateReport.table(r.members(), r.verdict()));
        o.println();
        o.println(FateReport.verdict(r.verdict(), r.boundUntilGyr()));
        o.println();
        o.println("Timeline:");
        o.print(FateReport.timeline(r.events()));
        o.println();
        List<String> files = new ArrayList<>(List.of("summary.json", "tracks.csv", "fates.csv", "snapshots/"));
        for (String picture : List.of(RunPlots.DISTANCES, RunPlots.ENERGY, RunPlots.HUBBLE)) {
            if (java.nio.file.Files.isRegularFile(dir.resolve(picture))) {
                files.add(picture);
            }
        }
        o.println("Run folder: " + dir + " (" + String.join(", ", files) + ")");
        o.flush();
    }

    /** One line when a member went faster than the Newtonian limit; null when none did. */
    static String newtonianLimitLine(NewtonianLimitWatch w) {
        if (Double.isNaN(w.passedGyr())) {
            return null;
        }
        return String.format(Locale.ROOT, "Note: %s moved faster than %.1f c relative to the centre of mass from"
                + " t = %s Gyr (%.3g km/s then); from that time on this Newtonian model is doubtful"
                + " (summary.json: newtonian_limit_passed_gyr).", w.member(), Units.NEWTONIAN_LIMIT_FRACTION_OF_C,
                fmt(w.passedGyr()), w.speedKpcPerGyr() * Units.KPC_PER_GYR_TO_KMS);
    }

    private static String fmt(double t) {
        return String.format(Locale.ROOT, "%.4g", t);
    }
}
