package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class GroupFrameTest {

    @Test
    void centreOfMassEndsAtRestAtTheOrigin() {
        // Definition of the centre of mass, sum m_i r_i / sum m_i (common practice).
        double[] m = {3, 1};
        double[] x = {0, 4};
        double[] y = {1, 1};
        double[] z = {0, 0};
        double[] vx = {10, -30};
        double[] vy = {0, 0};
        double[] vz = {2, 2};
        double[] c = GroupFrame.toCentreOfMass(m, x, y, z, vx, vy, vz);
        assertArrayEquals(new double[] {1, 1, 0, 0, 0, 2}, c, 1e-15);
        assertArrayEquals(new double[] {-1, 3}, x, 1e-15);
        assertArrayEquals(new double[] {10, -30}, vx, 1e-15);
        assertEquals(0, m[0] * x[0] + m[1] * x[1], 1e-15);
        assertEquals(0, m[0] * vz[0] + m[1] * vz[1], 1e-15);
    }

    @Test
    void zeroTotalMassIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> GroupFrame.toCentreOfMass(new double[] {0},
                new double[1], new double[1], new double[1], new double[1], new double[1], new double[1]));
    }
}
