package org.holdfast.output;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.fates.Subgroups;
import org.holdfast.run.RunObserver;
import org.holdfast.run.RunView;
import org.holdfast.run.StopReason;
import org.holdfast.units.Units;

/**
 * Keeps, at regular intervals, what the run's pictures show: each member's distance from the
 * group centre (the centre of mass of the main bound group, which stays with the group when
 * members escape; once no two members are bound to each other, the centre of mass of all of
 * them, since a lone galaxy is no group to measure from), the zero-gravity radius of the main
 * group's mass (none once it has come apart), the energy-budget
 * residual; and the local Hubble diagram (distance and radial velocity of members and flow
 * tracers around the group centre) at the start and at the end.
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
    /** The group centre at the latest record: x, y, z (kpc), vx, vy, vz (kpc/Gyr). */
    private final double[] centre = new double[6];
    private HubbleDiagram first;
    private HubbleDiagram lastDiagram;

    public RunRecorder(ExpansionHistory history, boolean darkEnergy, double intervalGyr) {
        this.history = history;
        this.darkEnergy = darkEnergy;
        this.intervalGyr = intervalGyr;
    }

    @Override
    public void init(RunView run) {
        for (int i = 0; i < run.bodyCount(); i++) {
            names.add(run.bodyName(i));
        }
        record(run);
        first = diagram(run, centre);
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
        lastDiagram = diagram(run, centre);
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
        double mainMass = centre(run, k);
        zeroGravity[count] = k > 0 && !Double.isNaN(mainMass) ? Math.cbrt(Units.G * mainMass / k) : Double.NaN;
        for (String n : names) {
            distance.computeIfAbsent(n, key -> filledNaN(times.length))[count] = Double.NaN;
        }
        for (int i = 0; i < run.bodyCount(); i++) {
            double x = run.bodyX()[i] - centre[0];
            double y = run.bodyY()[i] - centre[1];
            double z = run.bodyZ()[i] - centre[2];
            distance.get(run.bodyName(i))[count] = Math.sqrt(x * x + y * y + z * z);
        }
        count++;
    }

    /**
     * Sets {@link #centre} to the main group's centre of mass and velocity; returns its mass, or
     * NaN when the group has come apart (no two members bound: then the centre is that of all
     * members).
     */
    private double centre(RunView run, double k) {
        int n = run.bodyCount();
        double[] m = run.bodyMass();
        Subgroups s = Subgroups.find(n, m, new double[][] {run.bodyX(), run.bodyY(), run.bodyZ()},
                new double[][] {run.bodyVx(), run.bodyVy(), run.bodyVz()}, k);
        int[] main = s.mainGroup(m);
        boolean apart = main.length < 2 && n > 1;
        if (apart) {
            main = java.util.stream.IntStream.range(0, n).toArray();
        }
        double mm = 0;
        java.util.Arrays.fill(centre, 0);
        for (int i : main) {
            mm += m[i];
            centre[0] += m[i] * run.bodyX()[i];
            centre[1] += m[i] * run.bodyY()[i];
            centre[2] += m[i] * run.bodyZ()[i];
            centre[3] += m[i] * run.bodyVx()[i];
            centre[4] += m[i] * run.bodyVy()[i];
            centre[5] += m[i] * run.bodyVz()[i];
        }
        for (int c = 0; c < 6; c++) {
            centre[c] /= mm;
        }
        return apart ? Double.NaN : mm;
    }

    private static double[] filledNaN(int n) {
        double[] a = new double[n];
        Arrays.fill(a, Double.NaN);
        return a;
    }

    private static HubbleDiagram diagram(RunView run, double[] c) {
        int n = run.bodyCount();
        double[] mr = new double[n];
        double[] mv = new double[n];
        for (int i = 0; i < n; i++) {
            radial(run.bodyX()[i] - c[0], run.bodyY()[i] - c[1], run.bodyZ()[i] - c[2], run.bodyVx()[i] - c[3],
                    run.bodyVy()[i] - c[4], run.bodyVz()[i] - c[5], mr, mv, i);
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
                radial(run.tracerX()[j] - c[0], run.tracerY()[j] - c[1], run.tracerZ()[j] - c[2],
                        run.tracerVx()[j] - c[3], run.tracerVy()[j] - c[4], run.tracerVz()[j] - c[5], fr, fv, kept++);
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

    /** Distance of each member from the group centre (NaN once merged), kpc, by name in order. */
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
