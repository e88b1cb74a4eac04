package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.window.FrameSources;
import org.holdfast.window.ViewRun;

/**
 * A short, cut-down run of the shipped demo group (scenarios/hollin-group.toml), evolved once
 * per test JVM: 2 Gyr instead of 40, a few hundred tracers instead of thousands, so that the
 * film tests stay fast while rendering the real demo.
 */
public final class DemoRun {

    /** The demo scenario, from the viewer module's folder where Surefire runs. */
    public static final Path SCENARIO = Path.of("..", "scenarios", "hollin-group.toml");
    /** The demo film file. */
    public static final Path FILM = Path.of("..", "scenarios", "hollin-group-film.toml");
    /** End of the cut-down run, Gyr. */
    public static final double UNTIL_GYR = 2.0;

    /**
     * End of the longer cut-down run, Gyr: past the demo's first merger (Kellan into Cindral,
     * near 2.1 Gyr) and the 4.2 Gyr the help examples show.
     */
    public static final double MERGER_UNTIL_GYR = 4.5;

    private static final Path[] RUNS = new Path[3];

    private DemoRun() {
    }

    private static final List<String> DWARFS = List.of("Dunmoss", "Eskel", "Fallowby", "Gorsewin", "Heddle",
            "Ivetta", "Jessop", "Kellan", "Lurrow", "Mistley", "Nettle", "Orrin");

    /** The --set options that cut the demo down (1,680 tracers instead of 11,500). */
    public static List<String> cutDown(int snapshotEveryMyr) {
        return cutDown(snapshotEveryMyr, UNTIL_GYR);
    }

    /** As {@link #cutDown(int)}, to {@code untilGyr}. */
    public static List<String> cutDown(int snapshotEveryMyr, double untilGyr) {
        List<String> s = new ArrayList<>(List.of("run.until_gyr=" + untilGyr, "flow.count=300",
                "galaxy.Aldermere.stars.count=400", "galaxy.Bracken.stars.count=300",
                "galaxy.Cindral.stars.count=200", "run.snapshot_every_myr=" + snapshotEveryMyr));
        for (String d : DWARFS) {
            s.add("galaxy." + d + ".stars.count=40");
        }
        return s;
    }

    /** The run folder with snapshots every 250 Myr. */
    public static synchronized Path folder() {
        return folder(0, 250);
    }

    /** The same run with snapshots twice as often (125 Myr), for interpolation checks. */
    public static synchronized Path denseFolder() {
        return folder(1, 125);
    }

    /** The same run carried on to {@link #MERGER_UNTIL_GYR}, past its first merger. */
    public static synchronized Path mergerFolder() {
        return folder(2, 250, MERGER_UNTIL_GYR);
    }

    private static Path folder(int slot, int everyMyr) {
        return folder(slot, everyMyr, UNTIL_GYR);
    }

    private static Path folder(int slot, int everyMyr, double untilGyr) {
        if (RUNS[slot] == null) {
            try {
                Path dir = Files.createTempDirectory("holdfast-demo-").resolve("run");
                List<String> args = new ArrayList<>(List.of("evolve", SCENARIO.toString(), "--out", dir.toString(),
                        "--quiet"));
                for (String s : cutDown(everyMyr, untilGyr)) {
                    args.add("--set");
                    args.add(s);
                }
                ViewRun.Result r = ViewRun.run(FrameSources::open, args.toArray(String[]::new));
                assertEquals(0, r.exitCode(), r.err());
                RUNS[slot] = dir;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return RUNS[slot];
    }
}
