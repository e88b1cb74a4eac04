package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.junit.jupiter.api.Test;

class SnapshotClockTest {

    private static List<Double> times(SnapshotClock c, double start, double end) {
        List<Double> out = new ArrayList<>();
        double t = start;
        while (t != end) {
            double n = c.next(t);
            assertTrue((n - t) * Math.signum(end - start) > 0, "times move on: " + t + " -> " + n);
            out.add(n);
            t = n;
        }
        return out;
    }

    @Test
    void regularWithoutRip() {
        List<Double> ts = times(new SnapshotClock(0, 1, 0.25), 0, 1);
        assertEquals(List.of(0.25, 0.5, 0.75, 1.0), ts);
        List<Double> back = times(new SnapshotClock(0, -0.5, 0.25), 0, -0.5);
        assertEquals(List.of(-0.25, -0.5), back);
    }

    @Test
    void closesInOnTheRipEquallyInLogOfTimeLeft() {
        // w = -1.5, Omega_m = 0.3, H0 = 70: rip 21.68 Gyr from today (Caldwell, Kamionkowski &
        // Weinberg 2003, PRL 91, 071301; exact integral in physics-references.md)
        ExpansionTable table = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1.5)).solve();
        double rip = table.ripGyr().getAsDouble();
        assertEquals(21.68, rip, 0.01);
        double end = table.latestGyr() - 1e-7 * table.latestGyr();
        SnapshotClock c = SnapshotClock.of(0, end, 0.25, table);
        List<Double> ts = times(c, 0, end);
        assertEquals(end, ts.get(ts.size() - 1), 0);
        // within a millionth of the rip time
        assertTrue(rip - end < 1e-6 * rip, "last snapshot " + (rip - end) + " Gyr before the rip");
        // every step of the last stretch shrinks the time left by the same ratio e^(-1/16)
        double ratio = Math.exp(-1.0 / SnapshotClock.PER_EFOLD);
        int logSteps = 0;
        for (int i = ts.size() - 30; i < ts.size() - 2; i++) {
            assertEquals(ratio, (rip - ts.get(i + 1)) / (rip - ts.get(i)), 1e-6);
            logSteps++;
        }
        assertTrue(logSteps > 0);
        // a countdown film of 600 frames from today (equal film time per equal ln of time left)
        // has fewer than ten frames between any two consecutive snapshots
        double lnSpan = Math.log(rip / (rip - end));
        double framesPerLn = 599 / lnSpan;
        double tPrev = 0;
        for (double t : ts) {
            double frames = framesPerLn * Math.log((rip - tPrev) / (rip - t));
            assertTrue(frames < 10, "between " + tPrev + " and " + t + ": " + frames + " frames");
            tPrev = t;
        }
        // the regular spacing holds until the switch
        assertEquals(0.25, ts.get(0), 0);
        assertEquals(0.5, ts.get(1), 0);
    }

    @Test
    void closesInOnACrunch() {
        // a closed matter universe, Omega_m = 3 (cycloid; common practice): it recollapses
        ExpansionTable table = new Cosmology(70, 3, 0, -2, new ConstantW(-1)).solve();
        double crunch = table.crunchGyr().getAsDouble();
        double end = table.latestGyr() - 1e-7;
        List<Double> ts = times(SnapshotClock.of(0, end, 0.5, table), 0, end);
        double last = ts.get(ts.size() - 2);
        assertTrue(crunch - last < 1e-3 * crunch, "snapshots reach close to the crunch: " + (crunch - last));
    }
}
