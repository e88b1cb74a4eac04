package org.holdfast.cli;

import java.nio.file.Files;
import java.nio.file.Path;

import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.ConstantW;
import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.DarkEnergyModel;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.InvalidCosmologyException;
import org.holdfast.expansion.W0WaDarkEnergy;
import org.holdfast.expansion.WTableCsv;
import org.holdfast.schema.ScenarioException;

import picocli.CommandLine.Option;

/** The cosmology given on the command line, shared by the commands that take one (a picocli mixin). */
public final class CosmologyOptions {

    @Option(names = "--h0", paramLabel = "KM_S_MPC", description = "Hubble constant in km/s/Mpc.")
    Double h0;

    @Option(names = "--omega-m", paramLabel = "X", description = "Matter density parameter today.")
    Double omegaM;

    @Option(names = "--omega-r", paramLabel = "X|cmb",
            description = "Radiation density today: a number, or 'cmb' (T = 2.7255 K, N_eff = 3.046). Default 0.")
    String omegaR;

    @Option(names = "--omega-k", paramLabel = "X", description = "Curvature parameter (default 0: flat).")
    Double omegaK;

    @Option(names = "--w0", paramLabel = "W", description = "Dark-energy w today (default -1).")
    Double w0;

    @Option(names = "--wa", paramLabel = "W", description = "Dark-energy wa in w = w0 + wa (1 - a) (default 0).")
    Double wa;

    @Option(names = "--w-table", paramLabel = "FILE.csv", description = "w(a) table with columns a,w.")
    Path wTable;

    /** Whether any cosmology option was given. */
    boolean any() {
        return h0 != null || omegaM != null || omegaR != null || omegaK != null || w0 != null || wa != null
                || wTable != null;
    }

    /**
     * The cosmology the options describe.
     *
     * @throws ScenarioException naming the option at fault
     */
    Cosmology cosmology() {
        if (h0 == null || omegaM == null) {
            throw new ScenarioException(h0 == null ? "--h0" : "--omega-m", null,
                    "missing: give a scenario file, or at least --h0 and --omega-m");
        }
        DarkEnergyModel model;
        if (wTable != null) {
            if (w0 != null || wa != null) {
                throw new ScenarioException("--w-table", null, "give either --w-table or --w0/--wa, not both");
            }
            if (!Files.isRegularFile(wTable)) {
                throw new ScenarioException("--w-table", null, "no such file: " + wTable);
            }
            model = WTableCsv.read(wTable);
        } else {
            double w = w0 == null ? -1 : w0;
            double a = wa == null ? 0 : wa;
            model = a == 0 ? (w == -1 ? new ConstantW(-1) : new ConstantW(w)) : new W0WaDarkEnergy(w, a);
        }
        double r = 0;
        if (omegaR != null) {
            if (omegaR.equals("cmb")) {
                r = h0 > 0 ? Cosmology.radiationFromCmb(h0, Cosmology.T_CMB_K, Cosmology.N_EFF) : 0;
            } else {
                try {
                    r = Double.parseDouble(omegaR);
                } catch (NumberFormatException e) {
                    throw new ScenarioException("--omega-r", null, "expected a number or 'cmb', got '" + omegaR + "'");
                }
            }
        }
        try {
            return new Cosmology(h0, omegaM, r, omegaK == null ? 0 : omegaK, model);
        } catch (InvalidCosmologyException e) {
            throw new ScenarioException(option(e.parameter()), null, e.getMessage());
        }
    }

    /** Solves the expansion of a cosmology up to horizonGyr from today. */
    static ExpansionTable solve(Cosmology c, double horizonGyr) {
        try {
            return c.solve(horizonGyr);
        } catch (InvalidCosmologyException e) {
            throw new ScenarioException(option(e.parameter()), null, e.getMessage());
        }
    }

    /** The option that sets a cosmology parameter. */
    static String option(String parameter) {
        if (parameter == null || parameter.equals("cosmology")) {
            return "cosmology";
        }
        return "--" + parameter.replace('_', '-');
    }
}
