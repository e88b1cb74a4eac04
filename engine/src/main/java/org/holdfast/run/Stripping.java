package org.holdfast.run;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;

import org.holdfast.forces.Bodies;
import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.TidalRadius;

/**
 * Tidal stripping of satellites, applied between steps (like mergers). A member inside the halo
 * of a heavier one keeps only its own mass inside its tidal radius in that host
 * ({@link TidalRadius}; King 1962, AJ 67, 471; Binney &amp; Tremaine 2008 eq. 8.108), taking the
 * strongest tide of all heavier members, and never regains it. Its mass (used by the pair force,
 * dynamical friction, mergers and binding) is that bound mass; its pair kernel keeps its shape
 * per unit mass product (a documented simplification: the far field, -G m M / d, is exact).
 *
 * <p>The stripped mass joins the host whose tide took it, with the satellite's momentum (the
 * debris settles into the host's halo), so total mass and momentum are kept exactly. The host
 * keeps its position, so every path stays continuous with x' = v (snapshots interpolate
 * smoothly); the centre of mass shifts by dm (x_sat - x_host) / M_total, which no relative
 * motion feels: the pair forces, the friction and the background term k r (linear) depend only
 * on relative positions and velocities. The change of the energy budget this makes is booked,
 * as a merger's is, so the budget stays a measure of the integration's accuracy. A satellite stripped below
 * {@link #DISRUPTED} of its mass has come apart in its host and is merged into it (from memory:
 * semi-analytic models count a satellite stripped to a per cent or so of its mass as disrupted).
 */
final class Stripping {

    /** The fraction of its own mass below which a satellite counts as disrupted. */
    static final double DISRUPTED = 0.01;

    private final Map<String, Double> tidalRadius = new HashMap<>();
    private final Map<String, Double> stripped = new LinkedHashMap<>();
    private double energy;

    /**
     * Strips every satellite to its tidal mass now; merges disrupted ones through {@code mergers}
     * (when the run has them). Returns whether anything changed.
     */
    boolean apply(GroupSystem s, Mergers mergers) {
        Bodies b = s.bodies;
        boolean any = false;
        for (int i = 0; i < b.count(); i++) {
            HaloProfile own = b.halo[i];
            if (!(own.extentKpc() > 0)) {
                continue; // a bare point has nothing to strip
            }
            double rCur = tidalRadius.getOrDefault(b.name[i], own.extentKpc());
            double rt = rCur;
            int host = -1;
            for (int j = 0; j < b.count(); j++) {
                if (j == i || !(b.mass[j] > b.mass[i] || b.mass[j] == b.mass[i] && j < i)) {
                    continue;
                }
                double d = distance(b, i, j);
                double extent = b.halo[j].extentKpc();
                if (extent > 0 && d >= extent) {
                    continue;
                }
                double scale = b.mass[j] / b.halo[j].mass();
                if (!TidalRadius.reaches(own, b.halo[j], scale, d, rt)) {
                    continue; // this tide cannot cut deeper than the radius already reached
                }
                double r = TidalRadius.of(own, b.halo[j], scale, d);
                if (r < rt) {
                    rt = r;
                    host = j;
                }
            }
            if (host < 0) {
                continue;
            }
            tidalRadius.put(b.name[i], rt);
            double keep = TidalRadius.boundMass(own, rt);
            double dm = b.mass[i] - keep;
            if (dm > 0) {
                double before = s.energyBudget();
                transfer(b, i, host, dm);
                double change = before - s.energyBudget();
                energy += change;
                s.addStrippedEnergy(change);
                stripped.merge(b.name[i], dm, Double::sum);
                any = true;
            }
        }
        if (any) {
            s.updateAccelerations();
        }
        if (mergers != null) {
            any |= mergeDisrupted(s, mergers);
        }
        return any;
    }

    private boolean mergeDisrupted(GroupSystem s, Mergers mergers) {
        Bodies b = s.bodies;
        for (int i = 0; i < b.count(); i++) {
            if (b.mass[i] < DISRUPTED * b.halo[i].mass()) {
                int host = nearestHeavier(b, i);
                if (host >= 0) {
                    mergers.merge(s, Math.min(i, host), Math.max(i, host));
                    mergeDisrupted(s, mergers);
                    return true;
                }
            }
        }
        return false;
    }

    private static int nearestHeavier(Bodies b, int i) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int j = 0; j < b.count(); j++) {
            if (j != i && b.mass[j] > b.mass[i]) {
                double d = distance(b, i, j);
                if (d < bestD) {
                    bestD = d;
                    best = j;
                }
            }
        }
        return best;
    }

    /** Moves mass dm from satellite i to host j, keeping total mass and momentum and every position. */
    private static void transfer(Bodies b, int i, int j, double dm) {
        double mj = b.mass[j] + dm;
        b.vx[j] = (b.mass[j] * b.vx[j] + dm * b.vx[i]) / mj;
        b.vy[j] = (b.mass[j] * b.vy[j] + dm * b.vy[i]) / mj;
        b.vz[j] = (b.mass[j] * b.vz[j] + dm * b.vz[i]) / mj;
        b.mass[j] = mj;
        b.mass[i] -= dm;
    }

    private static double distance(Bodies b, int i, int j) {
        double dx = b.x[i] - b.x[j];
        double dy = b.y[i] - b.y[j];
        double dz = b.z[i] - b.z[j];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    /** Mass stripped from each member so far, by name (members never stripped are absent). */
    Map<String, Double> strippedByName() {
        return stripped;
    }

    /** The energy budget's change from stripping so far (booked back into the budget). */
    double energy() {
        return energy;
    }
}
