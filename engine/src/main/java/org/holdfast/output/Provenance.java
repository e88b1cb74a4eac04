package org.holdfast.output;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.DarkEnergyModel;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.TabulatedW;
import org.holdfast.expansion.W0WaDarkEnergy;
import org.holdfast.group.GalaxySpec;
import org.holdfast.run.RunSettings;
import org.holdfast.scenario.Scenario;
import org.holdfast.uncertain.UncertainValue;

/**
 * The parts of a scenario that every output repeats, as JSON-ready maps with units in the key
 * names: the cosmology, the run settings, the uncertain numbers and the values used for them.
 */
public final class Provenance {

    private Provenance() {
    }

    /** The cosmology's parameters and its key times. */
    public static Map<String, Object> cosmology(Cosmology c, ExpansionTable t) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("h0_kms_mpc", c.h0Kms());
        m.put("omega_m", c.omegaM());
        m.put("omega_r", c.omegaR());
        m.put("omega_k", c.omegaK());
        m.put("omega_de", c.omegaDe());
        m.put("dark_energy", c.darkEnergy().describe());
        m.put("dark_energy_model", darkEnergyModel(c.darkEnergy()));
        if (t != null) {
            m.put("age_gyr", t.ageGyr());
            m.put("rip_gyr", t.ripGyr().isPresent() ? t.ripGyr().getAsDouble() : null);
            m.put("crunch_gyr", t.crunchGyr().isPresent() ? t.crunchGyr().getAsDouble() : null);
        }
        return m;
    }

    /**
     * The dark-energy model as numbers a reader can rebuild it from: {w0, wa} for the
     * cosmological constant, constant w and w0-wa, {a, w} (the points) for a w(a) table.
     */
    public static Map<String, Object> darkEnergyModel(DarkEnergyModel d) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (d instanceof TabulatedW t) {
            double[][] k = t.knots();
            m.put("a", k[0]);
            m.put("w", k[1]);
        } else if (d instanceof W0WaDarkEnergy cpl) {
            m.put("w0", cpl.w0());
            m.put("wa", cpl.wa());
        } else {
            m.put("w0", d.w(1.0));
            m.put("wa", 0.0);
        }
        return m;
    }

    /** The run settings. */
    public static Map<String, Object> run(RunSettings r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("start_gyr", r.startGyr());
        m.put("until_gyr", r.untilGyr());
        m.put("integrator", r.scheme().key());
        m.put("step", r.fixedStep() ? "fixed" : "adaptive");
        m.put(r.fixedStep() ? "step_myr" : "accuracy", r.fixedStep() ? r.stepMyr() : r.accuracy());
        m.put("snapshot_every_myr", r.snapshotEveryMyr());
        m.put("dark_energy_force", r.darkEnergyForce());
        m.put("background_matter", r.backgroundMatter());
        m.put("seed", r.seed());
        return m;
    }

    /** The uncertain numbers: key, distribution, value used. */
    public static List<Map<String, Object>> uncertain(List<UncertainValue> values) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (UncertainValue v : values) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("key", v.path());
            m.put("distribution", v.distribution().describe());
            m.put("value", v.value());
            out.add(m);
        }
        return out;
    }

    /** A member's state as given, in a frame shifted by the given offsets (kpc, km/s). */
    public static Map<String, Object> member(GalaxySpec g, double[] pos, double[] vel) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", g.name());
        m.put("mass_msun", g.massMsun());
        m.put("position_kpc", pos);
        m.put("velocity_kms", vel);
        m.put("halo", g.halo().profile());
        m.put("stars", g.stars() == null ? 0 : g.stars().count());
        return m;
    }

    /** Counts of tracers by kind. */
    public static Map<String, Object> tracers(Scenario s) {
        long stars = 0;
        for (GalaxySpec g : s.group().galaxies()) {
            stars += g.stars() == null ? 0 : g.stars().count();
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("stars", stars);
        m.put("flow", s.group().flow() == null ? 0 : s.group().flow().count());
        m.put("total", s.group().tracerCount());
        return m;
    }

    /** null for NaN or infinity, else the value (JSON has no NaN). */
    public static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
