package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ExpansionPlotTest {

    @Test
    void timeTicksAreRoundSoThatOneFallsOnToday() {
        // at most ten ticks of 1, 2 or 5 times a power of ten (common practice for axes)
        assertEquals(5.0, ExpansionPlot.tickStep(36.0)); // Big Bang at -14.3 to a rip at 21.7 Gyr
        assertEquals(5.0, ExpansionPlot.tickStep(44.0));
        assertEquals(2.0, ExpansionPlot.tickStep(20.0));
        assertEquals(1.0, ExpansionPlot.tickStep(10.0));
        assertEquals(0.2, ExpansionPlot.tickStep(1.5), 1e-15);
        assertEquals(100.0, ExpansionPlot.tickStep(1000.0));
    }
}
