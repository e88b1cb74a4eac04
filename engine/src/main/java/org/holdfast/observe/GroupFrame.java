package org.holdfast.observe;

/**
 * Moves a group into its centre-of-mass frame: subtracts the mass-weighted mean position and
 * velocity, so that the group's centre of mass sits at the origin and its total momentum is zero.
 */
public final class GroupFrame {

    private GroupFrame() {
    }

    /**
     * Shifts positions and velocities in place (structure of arrays, one entry per member).
     *
     * @return the removed centre: {x, y, z, vx, vy, vz} in the units given
     * @throws IllegalArgumentException for arrays of different lengths or a total mass <= 0
     */
    public static double[] toCentreOfMass(double[] mass, double[] x, double[] y, double[] z,
            double[] vx, double[] vy, double[] vz) {
        int n = mass.length;
        if (x.length != n || y.length != n || z.length != n || vx.length != n || vy.length != n || vz.length != n) {
            throw new IllegalArgumentException("all arrays need " + n + " entries");
        }
        double total = 0;
        double[] c = new double[6];
        for (int i = 0; i < n; i++) {
            double m = mass[i];
            total += m;
            c[0] += m * x[i];
            c[1] += m * y[i];
            c[2] += m * z[i];
            c[3] += m * vx[i];
            c[4] += m * vy[i];
            c[5] += m * vz[i];
        }
        if (!(total > 0)) {
            throw new IllegalArgumentException("total mass must be > 0, got " + total);
        }
        for (int k = 0; k < 6; k++) {
            c[k] /= total;
        }
        for (int i = 0; i < n; i++) {
            x[i] -= c[0];
            y[i] -= c[1];
            z[i] -= c[2];
            vx[i] -= c[3];
            vy[i] -= c[4];
            vz[i] -= c[5];
        }
        return c;
    }
}
