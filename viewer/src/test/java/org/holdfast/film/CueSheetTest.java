package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.holdfast.render.ClockText;
import org.junit.jupiter.api.Test;

class CueSheetTest {

    @Test
    void timecodesCountFramesFromZero() {
        // SMPTE-style HH:MM:SS:FF, non-drop (common practice)
        assertEquals("00:00:00:00", CueSheet.timecode(1, 30));
        assertEquals("00:00:00:29", CueSheet.timecode(30, 30));
        assertEquals("00:00:01:00", CueSheet.timecode(31, 30));
        assertEquals("01:00:00:00", CueSheet.timecode(3600 * 24 + 1, 24));
        assertEquals("00:00:01:119", CueSheet.timecode(240, 120));
    }

    @Test
    void theClockCountsDownToTheRip() {
        assertEquals("rip in 3.20 million years", ClockText.headline(21.0, 21.0032));
        assertEquals("rip in 41,000 years", ClockText.headline(21.0, 21.000041));
        // no rip, or past it: the usual words
        assertEquals("in 12.4 billion years", ClockText.headline(12.4, Double.NaN));
        assertEquals("in 12.4 billion years", ClockText.headline(12.4, 12.0));
    }
}
