package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.schema.ScenarioException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The w(a) table reader names the line of each problem, counting comments and blank lines. */
class WTableCsvTest {

    @TempDir
    Path dir;

    private String error(String text) throws IOException {
        Path csv = Files.writeString(dir.resolve("w.csv"), text);
        return assertThrows(ScenarioException.class, () -> WTableCsv.read(csv)).getMessage();
    }

    @Test
    void problemsAreNamedByTheirLine() throws IOException {
        assertTrue(error("# a comment\n\na , w\n0.5,-1\n# another\n\n0.8,minus one\n2,-1\n").contains("w.csv:7"));
        assertTrue(error("a,w\n0.5,-1\n0.4,-1").contains("w.csv:3"), "the last line without a line break");
        assertTrue(error("a,w\n0.5,-1,3\n2,-1\n").contains("w.csv:2"));
        assertTrue(error("# only\nscale,eos\n0.5,-1\n").contains("w.csv:2"));
        assertTrue(error("a,w\n-0.5,-1\n2,-1\n").contains("w.csv:2"));
    }

    @Test
    void aGoodTableIsReadWhole() throws IOException {
        Path csv = Files.writeString(dir.resolve("w.csv"), "# constant w\na,w\n0.25, -1.2\n\n1.5,-1.2\n4,-1.2");
        TabulatedW w = WTableCsv.read(csv);
        assertEquals(-1.2, w.w(1.0), 1e-15);
    }
}
