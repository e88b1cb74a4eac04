package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import javax.imageio.ImageIO;

import org.holdfast.window.FrameSources;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * The window and the film command show the same picture for the same camera and time: a
 * screenshot of {@code holdfast view RUN --frames 1} equals {@code holdfast render RUN --still T}.
 * Needs a display (CI: {@code xvfb-run -a -s "-screen 0 1920x1080x24"}).
 *
 * <p>Tolerance: none. Both draw with the same CPU renderer, whose frames are byte-identical on
 * any thread count, and the window shows a frame as a 1:1 nearest-sampled 8-bit texture, read
 * back exactly (see WindowTest), so any difference is a fault.
 */
@Timeout(120)
@Tag("slow")
class ViewMatchesRenderTest {

    @TempDir
    Path dir;

    @BeforeAll
    static void needsDisplay() {
        String display = System.getenv("DISPLAY");
        assumeTrue(display != null && !display.isBlank(),
                "DISPLAY is not set: the view-against-render check is skipped (run the suite under xvfb-run -a)");
    }

    @Test
    void aWindowScreenshotEqualsTheStillOfTheSameCameraAndTime() throws Exception {
        String run = DemoRun.folder().toString();
        Path shot = dir.resolve("view.png");
        ViewRun.Result v = ViewRun.run(FrameSources::open, "view", run, "--frames", "1", "--screenshot",
                shot.toString(), "--camera", "35,25,2600,45", "--at-gyr", "1.25", "--size", "200x120");
        assertEquals(0, v.exitCode(), v.err());
        Path still = dir.resolve("render.png");
        ViewRun.Result r = ViewRun.run(FrameSources::open, "render", run, "--still", "1.25", "--camera", "35,25,2600,45",
                "--size", "200x120", "--out", still.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        assertSamePicture(shot, still);
    }

    /**
     * The same for a scenario evolving as it plays: the view waits for the run to reach --at-gyr,
     * and its screenshot equals the still of the run folder it kept (the demo's two members that
     * escape from the start are named as escaped in both).
     */
    @Test
    void aLiveRunsScreenshotEqualsTheStillOfTheFolderItKept() throws Exception {
        Path keep = dir.resolve("kept");
        Path shot = dir.resolve("live.png");
        List<String> args = new ArrayList<>(List.of("view", DemoRun.SCENARIO.toString(), "--out", keep.toString(),
                "--frames", "1", "--screenshot", shot.toString(), "--camera", "35,25,2600,45", "--at-gyr", "1.25",
                "--size", "200x120"));
        for (String set : DemoRun.cutDown(250)) {
            args.add("--set");
            args.add(set);
        }
        ViewRun.Result v = ViewRun.run(FrameSources::open, args.toArray(String[]::new));
        assertEquals(0, v.exitCode(), v.err());
        assertTrue(v.out().contains("as it plays"), v.out());
        Path still = dir.resolve("kept.png");
        ViewRun.Result r = ViewRun.run(FrameSources::open, "render", keep.toString(), "--still", "1.25", "--camera",
                "35,25,2600,45", "--size", "200x120", "--out", still.toString(), "--quiet");
        assertEquals(0, r.exitCode(), r.err());
        assertSamePicture(shot, still);
    }

    private static void assertSamePicture(Path shot, Path still) throws java.io.IOException {
        BufferedImage a = ImageIO.read(shot.toFile());
        BufferedImage b = ImageIO.read(still.toFile());
        assertEquals(b.getWidth(), a.getWidth());
        assertEquals(b.getHeight(), a.getHeight());
        int lit = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                assertEquals(b.getRGB(x, y) & 0xFFFFFF, a.getRGB(x, y) & 0xFFFFFF, "pixel " + x + "," + y);
                lit += (a.getRGB(x, y) & 0xFFFFFF) != 0 ? 1 : 0;
            }
        }
        assertTrue(lit > 200, "the picture shows the group and its overlays");
    }
}
