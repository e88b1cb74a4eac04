package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.Callable;

import org.holdfast.output.RunFolder;
import org.holdfast.schema.ScenarioException;
import org.holdfast.scenario.generate.GroupGenerator;
import org.holdfast.scenario.generate.GroupRecipe;
import org.holdfast.scenario.generate.ScenarioText;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast new}: a scenario of a random, plausible group. */
@Command(name = "new",
        mixinStandardHelpOptions = true,
        header = "Write a scenario of a random, plausible group.",
        description = {
            "Writes a scenario of a random group with invented names: masses from a",
            "power-law mass function, places uniform in a sphere (then centred on the",
            "centre of mass, drawn in if that moved a member outside), velocities scaled to",
            "the virial ratio 2T/|W| asked for (point masses), NFW halos from a",
            "mass-concentration relation, Planck 2018 cosmology.",
            "",
            "Example:",
            "  holdfast new --giants 2 --dwarfs 6 --mass 3e12 --radius-kpc 600 \\",
            "      --virial-ratio 0.8 --seed 11 --out scenarios/random-group.toml"
        })
public final class NewCommand implements Callable<Integer> {

    /** Most members one generated group may have. */
    static final int MAX_MEMBERS = 2000;

    @Option(names = "--giants", paramLabel = "N", defaultValue = "2", description = "Large members (default: ${DEFAULT-VALUE}).")
    int giants;

    @Option(names = "--dwarfs", paramLabel = "M", defaultValue = "4", description = "Small members (default: ${DEFAULT-VALUE}).")
    int dwarfs;

    @Option(names = "--mass", paramLabel = "MSUN", defaultValue = "3e12", description = "Total mass in Msun (default: ${DEFAULT-VALUE}).")
    double massMsun;

    @Option(names = "--radius-kpc", paramLabel = "R", defaultValue = "500",
            description = "Members lie inside a sphere of this radius around their centre of mass (default: ${DEFAULT-VALUE}).")
    double radiusKpc;

    @Option(names = "--virial-ratio", paramLabel = "Q", defaultValue = "1",
            description = "2T/|W| of the members as point masses; 1 = virial equilibrium, 0 = at rest (default: ${DEFAULT-VALUE}).")
    double virialRatio;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--until-gyr", paramLabel = "GYR", defaultValue = "50", description = "until_gyr of the scenario (default: ${DEFAULT-VALUE}).")
    double untilGyr;

    @Option(names = "--stars-per-giant", paramLabel = "N", defaultValue = "2000", description = "Star tracers of a giant (default: ${DEFAULT-VALUE}).")
    int starsPerGiant;

    @Option(names = "--stars-per-dwarf", paramLabel = "N", defaultValue = "200", description = "Star tracers of a dwarf (default: ${DEFAULT-VALUE}).")
    int starsPerDwarf;

    @Option(names = "--out", paramLabel = "FILE", description = "Write here (default: standard output).")
    Path out;

    @Option(names = "--force", description = "Replace an existing --out file.")
    boolean force;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        check(giants >= 0, "--giants", "must be >= 0 (got " + giants + ")");
        check(dwarfs >= 0, "--dwarfs", "must be >= 0 (got " + dwarfs + ")");
        check(giants + dwarfs >= 2, "--giants", "a group needs at least two members (giants + dwarfs >= 2)");
        check(giants + dwarfs <= MAX_MEMBERS, "--dwarfs", "at most " + MAX_MEMBERS + " members in all");
        check(massMsun > 0 && Double.isFinite(massMsun), "--mass", "must be a positive number of Msun");
        check(radiusKpc > 0 && Double.isFinite(radiusKpc), "--radius-kpc", "must be a positive number of kpc");
        check(virialRatio >= 0 && Double.isFinite(virialRatio), "--virial-ratio", "must be >= 0 (got " + virialRatio + ")");
        check(untilGyr != 0 && Double.isFinite(untilGyr), "--until-gyr", "must be a finite, non-zero time");
        check(starsPerGiant >= 0, "--stars-per-giant", "must be >= 0");
        check(starsPerDwarf >= 0, "--stars-per-dwarf", "must be >= 0");
        if (out != null && Files.exists(out) && !force) {
            throw new ScenarioException("--out", out.toString(), "exists already; add --force to replace it");
        }
        GroupRecipe r = new GroupRecipe(giants, dwarfs, massMsun, radiusKpc, virialRatio, seed, untilGyr,
                starsPerGiant, starsPerDwarf);
        List<GroupGenerator.Member> members = GroupGenerator.generate(r);
        String text = ScenarioText.of(r, members);
        PrintWriter stdout = spec.commandLine().getOut();
        if (out == null) {
            stdout.print(text);
        } else {
            Path abs = out.toAbsolutePath();
            Path parent = out.getParent() != null ? out.getParent() : abs.getParent();
            Path created = RunFolder.makeFolder(parent, "--out");
            Path tmp = abs.resolveSibling(abs.getFileName() + ".tmp");
            try {
                Files.writeString(tmp, text, StandardCharsets.UTF_8);
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            } catch (java.io.IOException e) {
                Files.deleteIfExists(tmp);
                RunFolder.removeCreated(parent, created);
                throw new ScenarioException("--out", null, "cannot write " + out + ": " + RunFolder.reason(e));
            }
            stdout.println("new: wrote " + out + " (" + members.size() + " members)");
        }
        stdout.flush();
        return 0;
    }

    private static void check(boolean ok, String option, String message) {
        if (!ok) {
            throw new ScenarioException(option, null, message);
        }
    }
}
