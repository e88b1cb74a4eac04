package org.holdfast.fates;

import org.holdfast.run.RunView;
import org.holdfast.units.Units;
import org.holdfast.forces.Binding;

/**
 * The state of one member relative to the centre of mass of the main group (without the member
 * itself): the pair the fate criteria judge, as point masses.
 */
final class Relative {

    final double mass;
    final double[] dx = new double[3];
    final double[] dv = new double[3];

    private Relative(double mass) {
        this.mass = mass;
    }

    /** Body i against the members of {@code group} other than i; null when there are none. */
    static Relative of(int i, int[] group, double[] m, double[][] x, double[][] v) {
        double mm = 0;
        double[] cx = new double[3];
        double[] cv = new double[3];
        for (int j : group) {
            if (j == i) {
                continue;
            }
            mm += m[j];
            for (int c = 0; c < 3; c++) {
                cx[c] += m[j] * x[c][j];
                cv[c] += m[j] * v[c][j];
            }
        }
        if (!(mm > 0)) {
            return null;
        }
        Relative r = new Relative(mm + m[i]);
        for (int c = 0; c < 3; c++) {
            r.dx[c] = x[c][i] - cx[c] / mm;
            r.dv[c] = v[c][i] - cv[c] / mm;
        }
        return r;
    }

    double separation() {
        return Math.sqrt(dx[0] * dx[0] + dx[1] * dx[1] + dx[2] * dx[2]);
    }

    boolean boundWith(double k) {
        return Binding.test(mass, k, dx, dv).bound();
    }

    boolean leftForGood(double kWeakest) {
        return Binding.leftForGood(mass, kWeakest, dx, dv);
    }

    /** The record of why, energies in (km/s)^2. */
    FateTracker.Why why(double t, boolean inMain, double k) {
        Binding.Result b = Binding.test(mass, k, dx, dv);
        double s = Units.KPC_PER_GYR_TO_KMS * Units.KPC_PER_GYR_TO_KMS;
        return new FateTracker.Why(t, inMain, separation(), b.energy() * s, b.barrierEnergy() * s, b.barrierKpc(),
                Binding.zeroGravityRadius(mass, k), Binding.credited(k));
    }

    /** Body {@code name} of a run against the members of {@code group} now; null if gone or alone. */
    static Relative inRun(RunView run, String name, int[] group) {
        int n = run.bodyCount();
        for (int i = 0; i < n; i++) {
            if (run.bodyName(i).equals(name)) {
                double[][] x = {run.bodyX(), run.bodyY(), run.bodyZ()};
                double[][] v = {run.bodyVx(), run.bodyVy(), run.bodyVz()};
                return of(i, group, run.bodyMass(), x, v);
            }
        }
        return null;
    }
}
