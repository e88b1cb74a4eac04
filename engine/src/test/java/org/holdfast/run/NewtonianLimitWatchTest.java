package org.holdfast.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

class NewtonianLimitWatchTest {

    @Test
    void speedsCountRelativeToTheCentreOfMassAndTheFirstPassingIsKept() {
        ArrayRunView v = new ArrayRunView("Ama", "Bry");
        v.m[0] = 3e12;
        v.m[1] = 1e12;
        // The whole pair drifts at 0.5 c: relative to its centre of mass nothing moves fast.
        double c = Units.C;
        v.vx[0] = 0.5 * c;
        v.vx[1] = 0.5 * c;
        NewtonianLimitWatch w = new NewtonianLimitWatch();
        w.init(v);
        assertTrue(Double.isNaN(w.passedGyr()));
        assertNull(w.member());
        // Bry at 0.5 c + 0.09 c: 0.0675 c from the centre of mass (3/4 of 0.09 c), still below.
        v.t = 1.0;
        v.vx[1] = 0.59 * c;
        w.afterStep(v);
        assertTrue(Double.isNaN(w.passedGyr()));
        // Bry 0.14 c ahead of Ama: 0.105 c from the centre of mass, past 0.1 c.
        v.t = 2.0;
        v.vx[1] = 0.64 * c;
        w.afterStep(v);
        assertEquals(2.0, w.passedGyr());
        assertEquals("Bry", w.member());
        assertEquals(0.105 * c, w.speedKpcPerGyr(), 1e-9 * c);
        // Later, faster: the first time is kept.
        v.t = 3.0;
        v.vx[1] = 2 * c;
        w.afterStep(v);
        assertEquals(2.0, w.passedGyr());
    }

    @Test
    void theSpeedOfLightInInternalUnits() {
        // c = 299792.458 km/s (SI, exact) and 1 km/s = 1.02271 kpc/Gyr (physics-references.md):
        // c = 306,601 kpc/Gyr.
        assertEquals(306_601, Units.C, 1.0);
    }
}
