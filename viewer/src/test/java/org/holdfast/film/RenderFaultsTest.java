package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.holdfast.replay.DemoRun;
import org.holdfast.viewer.HoldfastFull;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Faults of {@code holdfast render}: film lengths that overflow, output paths that cannot be
 * written, damaged snapshots, a quit while a scenario evolves, and kill -9 at random moments
 * (seeded) followed by the same command, which must finish the film byte for byte.
 */
class RenderFaultsTest {

    private static final long SEED = 0xF11AL;

    @TempDir
    Path dir;

    @Test
    void aFilmTooLongForAnIntIsRefusedNotWrappedRound() {
        for (String s : List.of("7.2e7", "1e8", "1e9", "1e300")) {
            Path out = dir.resolve("long-" + s);
            ViewRun.Result r = FilmRun.render(DemoRun.folder().toString(), "--seconds", s, "--out", out.toString());
            RenderCommandTest.assertOneLine(r, "--seconds", "999999");
            assertFalse(Files.exists(out));
        }
    }

    @Test
    void outputPathsThatCannotBeWrittenAreRefusedBeforeDrawing() throws IOException {
        Path file = dir.resolve("a-file");
        Files.writeString(file, "in the way");
        Path frames = dir.resolve("frames");
        RenderCommandTest.assertOneLine(FilmRun.render(DemoRun.folder().toString(), "--out",
                file.resolve("frames").toString()), "--out", "is in the way");
        RenderCommandTest.assertOneLine(FilmRun.render(DemoRun.folder().toString(), "--out", frames.toString(),
                "--video", file.resolve("film.mp4").toString()), "--video", "is in the way");
        RenderCommandTest.assertOneLine(FilmRun.render(DemoRun.folder().toString(), "--out", file.toString()), "--out");
        RenderCommandTest.assertOneLine(FilmRun.render(DemoRun.folder().toString(), "--still", "1", "--out",
                file.resolve("p.png").toString()), "--out", "is in the way");
        assertFalse(Files.exists(frames), "no frame drawn before the video path was checked");
        assertEquals("in the way", Files.readString(file));
    }

    @Test
    void anOutputFolderThatCannotBeWrittenIsRefusedBeforeDrawing() throws IOException {
        Path locked = Files.createDirectories(dir.resolve("locked"));
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            Assumptions.assumeFalse(Files.isWritable(locked), "running as a user who may write anywhere");
            RenderCommandTest.assertOneLine(FilmRun.render(DemoRun.folder().toString(), "--out",
                    locked.resolve("frames").toString()), "--out", "not writable");
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void damagedSnapshotsFoundWhileDrawingLeaveNoFilmBehind() throws IOException {
        Path run = copy(DemoRun.folder(), dir.resolve("damaged"));
        List<Path> snaps;
        try (Stream<Path> s = Files.list(run.resolve("snapshots"))) {
            snaps = s.sorted().toList();
        }
        // the later half keeps its header (times still read) but loses its arrays
        for (Path p : snaps.subList(snaps.size() / 2, snaps.size())) {
            byte[] b = Files.readAllBytes(p);
            Files.write(p, java.util.Arrays.copyOf(b, Math.min(b.length, 900)));
        }
        Path out = dir.resolve("frames");
        ViewRun.Result r = FilmRun.render(run.toString(), "--out", out.toString(), "--size", "64x64", "--seconds", "1");
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("not a readable snapshot"), r.err());
        assertFalse(Files.exists(out), "no film.json or frames left");

        // a folder that already held frames of this film keeps them, and only them
        Path good = dir.resolve("good-frames");
        assertEquals(0, FilmRun.render(DemoRun.folder().toString(), "--out", good.toString(), "--size", "64x64",
                "--seconds", "0.2", "--quiet").exitCode());
        List<String> before = names(good);
        assertEquals(2, FilmRun.render(run.toString(), "--out", good.toString(), "--size", "64x64", "--seconds",
                "0.2", "--quiet").exitCode());
        assertEquals(before, names(good));
    }

    @Test
    void aRenderOfAScenarioToldToQuitLeavesNoTemporaryRunFolder() throws Exception {
        Path tmpRoot = Files.createDirectories(dir.resolve("tmp"));
        List<String> args = new ArrayList<>(List.of("render", Path.of("..", "scenarios", "tethered-pair.toml").toString(),
                "--out", dir.resolve("quit-frames").toString(), "--size", "64x64", "--seconds", "1",
                "--set", "run.until_gyr=800", "--set", "run.snapshot_every_myr=20"));
        Process p = start(args, "-Djava.io.tmpdir=" + tmpRoot);
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (p.isAlive() && System.nanoTime() < deadline && snapshotsUnder(tmpRoot) < 3) {
            Thread.sleep(20);
        }
        assertTrue(p.isAlive(), "still evolving when told to quit");
        p.destroy(); // SIGTERM
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "quits");
        assertEquals(List.of(), names(tmpRoot), "the temporary run folder is removed");
    }

    @Test
    void aRenderKilledAtRandomMomentsFinishesByteForByteWhenRunAgain() throws Exception {
        Random rnd = new Random(SEED);
        List<String> base = List.of("render", DemoRun.folder().toString(), "--size", "96x64", "--fps", "10",
                "--seconds", "2", "--quiet", "--threads", "1");
        Path ref = dir.resolve("ref");
        long t0 = System.nanoTime();
        assertEquals(0, run(with(base, ref)));
        long ms = (System.nanoTime() - t0) / 1_000_000;
        List<String> refNames = names(ref);
        for (int k = 0; k < 3; k++) {
            Path out = dir.resolve("killed-" + k);
            long at = (long) (rnd.nextDouble() * ms);
            Process p = start(with(base, out));
            if (!p.waitFor(at, TimeUnit.MILLISECONDS)) {
                p.destroyForcibly();
                assertTrue(p.waitFor(30, TimeUnit.SECONDS));
            }
            assertEquals(0, run(with(base, out)), "the same render again, after a kill at " + at + " ms");
            assertEquals(refNames, names(out), "after a kill at " + at + " ms");
            for (String n : refNames) {
                assertArrayEquals(Files.readAllBytes(ref.resolve(n)), Files.readAllBytes(out.resolve(n)), n);
            }
        }
    }

    // ---- helpers --------------------------------------------------------------------------------

    private static List<String> with(List<String> base, Path out) {
        List<String> a = new ArrayList<>(base);
        a.addAll(List.of("--out", out.toString()));
        return a;
    }

    private Process start(List<String> args, String... jvm) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx512m", "-Djava.awt.headless=true"));
        cmd.addAll(List.of(jvm));
        cmd.addAll(List.of("-cp", System.getProperty("java.class.path"), HoldfastFull.class.getName()));
        cmd.addAll(args);
        return new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(dir.resolve("log-" + System.nanoTime() + ".txt").toFile()).start();
    }

    private int run(List<String> args) throws Exception {
        Process p = start(args);
        assertTrue(p.waitFor(180, TimeUnit.SECONDS), "finishes: " + args);
        return p.exitValue();
    }

    private static long snapshotsUnder(Path root) throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".h5")).count();
        } catch (java.io.UncheckedIOException e) {
            return 0; // a file vanished while walking
        }
    }

    private static List<String> names(Path d) throws IOException {
        if (!Files.isDirectory(d)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(d)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static Path copy(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
        return to;
    }
}
