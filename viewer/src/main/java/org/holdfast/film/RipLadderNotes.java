package org.holdfast.film;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.RipLadder;
import org.holdfast.output.RunFolder;
import org.holdfast.replay.RunArchive;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The rip ladder of a run's universe as moments of its film ({@code ladder = true} in
 * {@code [film]}): when a group like the run's (its members as given in {@code resolved.json}),
 * a galaxy, a solar system and a planet come apart by holdfast's binding criterion, and the
 * atom by the order-of-magnitude rule. Only those before the run's last snapshot can be shown.
 */
final class RipLadderNotes {

    record Note(double tGyr, String text) {
    }

    private RipLadderNotes() {
    }

    static List<Note> of(RunArchive run) {
        ExpansionTable h = run.history();
        List<Note> out = new ArrayList<>();
        if (h == null || h.ripGyr().isEmpty()) {
            return out;
        }
        double[] mr = group(run);
        double rip = h.ripGyr().getAsDouble();
        for (RipLadder.Rung r : RipLadder.of(h, "a group like this one", mr[0], mr[1])) {
            double before = r.beforeRipGyr();
            double t = rip - before;
            if (before > 0 && t <= run.latestGyr() && t >= run.earliestGyr()) {
                out.add(new Note(t, r.system() + " comes apart" + (r.orderOfMagnitude() ? " (roughly)" : "")));
            }
        }
        return out;
    }

    /** Total mass and orbit radius of the run's members as given; NaN when unknown. */
    private static double[] group(RunArchive run) {
        try {
            JsonNode gs = new ObjectMapper().readTree(run.dir().resolve(RunFolder.RESOLVED).toFile())
                    .path("galaxies_as_given");
            int n = gs.size();
            double[] mass = new double[n];
            double[][] pos = new double[n][3];
            for (int i = 0; i < n; i++) {
                mass[i] = gs.get(i).path("mass_msun").asDouble();
                for (int k = 0; k < 3; k++) {
                    pos[i][k] = gs.get(i).path("position_kpc").path(k).asDouble();
                }
            }
            return n >= 2 ? RipLadder.groupScale(mass, pos) : new double[] {Double.NaN, Double.NaN};
        } catch (java.io.IOException | RuntimeException e) {
            return new double[] {Double.NaN, Double.NaN};
        }
    }
}
