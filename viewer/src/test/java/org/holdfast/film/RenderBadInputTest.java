package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.holdfast.replay.DemoRun;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Bad input to {@code holdfast render}: one line naming the option, exit code 2, nothing written. */
@Tag("slow")
class RenderBadInputTest {

    @TempDir
    Path dir;

    private void refused(String[] args, String... parts) {
        Path out = dir.resolve("never");
        String[] all = new String[args.length + 3];
        all[0] = DemoRun.folder().toString();
        System.arraycopy(args, 0, all, 1, args.length);
        all[args.length + 1] = "--out";
        all[args.length + 2] = out.toString();
        ViewRun.Result r = FilmRun.render(all);
        RenderCommandTest.assertOneLine(r, parts);
        assertFalse(Files.exists(out), "nothing written for " + String.join(" ", args));
    }

    @Test
    void badOptionValuesAreNamed() {
        refused(new String[] {"--size", "0x0"}, "--size", "2 to 16384");
        refused(new String[] {"--size", "40000x20000"}, "--size", "2 to 16384");
        refused(new String[] {"--size", "33x20"}, "--size", "frames need even sides", "33x20");
        refused(new String[] {"--size", "big"}, "--size", "WIDTHxHEIGHT");
        refused(new String[] {"--size", "64"}, "--size", "flat frame needs WIDTHxHEIGHT");
        refused(new String[] {"--projection", "dome", "--size", "64x32"}, "--size", "square");
        refused(new String[] {"--projection", "panorama", "--size", "64x64"}, "--size", "twice as wide");
        refused(new String[] {"--projection", "fisheye"}, "--projection", "fisheye", "flat, dome, panorama");
        refused(new String[] {"--fps", "0"}, "--fps");
        refused(new String[] {"--seconds", "-3"}, "--seconds");
        refused(new String[] {"--seconds", "1e7"}, "--seconds", "999999");
        refused(new String[] {"--from-gyr", "-1"}, "--from-gyr", "-1 Gyr lies outside this run", "0 to 2 Gyr");
        refused(new String[] {"--to-gyr", "7.5"}, "--to-gyr", "7.5");
        refused(new String[] {"--camera", "30,95,800"}, "--camera", "pitch");
        refused(new String[] {"--threads", "0"}, "--threads");
        refused(new String[] {"--video", "film.avi"}, "--video", ".mp4");
    }

    @Test
    void aStillMayHaveOddSides() throws Exception {
        Path poster = dir.resolve("odd.png");
        ViewRun.Result r = FilmRun.render(DemoRun.folder().toString(), "--still", "1", "--size", "321x181", "--out",
                poster.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(321, FilmRun.image(poster).getWidth());
        assertEquals(181, FilmRun.image(poster).getHeight());
        Path dome = dir.resolve("dome.png");
        r = FilmRun.render(DemoRun.folder().toString(), "--still", "1", "--projection", "dome", "--size", "101", "--out",
                dome.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(101, FilmRun.image(dome).getHeight());
    }

    @Test
    void framesTooLargeForTheHeapAreRefusedBeforeDrawing() {
        org.junit.jupiter.api.Assumptions.assumeTrue(
                0.8 * Runtime.getRuntime().maxMemory() < FilmPlan.BYTES_PER_PIXEL * 16384.0 * 16384.0,
                "this JVM could hold a 16384x16384 frame");
        refused(new String[] {"--size", "16384x16384"}, "--size", "GB", "-Xmx");
    }

    @Test
    void aScenarioIsNotEvolvedOnlyToRefuseAMalformedOption() {
        // Evolving announces itself ("evolving ... first", then "evolved to ..."); a refusal
        // before any work says nothing of the kind.
        for (String[] bad : List.of(new String[] {"--size", "0x0"}, new String[] {"--projection", "globe"},
                new String[] {"--camera", "1,2"})) {
            String[] args = {DemoRun.SCENARIO.toString(), bad[0], bad[1]};
            ViewRun.Result r = FilmRun.render(args);
            RenderCommandTest.assertOneLine(r, bad[0]);
            assertFalse(r.out().contains("evolv") || r.err().contains("evolv"), "evolved before refusing " + bad[0]
                    + ": " + r.out() + r.err());
        }
    }

    @Test
    void stillsNeedATimeInsideTheRunAndAPngName() {
        Path poster = dir.resolve("poster.png");
        ViewRun.Result r = FilmRun.render(DemoRun.folder().toString(), "--still", "9", "--out", poster.toString());
        RenderCommandTest.assertOneLine(r, "--still", "9 Gyr lies outside this run");
        assertFalse(Files.exists(poster));
        r = FilmRun.render(DemoRun.folder().toString(), "--still", "1", "--out", dir.resolve("poster.jpg").toString());
        RenderCommandTest.assertOneLine(r, "--out", ".png");
        r = FilmRun.render(DemoRun.folder().toString(), "--still", "1", "--video", dir.resolve("a.mp4").toString());
        RenderCommandTest.assertOneLine(r, "--video", "still");
    }

    @Test
    void aFolderWithoutSnapshotsOrAMissingInputIsNamed() throws Exception {
        Path empty = Files.createDirectory(dir.resolve("not-a-run"));
        Files.writeString(empty.resolve("scenario.toml"), "name = \"x\"\n");
        ViewRun.Result r = FilmRun.render(empty.toString(), "--out", dir.resolve("f").toString());
        RenderCommandTest.assertOneLine(r, "not-a-run", "no snapshots");
        assertFalse(Files.exists(dir.resolve("f")));
        RenderCommandTest.assertOneLine(FilmRun.render(dir.resolve("nowhere").toString()), "nowhere", "no such");
        Path notes = Files.writeString(dir.resolve("notes.txt"), "x\n");
        RenderCommandTest.assertOneLine(FilmRun.render(notes.toString()), "neither a run folder nor a scenario");
    }

    @Test
    void aBrokenFilmFileIsNamedByFileLineAndKey() throws Exception {
        Path film = Files.writeString(dir.resolve("bad-film.toml"), "[film]\nlength_s = 5\nto_gyr = 2\nview = \"dom\"\n");
        ViewRun.Result r = FilmRun.render(DemoRun.folder().toString(), "--film", film.toString(), "--out",
                dir.resolve("f").toString());
        RenderCommandTest.assertOneLine(r, "bad-film.toml:4", "film.view", "did you mean 'dome'");
        Path late = Files.writeString(dir.resolve("late.toml"), "[film]\nlength_s = 5\nto_gyr = 30\n"
                + "camera = \"orbit\"\n[film.orbit]\nradius_kpc = 900\n");
        r = FilmRun.render(DemoRun.folder().toString(), "--film", late.toString(), "--out", dir.resolve("f").toString());
        RenderCommandTest.assertOneLine(r, "late.toml:3", "film.to_gyr", "outside the run");
        r = FilmRun.render(DemoRun.folder().toString(), "--film", dir.resolve("none.toml").toString());
        RenderCommandTest.assertOneLine(r, "--film", "none.toml");
        assertEquals(false, Files.exists(dir.resolve("f")));
    }
}
