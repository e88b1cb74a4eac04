package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The friction and merger keys of a scenario: bad values are one line naming file, line and key. */
class FateKeysTest {

    @TempDir
    Path dir;

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "dynamical_friction = 3|7|run.dynamical_friction",
        "coulomb_log = -1|7|run.coulomb_log",
        "coulomb_log = \"chandra\"|7|run.coulomb_log",
        "merge_within_kpc = -5|7|run.merge_within_kpc",
        "until_gyr = -2 NL merge_within_kpc = 10|7|run.merge_within_kpc"})
    void badRunKeysNameTheirLine(String line, int lineNo, String key) throws IOException {
        String text = ValidateCommandTest.HEAD.replace("until_gyr = 10\n", line.contains("until_gyr") ? "" : "until_gyr = 10\n")
                + line.replace(" NL ", "\n") + "\n" + ValidateCommandTest.PAIR;
        Path f = dir.resolve("s.toml");
        Files.writeString(f, text);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString());
        assertEquals(2, r.exitCode(), r.out() + r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains(key), r.err());
        assertTrue(r.err().contains("s.toml:" + lineNo), r.err());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"coulomb_log = 0", "coulomb_log = \"sometimes\""})
    void aBadMemberCoulombLogNamesTheMember(String line) throws IOException {
        String text = ValidateCommandTest.HEAD + "dynamical_friction = true\n"
                + ValidateCommandTest.PAIR.replace("name = \"Bel\"\n", "name = \"Bel\"\n" + line + "\n");
        Path f = dir.resolve("s.toml");
        Files.writeString(f, text);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString());
        assertEquals(2, r.exitCode(), r.out() + r.err());
        assertTrue(r.err().contains("coulomb_log"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"coulomb_log = 4.5", "coulomb_log = \"hashimoto2003\""})
    void goodValuesAreAccepted(String line) throws IOException {
        String text = ValidateCommandTest.HEAD + "dynamical_friction = true\nmerge_within_kpc = 15\n" + line + "\n"
                + ValidateCommandTest.PAIR;
        Path f = dir.resolve("s.toml");
        Files.writeString(f, text);
        CommandRunner.Result r = CommandRunner.run("validate", f.toString());
        assertEquals(0, r.exitCode(), r.err());
    }
}
