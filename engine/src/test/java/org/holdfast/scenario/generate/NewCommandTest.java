package org.holdfast.scenario.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.cli.CommandRunner;
import org.holdfast.cli.Holdfast;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.scenario.GroupReader;
import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NewCommandTest {

    @TempDir
    Path tmp;

    private GroupSpec generate(Path file, String... options) {
        String[] args = new String[options.length + 3];
        args[0] = "new";
        args[1] = "--out";
        args[2] = file.toString();
        System.arraycopy(options, 0, args, 3, options.length);
        CommandRunner.Result r = CommandRunner.run(args);
        assertEquals(0, r.exitCode(), r.err());
        return GroupReader.read(ScenarioFile.open(file, Overrides.none()));
    }

    private static double virialRatio(GroupSpec g) {
        int n = g.galaxies().size();
        double[] m = new double[n];
        double[][] x = new double[n][];
        double[][] v = new double[n][];
        for (int i = 0; i < n; i++) {
            GalaxySpec s = g.galaxies().get(i);
            m[i] = s.massMsun();
            x[i] = s.positionKpc();
            v[i] = s.velocityKms();
        }
        return 2 * GroupGenerator.kineticEnergy(m, v) / Math.abs(GroupGenerator.potentialEnergy(m, x));
    }

    /** The virial ratio 2T/|W| of the written members (point masses) is the one asked for. */
    @Test
    void writtenGroupHasTheVirialRatioAskedFor() {
        for (double q : new double[] {0.3, 1.0, 1.7}) {
            GroupSpec g = generate(tmp.resolve("q" + q + ".toml"), "--giants", "3", "--dwarfs", "9", "--mass", "4e12",
                    "--radius-kpc", "700", "--virial-ratio", Double.toString(q), "--seed", "21");
            assertEquals(12, g.galaxies().size());
            assertEquals(q, virialRatio(g), 1e-12 * q);
        }
    }

    @Test
    void groupIsInItsCentreOfMassFrameWithTheTotalMassAndInventedUniqueNames() {
        GroupSpec g = generate(tmp.resolve("g.toml"), "--giants", "2", "--dwarfs", "5", "--mass", "3e12",
                "--radius-kpc", "500", "--seed", "4");
        double mt = 0;
        double[] p = new double[3];
        double[] v = new double[3];
        Set<String> names = new HashSet<>();
        for (GalaxySpec s : g.galaxies()) {
            mt += s.massMsun();
            for (int k = 0; k < 3; k++) {
                p[k] += s.massMsun() * s.positionKpc()[k];
                v[k] += s.massMsun() * s.velocityKms()[k];
            }
            double r = Math.sqrt(s.positionKpc()[0] * s.positionKpc()[0] + s.positionKpc()[1] * s.positionKpc()[1]
                    + s.positionKpc()[2] * s.positionKpc()[2]);
            assertTrue(r < 2 * 500, s.name() + " at " + r + " kpc");
            assertTrue(s.name().matches("[A-Z][a-z]+"), s.name());
            names.add(s.name());
            assertEquals("nfw", s.halo().profile());
        }
        assertEquals(3e12, mt, 3e12 * 1e-14); // round-off of a sum of seven
        for (int k = 0; k < 3; k++) {
            assertEquals(0, p[k] / mt, 1e-9);
            assertEquals(0, v[k] / mt, 1e-9);
        }
        assertEquals(7, names.size());
        // The two giants come first and outweigh every dwarf (their mass ranges do not overlap).
        double lightestGiant = Math.min(g.galaxies().get(0).massMsun(), g.galaxies().get(1).massMsun());
        for (GalaxySpec s : g.galaxies().subList(2, 7)) {
            assertTrue(s.massMsun() < lightestGiant);
        }
    }

    /** --help: "Members lie inside a sphere of this radius around their centre of mass". */
    @Test
    void everyMemberLiesInsideTheRadiusAroundTheCentreOfMass() {
        // Seed 4 with 600 kpc put a member 733 kpc out before positions were fitted after centring.
        for (int seed = 1; seed <= 30; seed++) {
            GroupRecipe r = new GroupRecipe(2, seed <= 10 ? 4 : 1 + seed % 7, 3e12, 600, 1.0, seed, 50, 0, 0);
            double far = 0;
            for (GroupGenerator.Member m : GroupGenerator.generate(r)) {
                double[] p = m.positionKpc();
                far = Math.max(far, Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]));
            }
            assertTrue(far <= 600 * (1 + 1e-12), "seed " + seed + ": a member " + far + " kpc out");
        }
    }

    @Test
    void cosmologyIsPlanck2018AndTheSameSeedGivesTheSameFile() throws Exception {
        Path a = tmp.resolve("a.toml");
        Path b = tmp.resolve("b.toml");
        Path c = tmp.resolve("c.toml");
        generate(a, "--seed", "9");
        generate(b, "--seed", "9");
        generate(c, "--seed", "10");
        assertEquals(Files.readString(a), Files.readString(b));
        assertNotEquals(Files.readString(a), Files.readString(c));
        Node root = ScenarioFile.open(a, Overrides.none());
        // Planck 2018 results VI (A&A 641, A6, 2020), Table 2, TT,TE,EE+lowE+lensing+BAO.
        assertEquals(67.66, root.requireTable("cosmology").number("h0"));
        assertEquals(0.3111, root.requireTable("cosmology").number("omega_m"));
        assertEquals(-1.0, root.requireTable("cosmology").requireTable("dark_energy").number("w0"));
    }

    @Test
    void standardOutputWhenNoFileIsGiven() {
        CommandRunner.Result r = CommandRunner.run("new", "--giants", "1", "--dwarfs", "1", "--seed", "3");
        assertEquals(0, r.exitCode(), r.err());
        Node root = ScenarioFile.parse(Path.of("stdout.toml"), r.out(), Overrides.none(),
                org.holdfast.schema.NumberReader.PLAIN);
        assertEquals(2, GroupReader.read(root).galaxies().size());
    }

    /**
     * Dutton &amp; Macci&ograve; 2014 (MNRAS 441, 3359, eqs. 7-8 at z = 0, from memory): at
     * M_200 = 10^12 h^-1 Msun the concentration is 10^0.905, and it falls as M^-0.101.
     */
    @Test
    void concentrationFollowsTheCitedRelation() {
        double h = GroupGenerator.PLANCK18_H0 / 100;
        assertEquals(Math.pow(10, 0.905), GroupGenerator.concentration(1e12 / h), 1e-12);
        assertEquals(Math.pow(10, -0.101), GroupGenerator.concentration(1e13 / h) / GroupGenerator.concentration(1e12 / h), 1e-12);
    }

    /**
     * r_200 of 10^12 Msun for H0 = 67.66: with rho_crit = 2.775e11 h^2 Msun/Mpc^3 (common
     * practice) = 127.04 Msun/kpc^3, r_200 = (3 M / (800 pi rho_crit))^(1/3) = 211.0 kpc.
     */
    @Test
    void r200MatchesTheCriticalDensityEstimate() {
        assertEquals(211.0, GroupGenerator.r200Kpc(1e12), 0.3);
    }

    /** Inverse-CDF draws from dN/dM ~ M^-1.9 have the analytic mean (to 4 standard errors). */
    @Test
    void massFunctionDrawsHaveTheAnalyticMean() {
        UniformRandomProvider rng = RandomSource.L64_X128_MIX.create(77L);
        double lo = 0.001;
        double hi = 0.025;
        int n = 200_000;
        double sum = 0;
        double sum2 = 0;
        for (int i = 0; i < n; i++) {
            double m = GroupGenerator.powerLaw(lo, hi, rng.nextDouble());
            assertTrue(m >= lo && m <= hi);
            sum += m;
            sum2 += m * m;
        }
        double a = GroupGenerator.ALPHA;
        double mean = (1 - a) / (2 - a) * (Math.pow(hi, 2 - a) - Math.pow(lo, 2 - a))
                / (Math.pow(hi, 1 - a) - Math.pow(lo, 1 - a));
        double sampleMean = sum / n;
        double se = Math.sqrt((sum2 / n - sampleMean * sampleMean) / n);
        assertEquals(mean, sampleMean, 4 * se);
    }

    @Test
    void badOptionsAreOneLineAndExitCodeTwo() throws Exception {
        // Each case: the arguments, then the option the message must name.
        for (List<String> c : List.of(List.of("new", "--giants", "1", "--dwarfs", "0", "--giants"),
                List.of("new", "--mass", "-1", "--mass"), List.of("new", "--virial-ratio", "-0.5", "--virial-ratio"),
                List.of("new", "--radius-kpc", "0", "--radius-kpc"), List.of("new", "--giants", "x", "--giants"))) {
            List<String> args = c.subList(0, c.size() - 1);
            CommandRunner.Result r = CommandRunner.run(args.toArray(String[]::new));
            assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), args + ": " + r.err());
            assertTrue(r.err().contains(c.get(c.size() - 1)), r.err());
        }
        Path exists = tmp.resolve("exists.toml");
        Files.writeString(exists, "keep me");
        CommandRunner.Result r = CommandRunner.run("new", "--out", exists.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertEquals("keep me", Files.readString(exists));
        CommandRunner.Result under = CommandRunner.run("new", "--out", exists.resolve("g.toml").toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, under.exitCode(), under.err());
        assertTrue(under.err().startsWith("holdfast new: --out: cannot create the folder " + exists + ": "), under.err());
        assertEquals(1, under.err().strip().lines().count(), under.err());
    }
}
