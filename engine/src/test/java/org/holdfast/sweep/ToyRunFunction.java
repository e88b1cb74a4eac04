package org.holdfast.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.scenario.GroupReader;
import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;

/**
 * A cheap, deterministic stand-in for the physics, for tests of the sweep machinery only (not
 * a physical model). It reads the scenario through the real reader, so unknown override keys
 * fail as they would in a real run. A member of mass m is ripped when the effective
 * w = w0 + noise lies below w_c(m) = -1 - 0.1 log10(m / 1e10), at the toy time
 * t(w) = 28 / (3 |1 + w|) Gyr, if that is before the end of the run; otherwise it stays bound.
 * With sampling, noise ~ N(0, 0.03) is drawn from the run's seed and draw index and reported as the sampled
 * value "toy.w_noise".
 */
public final class ToyRunFunction implements RunFunction {

    private static final long serialVersionUID = 1L;

    private final long sleepMs;
    private final String callLog;

    /** A toy that answers at once and logs nothing. */
    public ToyRunFunction() {
        this(0, null);
    }

    /**
     * @param sleepMs time each run takes
     * @param callLog file that gets one line ("seed draw w0") per finished call; null for none
     */
    public ToyRunFunction(long sleepMs, String callLog) {
        this.sleepMs = sleepMs;
        this.callLog = callLog;
    }

    /** The toy's critical w of a member of mass m. */
    public static double criticalW(double massMsun) {
        return -1 - 0.1 * Math.log10(massMsun / 1e10);
    }

    /** The toy's noise on w for a seed and draw. */
    public static double noise(long seed, long draw) {
        return 0.03 * ZigguratSampler.NormalizedGaussian.of(
                RandomSource.L64_X128_MIX.create(seed ^ (0x9E3779B97F4A7C15L * (draw + 1)))).sample();
    }

    /** The toy's rip time at effective w. */
    public static double ripTimeGyr(double w) {
        return 28.0 / (3 * Math.abs(1 + w));
    }

    @Override
    public RunOutcome run(Path scenario, Overrides overrides, long seed, long draw, boolean sample, double untilGyr, Path snapshotDir) {
        Node root = ScenarioFile.open(scenario, overrides);
        Node cosmology = root.requireTable("cosmology");
        cosmology.number("h0");
        cosmology.number("omega_m");
        double w0 = cosmology.requireTable("dark_energy").number("w0");
        Node run = root.requireTable("run");
        double until = Double.isNaN(untilGyr) ? run.number("until_gyr") : untilGyr;
        run.number("snapshot_every_myr", 100);
        run.integer("seed", Long.MIN_VALUE, Long.MAX_VALUE, 1);
        GroupSpec group = GroupReader.read(root);
        overrides.checkAllUsed();
        double noise = 0;
        Map<String, Double> sampled = new TreeMap<>();
        if (sample) {
            noise = noise(seed, draw);
            sampled.put("toy.w_noise", noise);
        }
        double w = w0 + noise;
        List<MemberOutcome> fates = new ArrayList<>();
        int ripped = 0;
        Double firstRip = null;
        for (GalaxySpec g : group.galaxies()) {
            double t = ripTimeGyr(w);
            if (w < criticalW(g.massMsun()) && t <= until) {
                fates.add(new MemberOutcome(g.name(), "ripped", t, null));
                ripped++;
                firstRip = firstRip == null ? t : Math.min(firstRip, t);
            } else {
                fates.add(new MemberOutcome(g.name(), "bound", null, null));
            }
        }
        String verdict = ripped == 0 ? "bound" : ripped == fates.size() ? "dissolved" : "partly-bound";
        if (sleepMs > 0) {
            try {
                Thread.sleep(sleepMs);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted");
            }
        }
        if (callLog != null) {
            try {
                Files.writeString(Path.of(callLog), seed + " " + draw + " " + w0 + "\n", StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                        StandardOpenOption.APPEND);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return new RunOutcome(verdict, firstRip, fates, 1e-7 * (1 + Math.abs(w)), 0.0, sampled);
    }

    /** Writes the toy scenario: three members of 1e12, 1e11 and 1e10 Msun (w_c = -1.2, -1.1, -1.0). */
    public static Path writeScenario(Path dir) throws IOException {
        Path f = dir.resolve("toy-trio.toml");
        Files.writeString(f, String.join("\n",
                "name = \"Toy trio\"",
                "description = \"Three invented members for sweep tests\"",
                "[cosmology]",
                "h0 = 67.66",
                "omega_m = 0.3111",
                "[cosmology.dark_energy]",
                "w0 = -1.0",
                "wa = 0.0",
                "[run]",
                "until_gyr = 50",
                "snapshot_every_myr = 100",
                "seed = 1",
                "[[galaxy]]",
                "name = \"Orrimal\"",
                "mass_msun = 1e12",
                "position_kpc = [0, 0, 0]",
                "velocity_kms = [0, 0, 0]",
                "[[galaxy]]",
                "name = \"Vesk\"",
                "mass_msun = 1e11",
                "position_kpc = [300, 0, 0]",
                "velocity_kms = [0, 40, 0]",
                "[[galaxy]]",
                "name = \"Tupala\"",
                "mass_msun = 1e10",
                "position_kpc = [0, 500, 0]",
                "velocity_kms = [-20, 0, 0]",
                ""));
        return f;
    }
}
