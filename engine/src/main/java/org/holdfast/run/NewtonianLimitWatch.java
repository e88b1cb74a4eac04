package org.holdfast.run;

import org.holdfast.units.Units;

/**
 * Notes when a member's speed relative to the members' centre of mass first exceeds
 * {@link Units#NEWTONIAN_LIMIT_FRACTION_OF_C} of c. The model is Newtonian, so nothing stops
 * a member there (near a big rip, members torn away reach speeds far above c); from that time
 * on its results are doubtful, and a run folder says so. Checked after every step, in
 * internal units (kpc/Gyr).
 */
public final class NewtonianLimitWatch implements RunObserver {

    private static final double LIMIT2 = Math.pow(Units.NEWTONIAN_LIMIT_FRACTION_OF_C * Units.C, 2);

    private double passedGyr = Double.NaN;
    private String member;
    private double speed = Double.NaN;

    @Override
    public void init(RunView run) {
        check(run);
    }

    @Override
    public void afterStep(RunView run) {
        if (Double.isNaN(passedGyr)) {
            check(run);
        }
    }

    private void check(RunView run) {
        int n = run.bodyCount();
        double[] m = run.bodyMass();
        double[] vx = run.bodyVx();
        double[] vy = run.bodyVy();
        double[] vz = run.bodyVz();
        double mt = 0;
        double cx = 0;
        double cy = 0;
        double cz = 0;
        for (int i = 0; i < n; i++) {
            mt += m[i];
            cx += m[i] * vx[i];
            cy += m[i] * vy[i];
            cz += m[i] * vz[i];
        }
        if (!(mt > 0)) {
            return;
        }
        cx /= mt;
        cy /= mt;
        cz /= mt;
        int worst = -1;
        double worst2 = LIMIT2;
        for (int i = 0; i < n; i++) {
            double dx = vx[i] - cx;
            double dy = vy[i] - cy;
            double dz = vz[i] - cz;
            double v2 = dx * dx + dy * dy + dz * dz;
            if (v2 > worst2) {
                worst2 = v2;
                worst = i;
            }
        }
        if (worst >= 0) {
            passedGyr = run.tGyr();
            member = run.bodyName(worst);
            speed = Math.sqrt(worst2);
        }
    }

    /** When a member first went faster than the limit, Gyr from today; NaN if none did. */
    public double passedGyr() {
        return passedGyr;
    }

    /** The member that did (the fastest, if several at once); null if none did. */
    public String member() {
        return member;
    }

    /** Its speed relative to the centre of mass then, kpc/Gyr; NaN if none did. */
    public double speedKpcPerGyr() {
        return speed;
    }
}
