package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.render.SceneFrame;
import org.holdfast.schema.ScenarioException;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Stars are drawn in their galaxy's colour before and after a merger. The engine numbers a
 * star's host among the galaxies of each snapshot, and a merger renumbers every galaxy after
 * the absorbed one; the replay must still give each star the colour index of its galaxy among
 * the run's initial members, the index the galaxy itself is coloured by.
 */
@Tag("slow")
class StarColourTest {

    @Test
    void afterTheDemosFirstMergerEveryStarKeepsItsGalaxysColour() {
        RunArchive run = RunArchive.open(DemoRun.mergerFolder());
        List<String> initial = run.initialNames();
        FateEvent merger = run.events().stream().filter(e -> e.kind() == RunEvent.Kind.MERGED).findFirst().orElseThrow();
        double end = run.lastGyr();
        assertTrue(merger.tGyr() < end, "the run goes past its first merger: " + merger);
        String absorbed = merger.members().get(1);
        assertTrue(initial.indexOf(absorbed) < initial.size() - 1,
                "galaxies come after the absorbed one, so they are renumbered: " + initial);
        Map<String, String> into = new HashMap<>();
        for (FateEvent e : run.events()) {
            if (e.kind() == RunEvent.Kind.MERGED && e.tGyr() <= end) {
                into.put(e.members().get(1), e.members().get(0));
            }
        }

        ReplayScene scene = new ReplayScene(run);
        SceneFrame start = scene.at(run.firstGyr());
        int m = start.tracerCount();
        int[] before = new int[m];
        for (int j = 0; j < m; j++) {
            before[j] = start.tracerHost(j);
        }
        SceneFrame after = scene.at(end);
        assertEquals(m, after.tracerCount());
        Map<String, Integer> galaxyColour = new HashMap<>();
        for (int g = 0; g < after.galaxyCount(); g++) {
            galaxyColour.put(after.name(g), after.colourIndex(g));
        }
        assertFalse(galaxyColour.containsKey(absorbed), absorbed + " is gone after the merger");
        int stars = 0;
        for (int j = 0; j < m; j++) {
            if (before[j] < 0) {
                assertEquals(-1, after.tracerHost(j), "a flow tracer stays one");
                continue;
            }
            stars++;
            String home = initial.get(before[j]);
            String now = home;
            while (into.containsKey(now)) {
                now = into.get(now); // the stars of a merged galaxy pass to its survivor
            }
            assertEquals(galaxyColour.get(now).intValue(), after.tracerHost(j),
                    "star " + j + " of " + home + " in the colour of " + now);
        }
        assertTrue(stars > 1000, "the demo's stars were checked: " + stars);
    }

    @Test
    void hostsOfASnapshotBecomeIndicesAmongTheInitialMembers() {
        // Sarrow (1 of 3) merged into Quillon: the file now holds Quillon and Tamber, and Tamber's
        // stars say host 1, as the engine renumbers them.
        int[] host = RunArchive.initialHosts(new int[] {0, 1, -1, 0}, new String[] {"Quillon", "Tamber"},
                List.of("Quillon", "Sarrow", "Tamber"), Path.of("state_000002.h5"));
        assertArrayEquals(new int[] {0, 2, -1, 0}, host);
        ScenarioException e = assertThrows(ScenarioException.class, () -> RunArchive.initialHosts(new int[] {2},
                new String[] {"Quillon", "Tamber"}, List.of("Quillon", "Sarrow", "Tamber"), Path.of("state_000002.h5")));
        assertTrue(e.getMessage().contains("tracers/host") && e.getMessage().contains("state_000002.h5"),
                e.getMessage());
    }
}
