package org.holdfast.replay;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.DarkEnergyModel;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.TabulatedW;
import org.holdfast.expansion.W0WaDarkEnergy;
import org.holdfast.output.RunFolder;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The expansion history of a run, rebuilt from the cosmology its {@code resolved.json} records
 * (H0, the Omegas and the dark-energy model as numbers), so that a film shows the scale factor
 * and the time left before a rip exactly as {@code holdfast expansion} gives them, not as a
 * blend of the snapshots' values. Null for a run folder written before the model was recorded.
 */
final class RunCosmology {

    private RunCosmology() {
    }

    /** The history, or null when the folder does not say enough to rebuild it. */
    static ExpansionTable read(Path runDir, double lastGyr) {
        Path file = runDir.resolve(RunFolder.RESOLVED);
        if (!Files.isRegularFile(file)) {
            return null;
        }
        try {
            JsonNode c = new ObjectMapper().readTree(file.toFile()).path("cosmology");
            JsonNode m = c.path("dark_energy_model");
            if (!m.isObject()) {
                return null;
            }
            Cosmology cosmology = new Cosmology(c.path("h0_kms_mpc").asDouble(), c.path("omega_m").asDouble(),
                    c.path("omega_r").asDouble(), c.path("omega_k").asDouble(), model(m));
            // the horizon a run uses (ScenarioReader), so that the tables agree
            return cosmology.solve(Math.max(Cosmology.DEFAULT_HORIZON_GYR, 1.5 * Math.abs(lastGyr)));
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    private static DarkEnergyModel model(JsonNode m) {
        if (m.has("a")) {
            double[] a = numbers(m.path("a"));
            double[] w = numbers(m.path("w"));
            return new TabulatedW(a, w, "recorded in the run");
        }
        double w0 = m.path("w0").asDouble();
        double wa = m.path("wa").asDouble();
        if (wa == 0) {
            return w0 == -1.0 ? new ConstantW(-1) : new ConstantW(w0);
        }
        return new W0WaDarkEnergy(w0, wa);
    }

    private static double[] numbers(JsonNode arr) {
        double[] v = new double[arr.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = arr.get(i).asDouble();
        }
        return v;
    }
}
