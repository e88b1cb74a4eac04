package org.holdfast.replay;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.render.FateEvent;
import org.junit.jupiter.api.Test;

/**
 * A film names each event with the word of its key in summary.json (merged, escaped, ripped),
 * the keys the fate table and the charts use, so an audience and a researcher read one event
 * the same way.
 */
class FateWordsTest {

    @Test
    void theOverlayUsesTheKeyOfEachKindOfEvent() {
        for (String key : List.of("merged", "escaped", "ripped")) {
            assertTrue(org.holdfast.sweep.MemberOutcome.FATES.contains(key), key + " is a fate key");
            FateEvent e = RunArchive.event(key, 3.5, List.of("Quillon", "Sarrow"));
            assertNotNull(e, key);
            String words = e.describe();
            assertTrue(words.contains(" " + key + " "), "'" + words + "' says " + key);
            assertTrue(words.startsWith("Quillon") && words.contains("Sarrow"), words);
        }
    }
}
