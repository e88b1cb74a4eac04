package org.holdfast.render;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ClockTextTest {

    @Test
    void wordsForFutureAndPast() {
        assertEquals("today", ClockText.words(0.0001));
        assertEquals("in 12.4 billion years", ClockText.words(12.4));
        assertEquals("in 350 million years", ClockText.words(0.35));
        assertEquals("2.1 billion years ago", ClockText.words(-2.1));
        assertEquals("+12.40 Gyr from today", ClockText.gyr(12.4));
        assertEquals("a = 1.834", ClockText.scaleFactor(1.8341));
        assertEquals("a = 999.500", ClockText.scaleFactor(999.5));
        assertEquals("a = 4.08 x 10^7", ClockText.scaleFactor(40792621.724), "no row of digits near a rip");
        assertEquals("a = 1.00 x 10^4", ClockText.scaleFactor(9999.9), "rounding carries into the exponent");
        assertEquals("+3.1 Gyr", ClockText.gyrShort(3.14));
        assertEquals("-0.5 Gyr", ClockText.gyrShort(-0.46));
    }

    @Test
    void roundLengthsForTheScaleBar() {
        assertEquals(50, ClockText.roundLength(73));
        assertEquals(20, ClockText.roundLength(49.9));
        assertEquals(100, ClockText.roundLength(100));
        assertEquals(1, ClockText.roundLength(1.9));
        assertEquals("50 kpc", ClockText.length(50));
        assertEquals("2 Mpc", ClockText.length(2000));
    }
}
