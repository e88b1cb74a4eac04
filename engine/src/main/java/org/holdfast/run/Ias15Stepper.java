package org.holdfast.run;

import org.holdfast.integrators.DenseOutput;
import org.holdfast.integrators.Ias15;

/**
 * The bodies of a {@link GroupSystem} under {@link Ias15}: the integrator holds the state; after
 * every step it is copied back into the bodies, and the two work integrals into the budget. The
 * first step is a fraction of the group's shortest dynamical time; after that IAS15 chooses.
 */
final class Ias15Stepper implements GalaxyStepper {

    /** The first step as a fraction of the shortest dynamical time (IAS15 corrects it at once). */
    private static final double FIRST_STEP = 1e-3;

    private final GroupSystem system;
    private final Ias15 ias;
    private final double[] pos;
    private final double[] vel;
    private final double fixedStep;
    private double tidal0;
    private double drag0;

    /**
     * @param epsilon IAS15's step-control parameter
     * @param fixedStepGyr a fixed step, or NaN for IAS15's own control
     */
    Ias15Stepper(GroupSystem system, double epsilon, double fixedStepGyr) {
        this.system = system;
        int cap = 3 * system.bodies.x.length;
        this.fixedStep = fixedStepGyr;
        this.ias = new Ias15(cap, 2, Double.isNaN(fixedStepGyr) ? epsilon : 0);
        this.pos = new double[cap];
        this.vel = new double[cap];
        restart();
    }

    @Override
    public void restart() {
        // the budget's work integrals may have been set from outside (cut back to a merger)
        double[] q = ias.integrals();
        tidal0 = system.tidalWork() - q[0];
        drag0 = system.frictionWork() - q[1];
        system.copyOut(pos, vel);
        ias.reset(system.time(), system.size(), pos, vel);
        if (ias.nextStep() == 0 && Double.isNaN(fixedStep)) {
            double tau = system.timescale();
            ias.setNextStep(Double.isFinite(tau) ? FIRST_STEP * tau : 1e-3);
        }
    }

    @Override
    public double step(double limit) {
        double h = Double.isNaN(fixedStep) ? limit : Math.copySign(Math.min(fixedStep, Math.abs(limit)), limit);
        if (Double.isNaN(fixedStep) && Math.signum(ias.nextStep()) != Math.signum(limit)) {
            ias.setNextStep(-ias.nextStep());
        }
        double taken = ias.step(system, h);
        system.copyIn(ias.time(), ias.positions(), ias.velocities());
        double[] q = ias.integrals();
        system.setWorkIntegrals(tidal0 + q[0], drag0 + q[1]);
        return taken;
    }

    /** Sets the clock to exactly t (the end of the run), where the step was meant to land. */
    void landOn(double t) {
        ias.reset(t, system.size(), ias.positions(), ias.velocities());
    }

    @Override
    public DenseOutput dense() {
        return ias;
    }

    @Override
    public double minTimeFraction() {
        return 0;
    }

    @Override
    public double maxTimeFraction() {
        return 1;
    }

    @Override
    public long evaluations() {
        return ias.evaluations();
    }
}
