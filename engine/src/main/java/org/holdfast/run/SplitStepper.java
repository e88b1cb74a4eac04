package org.holdfast.run;

import org.holdfast.integrators.DenseOutput;
import org.holdfast.integrators.HermiteStep;
import org.holdfast.integrators.Integrator;
import org.holdfast.integrators.SymmetricStepSize;

/**
 * The bodies of a {@link GroupSystem} under a splitting scheme (leapfrog, Yoshida's fourth
 * order), fixed or time-symmetric adaptive steps, with quintic Hermite dense output from the
 * two ends of each step.
 */
final class SplitStepper implements GalaxyStepper {

    private final GroupSystem system;
    private final Integrator integrator;
    /** Null for fixed steps. */
    private final SymmetricStepSize stepSize;
    private final double fixedStep;
    private final HermiteStep dense;
    private final double[] pos;
    private final double[] vel;
    private final double[] acc;
    private long evaluations;

    SplitStepper(GroupSystem system, Integrator integrator, double accuracy, double fixedStepGyr) {
        this.system = system;
        this.integrator = integrator;
        this.fixedStep = fixedStepGyr;
        this.stepSize = Double.isNaN(fixedStepGyr) ? new SymmetricStepSize(accuracy, 2) : null;
        int cap = 3 * system.bodies.x.length;
        this.dense = new HermiteStep(cap);
        this.pos = new double[cap];
        this.vel = new double[cap];
        this.acc = new double[cap];
        restart();
    }

    @Override
    public void restart() {
        system.updateAccelerations();
        record(true);
    }

    private void record(boolean start) {
        system.copyOut(pos, vel);
        int n = system.bodies.count();
        System.arraycopy(system.bodies.ax, 0, acc, 0, n);
        System.arraycopy(system.bodies.ay, 0, acc, n, n);
        System.arraycopy(system.bodies.az, 0, acc, 2 * n, n);
        if (start) {
            dense.begin(system.time(), 3 * n, pos, vel, acc);
        } else {
            dense.end(system.time(), pos, vel, acc);
        }
    }

    @Override
    public double step(double limit) {
        double h;
        if (stepSize == null) {
            h = Math.copySign(Math.min(fixedStep, Math.abs(limit)), limit);
        } else {
            h = stepSize.choose(integrator, system, limit);
        }
        if (Math.abs(h) >= Math.abs(limit) * (1 - 1e-9)) {
            h = limit;
        }
        if (h == 0) {
            return 0;
        }
        record(true);
        integrator.step(system, h);
        evaluations += integrator.stages();
        record(false);
        return h;
    }

    @Override
    public long evaluations() {
        return evaluations;
    }

    @Override
    public DenseOutput dense() {
        return dense;
    }

    @Override
    public double minTimeFraction() {
        return integrator.minTimeFraction();
    }

    @Override
    public double maxTimeFraction() {
        return integrator.maxTimeFraction();
    }
}
