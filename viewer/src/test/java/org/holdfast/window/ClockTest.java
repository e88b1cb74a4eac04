package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ClockTest {

    @Test
    void pausedClockStandsStill() {
        Clock c = Clock.pausedAt(3.0, 0.5);
        assertSame(c, c.advance(10.0, 0, 10));
    }

    @Test
    void playingClockMovesByRateTimesWallTimeEitherWay() {
        Clock c = new Clock(3.0, 0.5, true, true);
        assertEquals(4.0, c.advance(2.0, 0, 10).tGyr(), 1e-15);
        assertEquals(2.0, c.withForward(false).advance(2.0, 0, 10).tGyr(), 1e-15);
    }

    @Test
    void stopsAtTheEndItRunsInto() {
        Clock end = new Clock(9.5, 1.0, true, true).advance(2.0, 0, 10);
        assertEquals(10.0, end.tGyr(), 0);
        assertFalse(end.playing());
        Clock start = new Clock(0.5, 1.0, false, true).advance(2.0, 0, 10);
        assertEquals(0.0, start.tGyr(), 0);
        assertFalse(start.playing());
        Clock leaving = new Clock(10.0, 1.0, false, true).advance(1.0, 0, 10);
        assertEquals(9.0, leaving.tGyr(), 1e-15);
        assertTrue(leaving.playing());
    }

    @Test
    void rateScalesWithinLimits() {
        Clock c = Clock.pausedAt(0, 1.0);
        assertEquals(2.0, c.scaleRate(2).rateGyrPerS(), 0);
        assertEquals(Clock.MAX_RATE_GYR_PER_S, c.scaleRate(1e9).rateGyrPerS(), 0);
        assertEquals(Clock.MIN_RATE_GYR_PER_S, c.scaleRate(1e-9).rateGyrPerS(), 0);
        assertThrows(IllegalArgumentException.class, () -> Clock.pausedAt(0, 0));
        assertThrows(IllegalArgumentException.class, () -> Clock.pausedAt(Double.NaN, 1));
    }
}
