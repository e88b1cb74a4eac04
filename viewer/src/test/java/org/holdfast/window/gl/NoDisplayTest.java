package org.holdfast.window.gl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.holdfast.window.PatternViewMain;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Without a display the view must fail with exit code 2 and one line that points to
 * {@code holdfast render}. Each case runs in a child JVM whose environment lacks a working display.
 */
@Tag("slow")
class NoDisplayTest {

    @TempDir
    Path dir;

    private record Child(int exitCode, String out, String err) {
    }

    private Child runWithout(Map<String, String> display) throws Exception {
        Path shot = dir.resolve("never.png");
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-Djava.awt.headless=true");
        cmd.add("-cp");
        cmd.add(System.getProperty("java.class.path"));
        cmd.add(PatternViewMain.class.getName());
        cmd.addAll(List.of("view", dir.toString(), "--frames", "2", "--screenshot", shot.toString()));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        pb.environment().putAll(display);
        pb.redirectOutput(dir.resolve("out.txt").toFile());
        pb.redirectError(dir.resolve("err.txt").toFile());
        Process p = pb.start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "child finished");
        Child c = new Child(p.exitValue(), Files.readString(dir.resolve("out.txt"), StandardCharsets.UTF_8),
                Files.readString(dir.resolve("err.txt"), StandardCharsets.UTF_8));
        assertFalse(Files.exists(shot), "no screenshot without a window");
        return c;
    }

    private static void assertOneLineToRender(Child c, String reason) {
        assertEquals(2, c.exitCode(), c.err());
        String err = c.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        assertFalse(err.contains("Exception"), err);
        assertTrue(err.startsWith("holdfast view: "), err);
        assertTrue(err.contains(reason), err);
        assertTrue(err.contains("holdfast render"), err);
    }

    @Test
    void noDisplaySetSuggestsRender() throws Exception {
        assertOneLineToRender(runWithout(Map.of()), "DISPLAY is not set");
    }

    @Test
    void displayThatCannotBeOpenedSuggestsRender() throws Exception {
        assertOneLineToRender(runWithout(Map.of("DISPLAY", ":" + (900 + (int) (ProcessHandle.current().pid() % 90)))),
                "would not start on display");
    }

    @Test
    void childSeesTheTestClasspath() {
        assertTrue(System.getProperty("java.class.path").contains("test-classes"),
                "the child JVM needs the test classes: " + System.getProperty("java.class.path").split(File.pathSeparator)[0]);
    }
}
