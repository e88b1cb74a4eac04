package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

@Tag("slow")
class ValidateCommandTest {

    static final String HEAD = """
            name = "Two of a kind"
            [cosmology]
            h0 = 70
            omega_m = 0.3
            [run]
            until_gyr = 10
            """;

    static final String PAIR = """
            [[galaxy]]
            name = "Arn"
            mass_msun = 3e12
            position_kpc = [100, 0, 0]
            velocity_kms = [0, 10, 0]
            halo = { profile = "nfw", concentration = 10 }
            [[galaxy]]
            name = "Bel"
            mass_msun = 1e12
            position_kpc = [-300, 0, 0]
            velocity_kms = [0, -30, 0]
            """;

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path f = dir.resolve("s.toml");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void jsonShowsTheMembersInTheCentreOfMassFrame() throws IOException {
        Path f = write(HEAD + PAIR);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString(), "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode g = j.get("galaxies");
        assertEquals(2, g.size());
        // Centre of mass: (3e12 * 100 + 1e12 * -300) / 4e12 = 0, momentum (3*10 - 1*30) = 0.
        assertEquals(100, g.get(0).get("position_kpc").get(0).asDouble(), 1e-9);
        assertEquals(-300, g.get(1).get("position_kpc").get(0).asDouble(), 1e-9);
        double px = 3e12 * g.get(0).get("velocity_kms").get(1).asDouble() + 1e12 * g.get(1).get("velocity_kms").get(1).asDouble();
        assertEquals(0, px, 1e-3);
        assertEquals(0, j.get("tracers").get("total").asLong());
    }

    @Test
    void anOverrideChangesAMemberByName() throws IOException {
        Path f = write(HEAD + PAIR);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString(), "--json",
                "--set", "galaxy.Bel.mass_msun=3e12");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode g = new ObjectMapper().readTree(r.out()).get("galaxies");
        assertEquals(3e12, g.get(1).get("mass_msun").asDouble());
        // Equal masses: the centre of mass is halfway, at -100.
        assertEquals(200, g.get(0).get("position_kpc").get(0).asDouble(), 1e-9);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "unknown key      | mass_msun = 3e12|masss_msun = 3e12 | s.toml:9: galaxy.Arn.masss_msun: unknown key (did you mean 'mass_msun'?)",
        "wrong type       | mass_msun = 3e12|mass_msun = \"big\" | s.toml:9: galaxy.Arn.mass_msun: expected a number",
        "mass zero        | mass_msun = 3e12|mass_msun = 0 | s.toml:9: galaxy.Arn.mass_msun: must be > 0",
        "missing mass     | mass_msun = 3e12|# no mass | galaxy.Arn: galaxy 'Arn' has no mass_msun",
        "duplicate name   | name = \"Bel\"|name = \"Arn\" | s.toml:14: galaxy.Arn.name: duplicate galaxy name 'Arn' (first used at line 8)",
        "same place       | position_kpc = [-300, 0, 0]|position_kpc = [100, 0, 0] | s.toml:16: galaxy.Bel.position_kpc: galaxy 'Bel' is at the same place as 'Arn'",
        "unknown profile  | profile = \"nfw\"|profile = \"nfx\" | galaxy.Arn.halo.profile: unknown value 'nfx' (did you mean 'nfw'?)",
        "too many tracers | velocity_kms = [0, -30, 0]|stars = { count = 2000000000, radius_kpc = 3 } | more than the 100000000 one run can hold",
        "faster than c    | velocity_kms = [0, -30, 0]|velocity_kms = [0, 1e6, 0] | s.toml:17: galaxy.Bel.velocity_kms: a speed of 1.00000e+06 km/s is not below the speed of light (299792 km/s)",
        "as fast as c     | velocity_kms = [0, -30, 0]|velocity_kms = [299792.458, 0, 0] | s.toml:17: galaxy.Bel.velocity_kms: a speed of 299792 km/s is not below the speed of light",
        "dispersion >= c  | velocity_kms = [0, -30, 0]|stars = { count = 20, radius_kpc = 3, dispersion_kms = 4e5 } | galaxy.Bel.stars.dispersion_kms: must be below the speed of light",
    })
    void badInputIsOneLineNamingFileLineAndKey(String what, String from, String to, String expected) throws IOException {
        String text = HEAD + PAIR;
        int at = what.equals("duplicate name") || what.equals("same place") || what.equals("too many tracers")
                || what.contains(" c") ? text.lastIndexOf(from) : text.indexOf(from);
        text = text.substring(0, at) + to + text.substring(at + from.length());
        Path f = write(text);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString());
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode(), what + ": " + r.out() + r.err());
        assertTrue(r.err().contains(expected), what + ": " + r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void aSpeedAboveATenthOfCIsAllowedWithAWarning() throws IOException {
        Path f = write(HEAD + PAIR.replace("velocity_kms = [0, -30, 0]", "velocity_kms = [0, -40000, 0]"));
        CommandRunner.Result r = CommandRunner.run("validate", f.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("  warning: " + f + ":17: galaxy.Bel.velocity_kms: a speed of 4.000e+04 km/s is"
                + " 0.13 c, above 0.1 c, where the Newtonian model is doubtful"), r.out());
        CommandRunner.Result slow = CommandRunner.run("validate", write(HEAD + PAIR).toString());
        assertFalse(slow.out().contains("warning"), slow.out());
        CommandRunner.Result set = CommandRunner.run("validate", write(HEAD + PAIR).toString(),
                "--set", "galaxy.Bel.velocity_kms.1=-3e5");
        assertEquals(Holdfast.EXIT_BAD_INPUT, set.exitCode(), set.err());
        assertTrue(set.err().contains("--set: galaxy.Bel.velocity_kms: a speed of 300000 km/s is not below the speed"
                + " of light"), set.err());
    }

    @Test
    void anOverrideOfAKeyThatDoesNotExistIsReported() throws IOException {
        Path f = write(HEAD + PAIR);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString(), "--set", "galaxy.Cid.mass_msun=1");
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertTrue(r.err().contains("--set: galaxy.Cid.mass_msun: no such key in this scenario"), r.err());
    }

    @Test
    void theShippedScenariosAreValid() throws IOException {
        try (var files = Files.list(Path.of("..", "scenarios"))) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".toml"))::iterator) {
                if (Files.readString(f).contains("[[galaxy]]")) {
                    CommandRunner.Result r = CommandRunner.run("validate", f.toString());
                    assertEquals(0, r.exitCode(), f + ": " + r.err());
                }
            }
        }
    }
}
