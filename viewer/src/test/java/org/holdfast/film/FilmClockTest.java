package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The film-to-simulated time mappings (definitions in FilmClock). */
class FilmClockTest {

    @Test
    void linearClockRunsSteadily() {
        FilmClock c = FilmClock.linear(40, 0, 20);
        assertEquals(0, c.simGyr(0), 0);
        assertEquals(20, c.simGyr(40), 1e-12);
        assertEquals(5, c.simGyr(10), 1e-12);
        assertEquals(20, c.simGyr(99), 1e-12, "clamped after the end");
        assertEquals(30, c.filmS(15), 1e-12);
    }

    @Test
    void countdownSpendsEqualFilmTimeOnEachRatioOfTimeLeft() {
        double fin = 41.5;
        FilmClock c = FilmClock.countdown(60, 0, 41.4, fin);
        assertEquals(0, c.simGyr(0), 1e-12);
        assertEquals(41.4, c.simGyr(60), 1e-10);
        double ratio = (fin - c.simGyr(10)) / (fin - c.simGyr(0));
        for (double s = 10; s < 60; s += 10) {
            assertEquals(ratio, (fin - c.simGyr(s + 10)) / (fin - c.simGyr(s)), 1e-10, "at " + s + " s");
        }
        // time always moves forward, and the last tenth of the film covers far less simulated
        // time than the first tenth
        double prev = c.simGyr(0);
        for (double s = 0.5; s <= 60; s += 0.5) {
            double t = c.simGyr(s);
            assertTrue(t > prev, "time moves forward at " + s);
            prev = t;
        }
        assertTrue(c.simGyr(60) - c.simGyr(54) < 0.1 * (c.simGyr(6) - c.simGyr(0)), "the end is slowed down");
    }

    @Test
    void inverseMapsAgree() {
        FilmClock[] clocks = {FilmClock.linear(12, -3, 9), FilmClock.countdown(30, 2, 60, 61)};
        for (FilmClock c : clocks) {
            for (double s = 0; s <= c.endS(); s += c.endS() / 7) {
                assertEquals(s, c.filmS(c.simGyr(s)), 1e-9);
            }
        }
    }

    @Test
    void countdownNeedsTheFinalTimeAfterTheFilm() {
        assertThrows(IllegalArgumentException.class, () -> FilmClock.countdown(10, 0, 50, 50));
        assertThrows(IllegalArgumentException.class, () -> FilmClock.linear(10, 3, 3));
    }
}
