package org.holdfast.expansion;

import java.nio.file.Path;
import java.util.List;

import org.holdfast.schema.Node;
import org.holdfast.schema.ScenarioException;

/**
 * Reads the {@code [cosmology]} table of a scenario file:
 *
 * <pre>
 * [cosmology]
 * h0 = 70.0            # km/s/Mpc
 * omega_m = 0.3
 * omega_r = "cmb"      # optional: a number, or "cmb" for photons at 2.7255 K plus 3.046 neutrinos; default 0
 * omega_k = 0.0        # optional, default 0 (flat); Omega_de = 1 - omega_m - omega_r - omega_k
 *
 * [cosmology.dark_energy]   # optional; default a cosmological constant
 * w0 = -1.0            # default -1
 * wa = 0.0             # default 0
 * # or: table = "w-of-a.csv"   (columns a,w; path relative to the scenario file)
 * </pre>
 *
 * Every problem is a {@link ScenarioException} naming file, line and key.
 */
public final class CosmologyReader {

    private CosmologyReader() {
    }

    /** Reads the parameters (without solving). */
    public static Cosmology read(Node cosmology) {
        cosmology.allowOnly("h0", "omega_m", "omega_r", "omega_k", "dark_energy");
        double h0 = cosmology.number("h0");
        double omegaM = cosmology.number("omega_m");
        double omegaR = 0;
        if (cosmology.raw("omega_r") instanceof String) {
            cosmology.choice("omega_r", List.of("cmb"));
            omegaR = Double.NaN;
        } else if (cosmology.has("omega_r")) {
            omegaR = cosmology.number("omega_r");
        }
        double omegaK = cosmology.number("omega_k", 0.0);
        Node de = cosmology.table("dark_energy");
        DarkEnergyModel model = de == null ? new ConstantW(-1) : darkEnergy(de);
        try {
            if (Double.isNaN(omegaR)) {
                check(cosmology, "h0", h0);
                omegaR = Cosmology.radiationFromCmb(h0, Cosmology.T_CMB_K, Cosmology.N_EFF);
            }
            return new Cosmology(h0, omegaM, omegaR, omegaK, model);
        } catch (InvalidCosmologyException e) {
            throw asInputError(cosmology, e);
        }
    }

    /** Reads and solves with the default horizon. */
    public static ExpansionTable solve(Node cosmology) {
        return solve(cosmology, Cosmology.DEFAULT_HORIZON_GYR);
    }

    /** Reads and solves up to {@code horizonGyr} after today. */
    public static ExpansionTable solve(Node cosmology, double horizonGyr) {
        Cosmology c = read(cosmology);
        try {
            return c.solve(horizonGyr);
        } catch (InvalidCosmologyException e) {
            throw asInputError(cosmology, e);
        }
    }

    /** The error as bad input at the key it names (or the [cosmology] table itself). */
    public static ScenarioException asInputError(Node cosmology, InvalidCosmologyException e) {
        String p = e.parameter();
        if (p != null && (p.equals("w0") || p.equals("wa")) && cosmology.table("dark_energy") != null) {
            return cosmology.table("dark_energy").error(p, e.getMessage());
        }
        if (p != null && cosmology.has(p)) {
            return cosmology.error(p, e.getMessage());
        }
        return cosmology.error(null, e.getMessage());
    }

    private static void check(Node node, String key, double h0) {
        if (!(h0 > 0) || Double.isInfinite(h0)) {
            throw node.error(key, "must be > 0 km/s/Mpc");
        }
    }

    private static DarkEnergyModel darkEnergy(Node de) {
        de.allowOnly("w0", "wa", "table");
        if (de.has("table")) {
            if (de.hasInFile("w0") || de.hasInFile("wa")) {
                throw de.error("table", "give either a w(a) table or w0/wa, not both");
            }
            String name = de.string("table");
            Path base = de.file().toAbsolutePath().getParent();
            Path csv = base == null ? Path.of(name) : base.resolve(name);
            if (!csv.toFile().isFile()) {
                throw de.error("table", "no such w(a) table: " + csv);
            }
            return WTableCsv.read(csv);
        }
        double w0 = de.number("w0", -1.0);
        double wa = de.number("wa", 0.0);
        if (wa == 0) {
            return w0 == -1.0 ? new ConstantW(-1) : new ConstantW(w0);
        }
        return new W0WaDarkEnergy(w0, wa);
    }
}
