package org.holdfast.output;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;
import org.holdfast.units.Units;

/**
 * Keeps, at regular intervals, what the run's pictures show: each member's distance from the
 * centre of mass, the zero-gravity radius of the whole mass, the energy-budget residual; and
 * the local Hubble diagram (distance and radial velocity of members and flow tracers) at the
 * start and at the end.
 */
public final class RunRecorder implements RunObserver {

    /** Distances and radial velocities of members and flow tracers at one time. */
    public record HubbleDiagram(double tGyr, double[] memberR, double[] memberVr, double[] flowR, double[] flowVr) {
    }

    /** Most flow tracers kept for a Hubble diagram. */
    static final int MAX_FLOW_POINTS = 4000;

    private final ExpansionHistory history;
    private final boolean darkEnergy;
    private final double intervalGyr;
    private final List<String> names = new ArrayList<>();
    private final Map<String, double[]> distance = new LinkedHashMap<>();
    private double[] times = new double[256];
    private double[] residual = new double[256];
    private double[] zeroGravity = new double[256];
    private int count;
    private double last = Double.NaN;
    private double totalMass;
    private HubbleDiagram first;
    private HubbleDiagram lastDiagram;

    public RunRecorder(ExpansionHistory history, boolean darkEnergy, double intervalGyr) {
        this.history = history;
        this.darkEnergy = darkEnergy;
        this.intervalGyr = intervalGyr;
    }

    @Override
    public void init(RunView run) {
        totalMass = 0;
        for (int i = 0; i < run.bodyCount(); i++) {
            names.add(run.bodyName(i));
            totalMass += run.bodyMass()[i];
        }
        record(run);
        first = diagram(run);
    }

    @Override
    public void afterStep(RunView run) {
        if (Math.abs(run.tGyr() - last) >= intervalGyr) {
            record(run);
        }
    }

    @Override
    public void finish(RunView run, StopReason reason) {
        if (run.tGyr() != last) {
            record(run);
        }
        lastDiagram = diagram(run);
    }

    private void record(RunView run) {
        last = run.tGyr();
        if (count == times.length) {
            int n = 2 * count;
            times = Arrays.copyOf(times, n);
            residual = Arrays.copyOf(residual, n);
            zeroGravity = Arrays.copyOf(zeroGravity, n);
            distance.replaceAll((k, v) -> Arrays.copyOf(v, n));
        }
        times[count] = run.tGyr();
        residual[count] = run.energyResidual();
        double k = darkEnergy ? history.darkEnergyAcceleration(run.tGyr()) : 0;
        zeroGravity[count] = k > 0 ? Math.cbrt(Units.G * totalMass / k) : Double.NaN;
        for (String n : names) {
            distance.computeIfAbsent(n, key -> filledNaN(times.length))[count] = Double.NaN;
        }
        for (int i = 0; i < run.bodyCount(); i++) {
            double x = run.bodyX()[i];
            double y = run.bodyY()[i];
            double z = run.bodyZ()[i];
            distance.get(run.bodyName(i))[count] = Math.sqrt(x * x + y * y + z * z);
        }
        count++;
    }

    private static double[] filledNaN(int n) {
        double[] a = new double[n];
        Arrays.fill(a, Double.NaN);
        return a;
    }

    private static HubbleDiagram diagram(RunView run) {
        int n = run.bodyCount();
        double[] mr = new double[n];
        double[] mv = new double[n];
        for (int i = 0; i < n; i++) {
            radial(run.bodyX()[i], run.bodyY()[i], run.bodyZ()[i], run.bodyVx()[i], run.bodyVy()[i],
                    run.bodyVz()[i], mr, mv, i);
        }
        int flow = 0;
        int[] host = run.tracerHost();
        for (int j = 0; j < run.tracerCount(); j++) {
            if (host[j] < 0) {
                flow++;
            }
        }
        int stride = Math.max(1, (flow + MAX_FLOW_POINTS - 1) / MAX_FLOW_POINTS);
        int keep = (flow + stride - 1) / stride;
        double[] fr = new double[keep];
        double[] fv = new double[keep];
        int seen = 0;
        int kept = 0;
        for (int j = 0; j < run.tracerCount() && kept < keep; j++) {
            if (host[j] >= 0) {
                continue;
            }
            if (seen++ % stride == 0) {
                radial(run.tracerX()[j], run.tracerY()[j], run.tracerZ()[j], run.tracerVx()[j],
                        run.tracerVy()[j], run.tracerVz()[j], fr, fv, kept++);
            }
        }
        return new HubbleDiagram(run.tGyr(), mr, mv, Arrays.copyOf(fr, kept), Arrays.copyOf(fv, kept));
    }

    private static void radial(double x, double y, double z, double vx, double vy, double vz,
            double[] r, double[] vr, int i) {
        double d = Math.sqrt(x * x + y * y + z * z);
        r[i] = d;
        vr[i] = d > 0 ? (x * vx + y * vy + z * vz) / d * Units.KPC_PER_GYR_TO_KMS : 0;
    }

    /** Times of the records, Gyr. */
    public double[] times() {
        return Arrays.copyOf(times, count);
    }

    /** Energy-budget residual at each record. */
    public double[] residuals() {
        return Arrays.copyOf(residual, count);
    }

    /** Zero-gravity radius of the whole mass at each record (NaN where k &lt;= 0), kpc. */
    public double[] zeroGravityKpc() {
        return Arrays.copyOf(zeroGravity, count);
    }

    /** Distance of each member from the centre of mass (NaN once merged), kpc, by name in order. */
    public Map<String, double[]> distancesKpc() {
        Map<String, double[]> out = new LinkedHashMap<>();
        distance.forEach((k, v) -> out.put(k, Arrays.copyOf(v, count)));
        return out;
    }

    /** The Hubble diagram at the start. */
    public HubbleDiagram startDiagram() {
        return first;
    }

    /** The Hubble diagram at the end (after finish). */
    public HubbleDiagram endDiagram() {
        return lastDiagram;
    }
}
