package org.holdfast.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.window.input.Bindings;
import org.holdfast.window.FrameSources;
import org.holdfast.window.PatternSource;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Option checking of {@code holdfast view}: all of it happens before a window would open. */
@Tag("slow")
class ViewCommandTest {

    @TempDir
    Path dir;

    private ViewRun.Result pattern(String... args) {
        return ViewRun.run((input, sets, keep) -> new PatternSource(), args);
    }

    private static void assertOneLineNaming(ViewRun.Result r, String... parts) {
        assertEquals(2, r.exitCode(), r.err());
        String err = r.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        assertFalse(err.contains("Exception"), err);
        assertTrue(err.startsWith("holdfast view: "), err);
        for (String p : parts) {
            assertTrue(err.contains(p), "'" + p + "' in: " + err);
        }
    }

    @Test
    void badOptionValuesAreOneLineNamingTheOption() {
        String d = dir.toString();
        assertOneLineNaming(pattern("view", d, "--camera", "30,15"), "--camera", "YAW,PITCH,DISTANCE");
        assertOneLineNaming(pattern("view", d, "--camera", "30,91,800"), "--camera", "pitch 91");
        assertOneLineNaming(pattern("view", d, "--size", "big"), "--size", "WIDTHxHEIGHT");
        assertOneLineNaming(pattern("view", d, "--large-shot", "0x10"), "--large-shot");
        assertOneLineNaming(pattern("view", d, "--frames", "0"), "--frames");
        assertOneLineNaming(pattern("view", d, "--rate", "0"), "--rate");
        assertOneLineNaming(pattern("view", d, "--frame-gyr", "-0.1"), "--frame-gyr");
        assertOneLineNaming(pattern("view", d, "--screenshot", dir.resolve("a.jpg").toString()), "--screenshot", ".png");
        assertOneLineNaming(pattern("view", d, "--at-gyr", "12"), "--at-gyr", "12", "0 to 10 Gyr");
        assertOneLineNaming(pattern("view", d, "--at-gyr", "-0.5"), "--at-gyr");
    }

    @Test
    void malformedCommandLinesAreOneLineToo() {
        assertOneLineNaming(pattern("view", dir.toString(), "--frames", "many"), "--frames", "many", "--help");
        assertOneLineNaming(pattern("view", dir.toString(), "--at-gyr", "soon"), "--at-gyr");
        assertOneLineNaming(pattern("view", dir.toString(), "--spin"), "--spin");
    }

    @Test
    void missingInputIsNamed() {
        assertOneLineNaming(pattern("view"), "RUN_DIR|SCENARIO");
        assertOneLineNaming(pattern("view", dir.resolve("nowhere").toString()), "nowhere", "does not exist");
    }

    @Test
    void badInputWritesNoScreenshot() {
        Path shot = dir.resolve("shot.png");
        pattern("view", dir.toString(), "--camera", "x,y,z", "--screenshot", shot.toString());
        assertFalse(Files.exists(shot));
    }

    @Test
    void realSourcesNameWhatTheyCannotOpen() throws IOException {
        Path run = Files.createDirectory(dir.resolve("tessera-run"));
        ViewRun.Result r = ViewRun.run(FrameSources::open, "view", run.toString());
        assertOneLineNaming(r, "tessera-run", "no snapshots", "holdfast evolve");
        Path scenario = Files.writeString(dir.resolve("ombrine.toml"), "# empty\n");
        assertOneLineNaming(ViewRun.run(FrameSources::open, "view", scenario.toString()), "ombrine.toml",
                "missing required table [cosmology]");
        Path other = Files.writeString(dir.resolve("notes.txt"), "x\n");
        assertOneLineNaming(ViewRun.run(FrameSources::open, "view", other.toString()), "neither a run folder nor a scenario");
    }

    @Test
    void scenarioOptionsAreRefusedForARunFolder() {
        String d = dir.toString();
        assertOneLineNaming(pattern("view", d, "--out", dir.resolve("x").toString()), "--out", "only for a scenario");
        assertOneLineNaming(pattern("view", d, "--set", "run.until_gyr=3"), "--set", "only for a scenario");
    }

    @Test
    void aBadOverrideOfALiveScenarioNamesTheKey() {
        Path out = dir.resolve("never");
        ViewRun.Result r = ViewRun.run(FrameSources::open, "view", org.holdfast.replay.DemoRun.SCENARIO.toString(),
                "--set", "galaxy.Aldermere.mass_msun=-2", "--out", out.toString(), "--frames", "1");
        // the value at fault came from --set, not from the file's line
        assertOneLineNaming(r, "--set: galaxy.Aldermere.mass_msun: must be > 0");
        assertFalse(Files.exists(out), "nothing written");
    }

    /** A live demo run whose phantom dark energy (w0 = -1.5) rips the universe near 21.67 Gyr. */
    private static ViewRun.Result ripping(Path out, String atGyr) {
        java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of("view",
                org.holdfast.replay.DemoRun.SCENARIO.toString(), "--at-gyr", atGyr, "--out", out.toString(),
                "--frames", "1", "--set", "cosmology.dark_energy.w0=-1.5"));
        for (String s : org.holdfast.replay.DemoRun.cutDown(2000, 40)) {
            args.add("--set");
            args.add(s);
        }
        return ViewRun.run(FrameSources::open, args.toArray(String[]::new));
    }

    @Test
    void anAtGyrPastTheRipIsRefusedAtOnceAndTheRunFolderRemoved() throws IOException {
        Path out = dir.resolve("made").resolve("live");
        assertOneLineNaming(ripping(out, "30"), "--at-gyr: 30 lies outside this run, which spans 0 to 21.67");
        assertFalse(Files.exists(dir.resolve("made")), "the folders this command made are gone");
        Path empty = Files.createDirectory(dir.resolve("empty"));
        assertOneLineNaming(ripping(empty, "25"), "--at-gyr: 25");
        assertTrue(Files.isDirectory(empty), "a folder given empty stays");
        try (var s = Files.list(empty)) {
            assertEquals(0, s.count(), "and is empty again");
        }
    }

    @Test
    void keysPrintsTheKeyList() {
        ViewRun.Result r = pattern("view", "--keys");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(Bindings.helpLines(), r.out().lines().toList());
    }
}
