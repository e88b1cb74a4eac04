package org.holdfast.weighing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.junit.jupiter.api.Test;

/** The likelihood of the strength of dark energy, and the spread of draws. */
class DarkEnergyBoundTest {

    static final ExpansionTable H = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1)).solve(1);
    static final DoubleUnaryOperator K = t -> Background.DARK_ENERGY.coefficient(H, t);

    @Test
    void anIndependentMassEqualToTheTimingMassAtTwiceLambdaPutsThePeakThere() {
        PairMotion p = new PairMotion(700, -100, 20, 13.0);
        double atTwo = TimingSolver.solve(p, Background.DARK_ENERGY, t -> 2 * K.applyAsDouble(t)).massMsun();
        DarkEnergyBound.Result r = DarkEnergyBound.of(List.of(p), K, atTwo, 0.01 * atTwo, 6, 1);
        assertEquals(2.0, r.best(), 0.05);
        assertTrue(r.upper95() > 2 && r.upper95() < 3, "upper " + r.upper95());
        // the timing mass grows with the strength of dark energy (Partridge, Lahav & Hoffman 2013)
        for (int j = 1; j < r.nodes().length; j++) {
            assertTrue(r.timingMassAtNodes()[j] > r.timingMassAtNodes()[j - 1]);
        }
    }

    @Test
    void aSmallIndependentMassBoundsLambdaFromAbove() {
        PairMotion p = new PairMotion(700, -100, 0, 13.0);
        double none = TimingSolver.solve(p, Background.NONE, t -> 0.0).massMsun();
        DarkEnergyBound.Result r = DarkEnergyBound.of(List.of(p), K, none, 0.1 * none, 12, 1);
        assertTrue(r.best() < 0.5, "best " + r.best());
        assertTrue(r.upper95() < 12 && r.upper95() > r.median(), "upper " + r.upper95());
    }

    @Test
    void spreadQuantilesInterpolateBetweenOrderStatistics() {
        // Hyndman & Fan 1996 (Am. Stat. 50, 361), definition 7: h = (n - 1) p
        Spread s = Spread.of(new double[] {4, 1, Double.NaN, 3, 2, 5});
        assertEquals(5, s.count());
        assertEquals(1, s.missing());
        assertEquals(3, s.median(), 0);
        assertEquals(1 + 4 * 0.16, s.lo68(), 1e-12);
        assertEquals(1 + 4 * 0.975, s.hi95(), 1e-12);
        assertEquals(3, s.mean(), 1e-12);
        assertEquals(Math.sqrt(2.5), s.sd(), 1e-12);
    }
}
