package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JournalTest {

    @TempDir
    Path dir;

    static RunRecord record(long run, double t) {
        RunOutcome o = new RunOutcome("partly-bound", t, List.of(new MemberOutcome("Ilsor", "ripped", t, null),
                new MemberOutcome("Bram", "merged", 0.1 + 0.2, "Ilsor")), 3.3e-9, 0.25, Map.of("x.y", Math.PI));
        return new RunRecord(run, (int) run / 2, (int) run % 2, -1234567890123L * run, o);
    }

    @Test
    void recordsComeBackExactly() throws IOException {
        try (Journal j = Journal.open(dir)) {
            j.append(record(0, 1.0 / 3));
            j.append(record(1, Double.MIN_VALUE));
        }
        try (Journal j = Journal.open(dir)) {
            assertEquals(List.of(record(0, 1.0 / 3), record(1, Double.MIN_VALUE)), j.existing());
        }
    }

    @Test
    void aPartialLastLineIsCutOffAndAppendingContinuesCleanly() throws IOException {
        try (Journal j = Journal.open(dir)) {
            j.append(record(0, 1.5));
            j.append(record(1, 2.5));
        }
        Path f = dir.resolve(Journal.FILE);
        String text = Files.readString(f);
        Files.writeString(f, text.substring(0, text.length() - 17));
        try (Journal j = Journal.open(dir)) {
            assertEquals(List.of(record(0, 1.5)), j.existing());
            j.append(record(1, 2.5));
        }
        assertEquals(text, Files.readString(f));
    }

    @Test
    void aDamagedCompleteLineIsAnErrorNamingTheLine() throws IOException {
        Files.writeString(dir.resolve(Journal.FILE), "{\"run\":0}\n{nonsense}\n");
        IOException e = assertThrows(IOException.class, () -> Journal.open(dir).close());
        assertEquals(true, e.getMessage().contains("runs.jsonl:2"), e.getMessage());
    }
}
