package org.holdfast.run;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.Binding;
import org.holdfast.forces.Bodies;
import org.holdfast.forces.Tracers;
import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.Halos;

/**
 * Merges members that come closer than a merge distance while bound to each other
 * ({@link Binding} with the pair's own interaction energy from its kernel, in the run's
 * background field of the moment: dark energy, and the mean matter density when included). The heavier one
 * survives (the earlier on a tie) and carries on as one body: both masses, the pair's centre of
 * mass and momentum (so total momentum is kept exactly up to round-off), and the halo
 * {@link Halos#remnant}. The absorbed member's stars are handed to the survivor, and the
 * orbital energy the pair sum loses is booked in the energy budget.
 *
 * <p>Default distance of a pair: the larger of the two radii that hold a tenth of each halo's
 * mass (0 for two bare points, which then never merge).
 */
final class Mergers {

    private final double fixedKpc;
    private final ExpansionHistory history;
    private final boolean darkEnergy;
    private final Map<Object, Double> tenthRadius = new HashMap<>();
    private final List<RunEvent> events = new ArrayList<>();

    /**
     * @param mergeWithinKpc the distance for every pair, NaN for each pair's default
     * @param darkEnergy whether k(t) enters the binding test (as it enters the run)
     */
    Mergers(double mergeWithinKpc, ExpansionHistory history, boolean darkEnergy) {
        this.fixedKpc = mergeWithinKpc;
        this.history = history;
        this.darkEnergy = darkEnergy;
    }

    /** The default merge distance of two halos: the larger of their tenth-mass radii. */
    static double defaultDistanceKpc(HaloProfile a, HaloProfile b) {
        return Math.max(Halos.tenthMassRadius(a), Halos.tenthMassRadius(b));
    }

    double distanceFor(HaloProfile a, HaloProfile b) {
        if (!Double.isNaN(fixedKpc)) {
            return fixedKpc;
        }
        double ra = tenthRadius.computeIfAbsent(a.shapeKey(), k -> Halos.tenthMassRadius(a));
        double rb = tenthRadius.computeIfAbsent(b.shapeKey(), k -> Halos.tenthMassRadius(b));
        return Math.max(ra, rb);
    }

    /** The mergers so far, in time order. */
    List<RunEvent> events() {
        return events;
    }

    /** Merges every close bound pair now; returns whether any merged. */
    boolean check(GroupSystem s) {
        boolean any = false;
        int[] pair;
        while ((pair = closeBoundPair(s)) != null) {
            merge(s, pair[0], pair[1]);
            any = true;
        }
        return any;
    }

    private int[] closeBoundPair(GroupSystem s) {
        Bodies b = s.bodies;
        // the run's own background field: dark energy, and the mean matter density when included
        double k = s.tide.active() ? s.tide.coefficient(s.time()) : 0;
        double[] dx = new double[3];
        double[] dv = new double[3];
        for (int i = 0; i < b.count(); i++) {
            for (int j = i + 1; j < b.count(); j++) {
                dx[0] = b.x[j] - b.x[i];
                dx[1] = b.y[j] - b.y[i];
                dx[2] = b.z[j] - b.z[i];
                double d = Math.sqrt(dx[0] * dx[0] + dx[1] * dx[1] + dx[2] * dx[2]);
                if (d >= distanceFor(b.halo[i], b.halo[j])) {
                    continue;
                }
                dv[0] = b.vx[j] - b.vx[i];
                dv[1] = b.vy[j] - b.vy[i];
                dv[2] = b.vz[j] - b.vz[i];
                // the pair's own interaction energy W = m_i m_j w(d), per reduced mass M w(d):
                // overlapping halos are far less bound than points at the same distance
                double m = b.mass[i] + b.mass[j];
                double phi = m * s.gravity.kernels().kernel(b.shape[i], b.shape[j]).energy(d);
                if (Binding.test(m, k, dx, dv, phi).bound()) {
                    return new int[] {i, j};
                }
            }
        }
        return null;
    }

    /** Merges bodies i and j (i &lt; j) into the heavier one. */
    void merge(GroupSystem s, int i, int j) {
        Bodies b = s.bodies;
        int keep = b.mass[j] > b.mass[i] ? j : i;
        int gone = keep == i ? j : i;
        double before = s.energyBudget();
        double m1 = b.mass[keep];
        double m2 = b.mass[gone];
        double m = m1 + m2;
        b.x[keep] = (m1 * b.x[keep] + m2 * b.x[gone]) / m;
        b.y[keep] = (m1 * b.y[keep] + m2 * b.y[gone]) / m;
        b.z[keep] = (m1 * b.z[keep] + m2 * b.z[gone]) / m;
        b.vx[keep] = (m1 * b.vx[keep] + m2 * b.vx[gone]) / m;
        b.vy[keep] = (m1 * b.vy[keep] + m2 * b.vy[gone]) / m;
        b.vz[keep] = (m1 * b.vz[keep] + m2 * b.vz[gone]) / m;
        HaloProfile remnant = Halos.remnant(b.halo[keep], m);
        b.halo[keep] = remnant;
        b.mass[keep] = m;
        b.shape[keep] = s.gravity.kernels().shapeOf(remnant);
        String survivor = b.name[keep];
        String absorbed = b.name[gone];
        b.remove(gone);
        int keptAt = keep > gone ? keep - 1 : keep;
        repointTracers(s.tracers, gone, keptAt);
        if (s.friction != null) {
            s.friction.refresh(b);
        }
        s.updateAccelerations();
        s.addMergerEnergy(before - s.energyBudget());
        events.add(new RunEvent(s.time(), RunEvent.Kind.MERGED, List.of(survivor, absorbed)));
    }

    /** Stars of the absorbed body now belong to the survivor; hosts above it move down one. */
    private static void repointTracers(Tracers t, int gone, int keptAt) {
        int[] host = t.host;
        for (int j = 0; j < t.count; j++) {
            int h = host[j];
            if (h == gone) {
                host[j] = keptAt;
            } else if (h > gone) {
                host[j] = h - 1;
            }
        }
    }
}
