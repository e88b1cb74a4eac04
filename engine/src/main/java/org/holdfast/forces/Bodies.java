package org.holdfast.forces;

import org.holdfast.halos.HaloProfile;

/**
 * The massive members of a group in structure-of-arrays form: positions (kpc), velocities
 * (kpc/Gyr), accelerations (kpc/Gyr^2), masses, halos and their shape ids in a
 * {@link KernelTable}. The count can shrink ({@link #remove}) when members merge.
 */
public final class Bodies {

    public final double[] x;
    public final double[] y;
    public final double[] z;
    public final double[] vx;
    public final double[] vy;
    public final double[] vz;
    public final double[] ax;
    public final double[] ay;
    public final double[] az;
    public final double[] mass;
    public final int[] shape;
    public final HaloProfile[] halo;
    public final String[] name;
    private int count;

    public Bodies(int capacity) {
        x = new double[capacity];
        y = new double[capacity];
        z = new double[capacity];
        vx = new double[capacity];
        vy = new double[capacity];
        vz = new double[capacity];
        ax = new double[capacity];
        ay = new double[capacity];
        az = new double[capacity];
        mass = new double[capacity];
        shape = new int[capacity];
        halo = new HaloProfile[capacity];
        name = new String[capacity];
    }

    /** Number of bodies now. */
    public int count() {
        return count;
    }

    /** Appends a body; returns its index. */
    public int add(String bodyName, HaloProfile h, int shapeId, double[] pos, double[] vel) {
        int i = count++;
        name[i] = bodyName;
        halo[i] = h;
        mass[i] = h.mass();
        shape[i] = shapeId;
        x[i] = pos[0];
        y[i] = pos[1];
        z[i] = pos[2];
        vx[i] = vel[0];
        vy[i] = vel[1];
        vz[i] = vel[2];
        return i;
    }

    /** Removes body i, keeping the order of the others (indices above i shift down by one). */
    public void remove(int i) {
        int tail = count - i - 1;
        for (Object a : new Object[] {x, y, z, vx, vy, vz, ax, ay, az, mass, shape, halo, name}) {
            System.arraycopy(a, i + 1, a, i, tail);
        }
        count--;
        halo[count] = null;
        name[count] = null;
    }

    /** Copies positions, velocities and accelerations of the first {@code count} bodies into dest. */
    public void copyStateTo(double[] dest) {
        int n = count;
        double[][] src = {x, y, z, vx, vy, vz, ax, ay, az};
        for (int k = 0; k < src.length; k++) {
            System.arraycopy(src[k], 0, dest, k * n, n);
        }
    }

    /** Restores what {@link #copyStateTo} saved (same count). */
    public void restoreStateFrom(double[] src) {
        int n = count;
        double[][] dst = {x, y, z, vx, vy, vz, ax, ay, az};
        for (int k = 0; k < dst.length; k++) {
            System.arraycopy(src, k * n, dst[k], 0, n);
        }
    }

    /** Index of the first body with a non-finite position or velocity, or -1. */
    public int firstNonFinite() {
        for (int i = 0; i < count; i++) {
            if (!Double.isFinite(x[i] + y[i] + z[i] + vx[i] + vy[i] + vz[i])) {
                return i;
            }
        }
        return -1;
    }
}
