package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.render.Camera;
import org.holdfast.window.Clock;
import org.holdfast.window.Layer;
import org.holdfast.window.Layers;
import org.holdfast.render.ProjectionKind;
import org.holdfast.window.ViewState;
import org.holdfast.window.RunFrameSource;
import org.holdfast.replay.DemoRun;
import org.holdfast.replay.RunArchive;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The view's frames of the cut-down demo run, drawn without a window. */
@Tag("slow")
class RunFrameSourceTest {

    private static int lit(int[] argb) {
        int n = 0;
        for (int p : argb) {
            n += (p & 0xFFFFFF) != 0 ? 1 : 0;
        }
        return n;
    }

    @Test
    void theRunSpansItsSnapshotsAndNamesItsMembers() {
        try (RunFrameSource s = new RunFrameSource(RunArchive.open(DemoRun.folder()), null)) {
            assertEquals(0, s.startGyr());
            assertEquals(DemoRun.UNTIL_GYR, s.endGyr(), 1e-12);
            assertEquals(15, s.memberNames().size());
            assertEquals("Aldermere", s.memberNames().get(0));
            double[] xyz = new double[3];
            assertTrue(s.memberCentreKpc(0, 1.0, xyz));
            assertTrue(s.overviewDistanceKpc() > 1000, "the outlying dwarfs are in the overview");
        }
    }

    @Test
    void layersSwitchWhatIsDrawn() {
        try (RunFrameSource s = new RunFrameSource(RunArchive.open(DemoRun.folder()), null)) {
            Camera cam = new Camera(0, 0, 0, 2500, 30, 20, 50, ProjectionKind.FLAT);
            int[] all = new int[160 * 90];
            s.draw(new ViewState(cam, Clock.pausedAt(1.5, 0.1), Layers.DEFAULT, -1, false), 160, 90, all);
            int[] none = new int[160 * 90];
            s.draw(new ViewState(cam, Clock.pausedAt(1.5, 0.1), Layers.of(), -1, false), 160, 90, none);
            int[] help = new int[160 * 90];
            s.draw(new ViewState(cam, Clock.pausedAt(1.5, 0.1), Layers.of(Layer.HELP), -1, false), 160, 90, help);
            assertTrue(lit(all) > 300, "stars, trails and text: " + lit(all));
            assertTrue(lit(none) < lit(all) / 4, "only the galaxies' centres: " + lit(none) + " of " + lit(all));
            assertTrue(lit(help) > lit(none) + 500, "the key list covers part of the frame");
        }
    }

    @Test
    void theDomePreviewIsASquareCentredInTheWindow() {
        try (RunFrameSource s = new RunFrameSource(RunArchive.open(DemoRun.folder()), null)) {
            Camera cam = new Camera(0, 0, 0, 2500, 30, 20, 50, ProjectionKind.DOME);
            int w = 200;
            int h = 100;
            int[] argb = new int[w * h];
            s.draw(new ViewState(cam, Clock.pausedAt(1.0, 0.1), Layers.of(Layer.STARS, Layer.TRAILS), -1, false), w, h,
                    argb);
            for (int y = 0; y < h; y++) {
                for (int x = 0; x < 50; x++) {
                    assertEquals(0xFF000000, argb[x + y * w], "left band black at " + x + "," + y);
                    assertEquals(0xFF000000, argb[w - 1 - x + y * w], "right band black");
                }
            }
            assertTrue(lit(argb) > 50);
        }
    }
}
