package org.holdfast.weighing;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.holdfast.units.Units;

/**
 * The relative orbit of a pair in polar coordinates, r'' = -G M / r^2 + L^2 / r^3 + K(t) r,
 * phi' = L / r^2, with L = r0 v_t today: central forces keep the angular momentum even when
 * K changes with time. Integrated backward from today (t = 0) with Dormand-Prince 8(5,3)
 * (Commons Math), it stops at the first pericentre it meets in the past: where r reaches
 * its minimum, or, on a radial orbit, where r falls to zero.
 */
public final class PairOrbit {

    /** A radial fall is called a collapse below this fraction of today's separation. */
    static final double COLLAPSED = 1e-6;
    private static final double RTOL = 1e-10;

    /** Where the backward integration ended. */
    public static final class Past {
        /** Time of the pericentre (Gyr from today), or NaN when none was met by the stop time. */
        public double pericentreGyr = Double.NaN;
        /** Separation at the pericentre, kpc (0 for a radial collapse). */
        public double pericentreKpc = Double.NaN;
        /** Separation and radial velocity (kpc/Gyr) at the end of the integration. */
        public double endKpc;
        public double endVr;
        /** r'' there, kpc/Gyr^2. */
        public double endAcceleration;
        /** The largest separation met (turnaround), kpc, and when, Gyr from today. */
        public double maxKpc;
        public double maxGyr;
        /** Whether it stopped at a minimum of r made by the dark-energy push, not a pericentre. */
        public boolean bounced;
    }

    private final double gm;
    private final double r0;
    private final double vr0;
    private final double l;
    private final DoubleUnaryOperator k;

    /**
     * @param massMsun the pair's total mass
     * @param separationKpc today's separation
     * @param radialKpcGyr today's radial velocity, kpc/Gyr (negative: approaching)
     * @param tangentialKpcGyr today's tangential velocity, kpc/Gyr (its sign is irrelevant)
     * @param field K(t) in 1/Gyr^2
     */
    public PairOrbit(double massMsun, double separationKpc, double radialKpcGyr, double tangentialKpcGyr,
            DoubleUnaryOperator field) {
        this.gm = Units.G * massMsun;
        this.r0 = separationKpc;
        this.vr0 = radialKpcGyr;
        this.l = separationKpc * Math.abs(tangentialKpcGyr);
        this.k = field;
    }

    private FirstOrderDifferentialEquations equations() {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                double r = y[0];
                dy[0] = y[1];
                dy[1] = -gm / (r * r) + l * l / (r * r * r) + k.applyAsDouble(t) * r;
                dy[2] = l / (r * r);
            }
        };
    }

    private FirstOrderIntegrator integrator(double spanGyr) {
        double vScale = Math.max(Math.abs(vr0), Math.max(l / r0, r0 / spanGyr));
        return bounded(new DormandPrince853Integrator(1e-20 * spanGyr, spanGyr,
                new double[] {1e-13 * r0, 1e-13 * vScale, 1e-13}, new double[] {RTOL, RTOL, RTOL}));
    }

    /** An integration that needs more than this many force evaluations is given up. */
    static final int MAX_EVALUATIONS = 300_000;

    private static FirstOrderIntegrator bounded(DormandPrince853Integrator ode) {
        ode.setMaxEvaluations(MAX_EVALUATIONS);
        return ode;
    }

    /** Integrates back from today to stopGyr (negative) or the first pericentre before it. */
    public Past back(double stopGyr) {
        return back(stopGyr, null);
    }

    /**
     * The same, handing every step to {@code steps} (for drawing the orbit).
     */
    public Past back(double stopGyr, StepHandler steps) {
        Past out = new Past();
        out.maxKpc = r0;
        out.maxGyr = 0;
        FirstOrderIntegrator ode = integrator(Math.abs(stopGyr));
        // look for apsides at least ten times per dynamical time, so that none is stepped over
        double check = Math.min(0.02 * Math.abs(stopGyr), 0.1 * Math.sqrt(r0 * r0 * r0 / gm));
        ode.addEventHandler(new Apsis(out), check, 1e-12 * Math.abs(stopGyr), 200);
        ode.addEventHandler(new Collapse(out), check, 1e-13 * Math.abs(stopGyr), 200);
        if (steps != null) {
            ode.addStepHandler(steps);
        }
        double[] y = {r0, vr0, 0};
        ode.integrate(equations(), 0, y, stopGyr, y);
        out.endKpc = y[0];
        out.endVr = y[1];
        out.endAcceleration = -gm / (y[0] * y[0]) + l * l / (y[0] * y[0] * y[0]) + k.applyAsDouble(stopGyr) * y[0];
        return out;
    }

    /** Integrates forward from today to untilGyr, handing every step to {@code steps}. */
    public double[] forward(double untilGyr, StepHandler steps) {
        FirstOrderIntegrator ode = integrator(untilGyr);
        ode.addStepHandler(steps);
        double[] y = {r0, vr0, 0};
        ode.integrate(equations(), 0, y, untilGyr, y);
        return y;
    }

    /**
     * Turnarounds are noted; a pericentre (vr rising through zero in physical time) stops. A
     * minimum of r that the dark-energy push made rather than the angular momentum (K r above
     * L^2 / r^3 there) is no Big Bang: the pair came in from afar; it stops as "no pericentre".
     */
    private final class Apsis implements EventHandler {
        private final Past out;

        Apsis(Past out) {
            this.out = out;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[1];
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (increasing) {
                double r = y[0];
                if (k.applyAsDouble(t) * r > l * l / (r * r * r)) {
                    out.bounced = true;
                    return Action.STOP;
                }
                out.pericentreGyr = t;
                out.pericentreKpc = y[0];
                return Action.STOP;
            }
            if (y[0] > out.maxKpc) {
                out.maxKpc = y[0];
                out.maxGyr = t;
            }
            return Action.CONTINUE;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /**
     * A radial fall to zero: stops a hair above it and adds the last stretch of a fall from
     * rest at infinity, r ~ (t - t_c)^(2/3), so (2/3) r / v_r more (Kahn &amp; Woltjer 1959 in
     * the limit eta -&gt; 0, from memory).
     */
    private final class Collapse implements EventHandler {
        private final Past out;

        Collapse(Past out) {
            this.out = out;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[0] - COLLAPSED * r0;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (!increasing) {
                return Action.CONTINUE;
            }
            out.pericentreGyr = y[1] > 0 ? t - (2.0 / 3) * y[0] / y[1] : t;
            out.pericentreKpc = 0;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /** A step handler that keeps every accepted step's end state: t, r, phi. */
    public static final class Path implements StepHandler {
        private final java.util.List<double[]> points = new java.util.ArrayList<>();

        @Override
        public void init(double t0, double[] y0, double t) {
            points.add(new double[] {t0, y0[0], y0[2]});
        }

        @Override
        public void handleStep(StepInterpolator s, boolean isLast) {
            double t0 = s.getPreviousTime();
            double t1 = s.getCurrentTime();
            for (int i = 1; i <= 8; i++) {
                double t = t0 + (t1 - t0) * i / 8.0;
                s.setInterpolatedTime(t);
                double[] y = s.getInterpolatedState();
                points.add(new double[] {t, y[0], y[2]});
            }
        }

        /** The points so far: {t Gyr, r kpc, phi rad}. */
        public java.util.List<double[]> points() {
            return points;
        }
    }
}
