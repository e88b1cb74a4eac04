package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * A real {@code holdfast evolve} told to quit mid-run (SIGTERM, as Ctrl+C or a batch scheduler
 * sends) stops at its next step and still writes its summary, with "cancelled" as the reason,
 * and leaves no half-written file behind.
 */
@Tag("slow")
class EvolveStopTest {

    @TempDir
    Path tmp;

    @Test
    void anEvolveToldToQuitWritesItsSummaryAndNothingHalfWritten() throws Exception {
        Path out = tmp.resolve("stopped");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = List.of(java, "-cp", System.getProperty("java.class.path"), Holdfast.class.getName(),
                "evolve", Path.of("..", "scenarios", "hollin-group.toml").toString(), "--out", out.toString(),
                "--set", "run.snapshot_every_myr=100");
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(tmp.resolve("log.txt").toFile())
                .start();
        Path snaps = out.resolve("snapshots");
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (count(snaps, ".h5") < 3 && p.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        assertTrue(p.isAlive(), "still running: " + Files.readString(tmp.resolve("log.txt")));
        p.destroy();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "quits");
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals("cancelled", summary.path("stop_reason").asText());
        double end = summary.path("end_gyr").asDouble();
        assertTrue(end > 0.2 && end < 40, "stopped mid-run at " + end);
        assertEquals(0, count(out, ".part") + count(snaps, ".part"), "no half-written file");
        assertEquals(0, count(out, ".part.png"));
    }

    private static long count(Path folder, String suffix) throws IOException {
        if (!Files.isDirectory(folder)) {
            return 0;
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(f -> f.getFileName().toString().endsWith(suffix)).count();
        }
    }
}
