package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class HoldfastTest {

    @Test
    void versionNamesTheProject() {
        CommandRunner.Result r = CommandRunner.run("--version");
        assertEquals(0, r.exitCode());
        assertTrue(r.out().startsWith("holdfast "), r.out());
        assertTrue(!r.out().contains("${"), "version resource must be filtered: " + r.out());
    }

    @Test
    void unknownOptionIsExitCodeTwoWithOneLine() {
        CommandRunner.Result r = CommandRunner.run("--no-such-option");
        assertEquals(Holdfast.EXIT_BAD_INPUT, r.exitCode());
        assertTrue(r.err().contains("--no-such-option"), r.err());
        assertTrue(!r.err().contains("Exception"), r.err());
    }
}
