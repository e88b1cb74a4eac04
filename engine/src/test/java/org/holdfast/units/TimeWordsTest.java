package org.holdfast.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

class TimeWordsTest {

    private static final double DAY_GYR = 86_400.0 / Units.GYR_S;

    @Test
    void unitsShrinkWithTheSpan() {
        assertEquals("21.7 billion years", TimeWords.span(21.67));
        assertEquals("3.20 million years", TimeWords.span(3.2e-3));
        assertEquals("41,000 years", TimeWords.span(41e-6));
        assertEquals("412 years", TimeWords.span(412e-9));
        assertEquals("12.0 days", TimeWords.span(12 * DAY_GYR));
        assertEquals("5.40 hours", TimeWords.span(5.4 / 24 * DAY_GYR));
        assertEquals("23.7 minutes", TimeWords.span(23.7 / 1440 * DAY_GYR));
        assertEquals("1.52 x 10^-16 seconds", TimeWords.span(1.52e-16 / Units.GYR_S));
    }

    @Test
    void aOnePercentStepAlwaysChangesTheText() {
        // a countdown shrinking the time left by 1% a frame shows new words on every frame
        double tau = 30;
        String last = TimeWords.span(tau);
        while (tau > 1e-15) {
            tau *= 0.99;
            String now = TimeWords.span(tau);
            assertNotEquals(last, now, "at " + tau + " Gyr");
            last = now;
        }
    }
}
