package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;

import org.holdfast.render.FrameFiles;
import org.holdfast.replay.DemoRun;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code holdfast render} on the cut-down demo run: frames, restarts, threads, the looks. */
@Tag("slow")
class RenderCommandTest {

    @TempDir
    Path dir;

    private static String run() {
        return DemoRun.folder().toString();
    }

    private ViewRun.Result demoFilm(Path out, String... more) {
        return demoFilmSized(out, "64x36", more);
    }

    private ViewRun.Result demoFilmSized(Path out, String size, String... more) {
        String[] base = {run(), "--film", DemoRun.FILM.toString(), "--size", size, "--fps", "4", "--seconds", "1",
            "--to-gyr", "2", "--out", out.toString(), "--quiet"};
        String[] all = new String[base.length + more.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return FilmRun.render(all);
    }

    @Test
    void theDemoFilmRendersAtTinySize() throws Exception {
        Path out = dir.resolve("frames");
        ViewRun.Result r = demoFilm(out);
        assertEquals(0, r.exitCode(), r.err());
        for (int i = 1; i <= 4; i++) {
            BufferedImage img = FilmRun.image(out.resolve(FrameFiles.name(i)));
            assertEquals(64, img.getWidth());
            assertEquals(36, img.getHeight());
            assertTrue(FilmRun.litPixels(img) > 20, "frame " + i + " shows the group");
        }
        assertFalse(Files.exists(out.resolve(FrameFiles.name(5))), "1 s at 4 frames per second is 4 frames");
        assertTrue(Files.isRegularFile(out.resolve(FilmManifest.FILE)));
        // The camera circles and the clock runs: the first and last frames differ.
        assertTrue(FilmRun.maxDifference(FilmRun.image(out.resolve(FrameFiles.name(1))),
                FilmRun.image(out.resolve(FrameFiles.name(4)))) > 50);
    }

    @Test
    void aRestartSkipsFinishedFramesAndRedrawsMissingOnesIdentically() throws Exception {
        Path out = dir.resolve("frames");
        assertEquals(0, demoFilm(out).exitCode());
        byte[] second = Files.readAllBytes(out.resolve(FrameFiles.name(2)));
        Files.delete(out.resolve(FrameFiles.name(2)));
        FileTime old = FileTime.fromMillis(86_400_000L);
        Files.setLastModifiedTime(out.resolve(FrameFiles.name(1)), old);
        ViewRun.Result r = FilmRun.render(run(), "--film", DemoRun.FILM.toString(), "--size", "64x36", "--fps", "4",
                "--seconds", "1", "--to-gyr", "2", "--out", out.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("1 frames drawn, 3 already there"), r.out());
        assertArrayEquals(second, Files.readAllBytes(out.resolve(FrameFiles.name(2))));
        assertEquals(old, Files.getLastModifiedTime(out.resolve(FrameFiles.name(1))), "frame 1 was not redrawn");
    }

    @Test
    void aFolderOfAnotherFilmIsNotMixedWithThisOne() throws Exception {
        Path out = dir.resolve("frames");
        assertEquals(0, demoFilm(out).exitCode());
        byte[] first = Files.readAllBytes(out.resolve(FrameFiles.name(1)));
        ViewRun.Result r = FilmRun.render(run(), "--film", DemoRun.FILM.toString(), "--size", "32x18", "--fps", "4",
                "--seconds", "1", "--to-gyr", "2", "--out", out.toString());
        assertOneLine(r, "--out", "different film");
        assertArrayEquals(first, Files.readAllBytes(out.resolve(FrameFiles.name(1))));
    }

    @Test
    void theFirstFrameShowsFromGyrAndTheLastFrameToGyr() throws Exception {
        Path out = dir.resolve("frames");
        String[] film = {"--film", DemoRun.FILM.toString(), "--size", "64x36", "--quiet"};
        ViewRun.Result r = FilmRun.render(concat(new String[] {run(), "--from-gyr", "0.5", "--to-gyr", "2",
            "--seconds", "1", "--fps", "3", "--out", out.toString()}, film));
        assertEquals(0, r.exitCode(), r.err());
        assertFalse(Files.exists(out.resolve(FrameFiles.name(4))), "three frames");
        String manifest = Files.readString(out.resolve(FilmManifest.FILE));
        assertTrue(manifest.contains("\"first_gyr\" : 0.5") && manifest.contains("\"last_gyr\" : 2.0"), manifest);
        // a still of the same film at a time shows what the frame at that time shows
        String[] times = {"0.5", "1.25", "2"};
        for (int i = 1; i <= 3; i++) {
            Path still = dir.resolve("still-" + i + ".png");
            ViewRun.Result s = FilmRun.render(concat(new String[] {run(), "--from-gyr", "0.5", "--to-gyr", "2",
                "--seconds", "1", "--fps", "3", "--still", times[i - 1], "--out", still.toString()}, film));
            assertEquals(0, s.exitCode(), s.err());
            assertEquals(0, FilmRun.maxDifference(FilmRun.image(still), FilmRun.image(out.resolve(FrameFiles.name(i)))),
                    "frame " + i + " shows " + times[i - 1] + " Gyr");
        }
    }

    @Test
    void aFolderOfTheSameEndsButAnotherCountdownIsNotMixedWithThisOne() throws Exception {
        Path out = dir.resolve("frames");
        String film = """
                [film]
                length_s = 1
                frame_rate = 3
                frame_px = [32, 18]
                clock = "countdown"
                from_gyr = 0
                to_gyr = 2
                final_gyr = 3
                camera = "orbit"
                [film.orbit]
                radius_kpc = 800
                """;
        Path first = Files.writeString(dir.resolve("countdown-a.toml"), film);
        Path second = Files.writeString(dir.resolve("countdown-b.toml"), film.replace("final_gyr = 3", "final_gyr = 9"));
        assertEquals(0, FilmRun.render(run(), "--film", first.toString(), "--out", out.toString(), "--quiet").exitCode());
        byte[] middle = Files.readAllBytes(out.resolve(FrameFiles.name(2)));
        ViewRun.Result again = FilmRun.render(run(), "--film", first.toString(), "--out", out.toString());
        assertEquals(0, again.exitCode(), again.err());
        assertTrue(again.out().contains("0 frames drawn, 3 already there"), again.out());
        // same first and last frame times, other times between: another film
        ViewRun.Result r = FilmRun.render(run(), "--film", second.toString(), "--out", out.toString());
        assertOneLine(r, "--out", "different film");
        assertArrayEquals(middle, Files.readAllBytes(out.resolve(FrameFiles.name(2))));
    }

    /** A film that follows a member says so in film.json; an unknown member is refused by name. */
    @Test
    void aFollowingFilmRecordsItsMemberAndAnUnknownOneIsRefused() throws Exception {
        String film = """
                [film]
                length_s = 1
                frame_rate = 2
                frame_px = [32, 18]
                to_gyr = 2
                camera = "orbit"
                follow = "%s"
                [film.orbit]
                radius_kpc = 300
                """;
        Path out = dir.resolve("frames");
        Path good = Files.writeString(dir.resolve("follow.toml"), String.format(film, "Bracken"));
        ViewRun.Result r = FilmRun.render(run(), "--film", good.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(Files.readString(out.resolve(FilmManifest.FILE)).contains("\"follow\" : \"Bracken\""));
        Path wrong = Files.writeString(dir.resolve("wrong.toml"), String.format(film, "Nobody"));
        assertOneLine(FilmRun.render(run(), "--film", wrong.toString(), "--still", "1", "--out",
                dir.resolve("never.png").toString()), "wrong.toml", "film.follow", "Nobody", "Bracken");
        assertFalse(Files.exists(dir.resolve("never.png")));
    }

    /**
     * A camera that follows a member is its track moved with that member's centre: a still of an
     * orbit round the origin following Bracken matches the still of the same orbit centred where
     * Bracken is then (up to rounding: the two compute the view direction from different sums, so
     * a few splats can land on the next sub-pixel phase), and differs from the orbit round the origin.
     */
    @Test
    void aFollowingCameraRidesWithItsMember() throws Exception {
        double t = 1.3;
        double[] b = new double[3];
        assertTrue(new org.holdfast.replay.ReplayScene(org.holdfast.replay.RunArchive.open(DemoRun.folder()))
                .centreOf("Bracken", t, b));
        String orbit = """
                [film]
                length_s = 4
                frame_rate = 4
                frame_px = [96, 54]
                to_gyr = 2
                camera = "orbit"
                %s
                [film.orbit]
                centre_kpc = [%s, %s, %s]
                radius_kpc = 300
                rise_kpc = 100
                turns = 0.3
                """;
        BufferedImage[] shots = new BufferedImage[3];
        String[][] variants = {{"follow = \"Bracken\"", "0", "0", "0"},
            {"", Double.toString(b[0]), Double.toString(b[1]), Double.toString(b[2])}, {"", "0", "0", "0"}};
        for (int k = 0; k < 3; k++) {
            Path film = Files.writeString(dir.resolve("orbit-" + k + ".toml"),
                    String.format(java.util.Locale.ROOT, orbit, (Object[]) variants[k]));
            Path png = dir.resolve("orbit-" + k + ".png");
            ViewRun.Result r = FilmRun.render(run(), "--film", film.toString(), "--still", Double.toString(t), "--out",
                    png.toString(), "--quiet");
            assertEquals(0, r.exitCode(), r.err());
            shots[k] = FilmRun.image(png);
        }
        int pixels = 96 * 54;
        assertTrue(differing(shots[0], shots[1]) < pixels / 100, "following = centred on the member");
        assertTrue(differing(shots[0], shots[2]) > pixels / 20, "following differs from circling the origin");
    }

    /** Pixels whose channels differ by more than 8 levels. */
    private static int differing(BufferedImage a, BufferedImage b) {
        int n = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                int p = a.getRGB(x, y);
                int q = b.getRGB(x, y);
                for (int shift = 0; shift < 24; shift += 8) {
                    if (Math.abs(((p >> shift) & 0xFF) - ((q >> shift) & 0xFF)) > 8) {
                        n++;
                        break;
                    }
                }
            }
        }
        return n;
    }

    /**
     * The default film of a run that stopped before a big rip counts down to it riding with the
     * first member: at the end the members are far apart, and the centre of mass far from each.
     */
    @Test
    void theDefaultCountdownRidesWithTheFirstMember() throws Exception {
        Path run = dir.resolve("rip-run");
        ViewRun.Result e = ViewRun.run(org.holdfast.window.FrameSources::open, "evolve",
                Path.of("..", "scenarios", "tethered-pair.toml").toString(), "--set", "cosmology.dark_energy.w0=-1.5",
                "--out", run.toString(), "--quiet");
        assertEquals(0, e.exitCode(), e.err());
        Path out = dir.resolve("countdown");
        ViewRun.Result r = FilmRun.render(run.toString(), "--seconds", "1", "--fps", "4", "--size", "64x36", "--out",
                out.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        String manifest = Files.readString(out.resolve(FilmManifest.FILE));
        assertTrue(manifest.contains("countdown") && manifest.contains("\"follow\" : \"Harl\""), manifest);
    }

    private static String[] concat(String[] a, String[] b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }

    @Test
    void framesAreByteIdenticalOnOneThreadAndOnTwo() throws Exception {
        for (String view : new String[] {"flat", "dome"}) {
            String size = "flat".equals(view) ? "64x36" : "48";
            Path one = dir.resolve(view + "-1");
            Path two = dir.resolve(view + "-2");
            assertEquals(0, demoFilmSized(one, size, "--projection", view, "--threads", "1").exitCode());
            assertEquals(0, demoFilmSized(two, size, "--projection", view, "--threads", "2").exitCode());
            for (int i = 1; i <= 4; i++) {
                assertArrayEquals(Files.readAllBytes(one.resolve(FrameFiles.name(i))),
                        Files.readAllBytes(two.resolve(FrameFiles.name(i))), view + " frame " + i);
            }
        }
    }

    @Test
    void domeAndPanoramaFramesHaveTheirShapes() throws Exception {
        Path dome = dir.resolve("dome");
        assertEquals(0, demoFilmSized(dome, "48", "--projection", "dome").exitCode());
        BufferedImage d = FilmRun.image(dome.resolve(FrameFiles.name(1)));
        assertEquals(48, d.getWidth());
        assertEquals(48, d.getHeight());
        assertTrue(FilmRun.litPixels(d) > 20);
        Path pano = dir.resolve("pano");
        assertEquals(0, demoFilmSized(pano, "96x48", "--projection", "panorama").exitCode());
        BufferedImage p = FilmRun.image(pano.resolve(FrameFiles.name(1)));
        assertEquals(96, p.getWidth());
        assertEquals(48, p.getHeight());
        assertTrue(FilmRun.litPixels(p) > 20);
    }

    @Test
    void withoutAFilmTableARunGetsTheDefaultFilmOverTheWholeRun() throws Exception {
        Path out = dir.resolve("default");
        ViewRun.Result r = FilmRun.render(run(), "--size", "32x18", "--seconds", "0.5", "--fps", "4", "--out",
                out.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("rendering 2 frames (32x18 flat, 4 per second, 0 to 2 Gyr)"), r.out());
        assertTrue(Files.isRegularFile(out.resolve(FrameFiles.name(2))));
        String manifest = Files.readString(out.resolve(FilmManifest.FILE));
        assertTrue(manifest.contains("\"first_gyr\" : 0.0"), manifest);
        assertTrue(manifest.contains("\"last_gyr\" : 2.0"), "the last frame shows the run's end: " + manifest);
    }

    @Test
    void aVideoIsEncodedWhenFfmpegIsThere() throws Exception {
        org.junit.jupiter.api.Assumptions.assumeTrue(VideoEncoder.ffmpeg().isPresent(),
                "ffmpeg is not on the PATH: video encoding not tested");
        Path out = dir.resolve("frames");
        Path video = dir.resolve("demo.mp4");
        ViewRun.Result r = demoFilm(out, "--video", video.toString());
        assertEquals(0, r.exitCode(), r.err());
        byte[] head = java.util.Arrays.copyOf(Files.readAllBytes(video), 8);
        // An MP4 file starts with its 'ftyp' box (ISO/IEC 14496-12, section 4.3).
        assertEquals("ftyp", new String(head, 4, 4, java.nio.charset.StandardCharsets.US_ASCII));
        try (var files = Files.list(dir)) {
            assertEquals(0, files.filter(f -> f.getFileName().toString().endsWith(".part")).count());
        }
    }

    @Test
    void aScenarioIsEvolvedFirstAndItsTemporaryRunRemoved() throws Exception {
        Path tmp = Path.of(System.getProperty("java.io.tmpdir"));
        long before = countTemporaryRuns(tmp);
        Path still = dir.resolve("scenario-still.png");
        java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of(DemoRun.SCENARIO.toString(),
                "--still", "1", "--size", "32x18", "--out", still.toString(), "--quiet"));
        for (String s : DemoRun.cutDown(500)) {
            args.add("--set");
            args.add(s);
        }
        ViewRun.Result r = FilmRun.render(args.toArray(String[]::new));
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(32, FilmRun.image(still).getWidth());
        assertEquals(before, countTemporaryRuns(tmp), "the temporary run folder is gone");
    }

    private static long countTemporaryRuns(Path tmp) throws java.io.IOException {
        try (var s = Files.list(tmp)) {
            return s.filter(p -> p.getFileName().toString().startsWith("holdfast-run-")).count();
        }
    }

    @Test
    void theHelpFitsEightyColumns() {
        ViewRun.Result r = FilmRun.render("--help");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("--still"), r.out());
        r.out().lines().forEach(l -> assertTrue(l.length() <= 80, "too wide: " + l));
    }

    static void assertOneLine(ViewRun.Result r, String... parts) {
        assertEquals(2, r.exitCode(), r.out() + r.err());
        String err = r.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        assertFalse(err.contains("Exception"), err);
        assertTrue(err.startsWith("holdfast render: "), err);
        for (String p : parts) {
            assertTrue(err.contains(p), "'" + p + "' in: " + err);
        }
    }
}
