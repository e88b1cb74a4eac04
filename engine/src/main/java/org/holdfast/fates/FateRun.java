package org.holdfast.fates;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.fates.FateTracker.Verdict;
import org.holdfast.run.RunEvent;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunResult;
import org.holdfast.run.RunSettings;
import org.holdfast.run.Simulation;
import org.holdfast.scenario.Scenario;
import org.holdfast.schema.ScenarioException;

/**
 * One run of a scenario that answers the question holdfast exists for: who stays bound,
 * merges, escapes or is ripped away, and when. Other observers (snapshots, progress, film
 * frames) may watch the same loop.
 */
public final class FateRun {

    /** What a run decided. */
    public record Outcome(RunResult result, List<MemberFate> members, Verdict verdict, double boundUntilGyr,
            List<RunEvent> events, Simulation simulation) {
    }

    private FateRun() {
    }

    /** Time between fate analyses for a run: a fifth of a snapshot interval, at most 1/400 of the run. */
    public static double analysisIntervalGyr(RunSettings run) {
        double span = Math.abs(run.untilGyr() - run.startGyr());
        return Math.min(run.snapshotEveryMyr() * 1e-3 / 5, span / 400);
    }

    /**
     * Builds the simulation of a scenario.
     *
     * @param threads tracer threads, 0 for all cores
     * @throws ScenarioException if a member cannot be built or the run would not fit in memory
     */
    public static Simulation build(Scenario s, int threads) {
        long need = Simulation.requiredBytes(s.group());
        long have = Runtime.getRuntime().maxMemory();
        if (need > have * 0.9) {
            throw new ScenarioException(s.file().toString(), null, String.format(java.util.Locale.ROOT,
                    "this run needs about %.2f GB for %,d tracers, more than the %.2f GB the JVM may use;"
                            + " lower the star and flow counts or give java a larger -Xmx",
                    need / 1e9, s.group().tracerCount(), have / 1e9));
        }
        try {
            return Simulation.create(s.group(), s.run(), s.expansion(), threads);
        } catch (IllegalArgumentException e) {
            throw new ScenarioException(s.file().toString(), null, e.getMessage());
        }
    }

    /** Builds and runs the scenario with the fate tracker and the given observers. */
    public static Outcome run(Scenario s, List<RunObserver> observers, int threads) {
        return run(s, build(s, threads), observers);
    }

    /** Runs a simulation built from the scenario with the fate tracker and the given observers. */
    public static Outcome run(Scenario s, Simulation sim, List<RunObserver> observers) {
        return run(s, sim, tracker(s), observers);
    }

    /** The fate tracker of a scenario's run. */
    public static FateTracker tracker(Scenario s) {
        return new FateTracker(s.expansion(), s.run().darkEnergyForce(), s.run().backgroundMatter(),
                analysisIntervalGyr(s.run()));
    }

    /**
     * Runs a simulation with the given fate tracker (from {@link #tracker}, so that an observer
     * can ask it for the events so far) watching first, then the other observers.
     */
    public static Outcome run(Scenario s, Simulation sim, FateTracker fates, List<RunObserver> observers) {
        List<RunObserver> all = new ArrayList<>();
        all.add(fates);
        all.addAll(observers);
        RunResult r = sim.run(all);
        List<MemberFate> members = fates.fates(sim);
        return new Outcome(r, members, fates.verdict(), fates.boundUntilGyr(), fates.events(sim), sim);
    }
}
