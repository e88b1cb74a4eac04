package org.holdfast.run;

import java.util.ArrayList;
import java.util.List;

/** A RunView over plain arrays that a test sets by hand. */
public final class ArrayRunView implements RunView {

    public double t;
    public double a = 1;
    public long steps;
    public String[] names;
    public double[] m;
    public double[] x;
    public double[] y;
    public double[] z;
    public double[] vx;
    public double[] vy;
    public double[] vz;
    public final List<RunEvent> events = new ArrayList<>();
    private final double[] empty = new double[0];

    public ArrayRunView(String... names) {
        int n = names.length;
        this.names = names;
        m = new double[n];
        x = new double[n];
        y = new double[n];
        z = new double[n];
        vx = new double[n];
        vy = new double[n];
        vz = new double[n];
    }

    @Override public double tGyr() { return t; }
    @Override public double scaleFactor() { return a; }
    @Override public long steps() { return steps; }
    @Override public int bodyCount() { return names.length; }
    @Override public String bodyName(int i) { return names[i]; }
    @Override public double[] bodyMass() { return m; }
    @Override public double[] bodyX() { return x; }
    @Override public double[] bodyY() { return y; }
    @Override public double[] bodyZ() { return z; }
    @Override public double[] bodyVx() { return vx; }
    @Override public double[] bodyVy() { return vy; }
    @Override public double[] bodyVz() { return vz; }
    @Override public int tracerCount() { return 0; }
    @Override public double[] tracerX() { return empty; }
    @Override public double[] tracerY() { return empty; }
    @Override public double[] tracerZ() { return empty; }
    @Override public double[] tracerVx() { return empty; }
    @Override public double[] tracerVy() { return empty; }
    @Override public double[] tracerVz() { return empty; }
    @Override public int[] tracerHost() { return new int[0]; }
    @Override public double energyBudget() { return 0; }
    @Override public double energyResidual() { return 0; }
    @Override public double[] frameOffsetKpc() { return new double[3]; }
    @Override public double[] frameVelocity() { return new double[3]; }
    @Override public List<RunEvent> events() { return events; }
}
