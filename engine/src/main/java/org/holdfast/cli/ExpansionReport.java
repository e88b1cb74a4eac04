package org.holdfast.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.units.Units;

/** The readable table and the JSON object that {@code holdfast expansion} prints. */
final class ExpansionReport {

    private ExpansionReport() {
    }

    static Map<String, Object> json(ExpansionTable t, List<double[]> samples) {
        Cosmology c = t.cosmology();
        Map<String, Object> m = ExpansionCommand.map();
        m.put("cosmology", org.holdfast.output.Provenance.cosmology(c, null));
        m.put("age_gyr", t.ageGyr());
        m.put("rip_gyr", ExpansionCommand.orNull(t.ripGyr()));
        m.put("max_expansion_gyr", ExpansionCommand.orNull(t.maxExpansionGyr()));
        m.put("crunch_gyr", ExpansionCommand.orNull(t.crunchGyr()));
        m.put("hubble_time_gyr", c.hubbleTimeGyr());
        m.put("q0", c.q0());
        m.put("rho_de_kg_m3", c.darkEnergyDensityTodayKgM3());
        m.put("rho_de_msun_kpc3", c.omegaDe() * c.criticalDensity());
        m.put("acceleration_began_gyr", ExpansionCommand.orNull(t.accelerationBeganGyr()));
        m.put("earliest_gyr", t.earliestGyr());
        m.put("latest_gyr", t.latestGyr());
        List<Map<String, Object>> rows = new ArrayList<>();
        for (double[] r : samples) {
            Map<String, Object> s = ExpansionCommand.map();
            s.put("t_gyr", r[0]);
            s.put("a", r[1]);
            s.put("h_kms_mpc", r[2]);
            s.put("de_accel_per_gyr2", r[3]);
            s.put("rho_de_kg_m3", r[4]);
            s.put("w", r[5]);
            rows.add(s);
        }
        m.put("samples", rows);
        return m;
    }

    static void text(PrintWriter out, String title, ExpansionTable t, List<double[]> samples) {
        Cosmology c = t.cosmology();
        out.println(title);
        out.printf(Locale.ROOT, "  %s%n%n", c);
        line(out, "age", String.format(Locale.ROOT, "%.4f Gyr", t.ageGyr()));
        if (t.ripGyr().isPresent()) {
            line(out, "big rip", String.format(Locale.ROOT, "in %.4f Gyr (lookups end %.3g Gyr before it)",
                    t.ripGyr().getAsDouble(), t.ripGyr().getAsDouble() - t.latestGyr()));
        } else if (t.crunchGyr().isPresent()) {
            line(out, "maximum expansion", String.format(Locale.ROOT, "in %.4f Gyr, at a = %.5g",
                    t.maxExpansionGyr().getAsDouble(), t.maxScaleFactor().getAsDouble()));
            line(out, "big crunch", String.format(Locale.ROOT, "in %.4f Gyr", t.crunchGyr().getAsDouble()));
        } else {
            line(out, "big rip / crunch", String.format(Locale.ROOT, "none before the table ends at t = %.4g Gyr",
                    t.latestGyr()));
        }
        line(out, "Hubble time 1/H0", String.format(Locale.ROOT, "%.4f Gyr", c.hubbleTimeGyr()));
        line(out, "rho_de today", String.format(Locale.ROOT, "%.4g kg/m^3 = %.4g Msun/kpc^3",
                c.darkEnergyDensityTodayKgM3(), c.omegaDe() * c.criticalDensity()));
        line(out, "deceleration q0", String.format(Locale.ROOT, "%.4f", c.q0()));
        if (t.accelerationBeganGyr().isPresent()) {
            double ta = t.accelerationBeganGyr().getAsDouble();
            double a = t.scaleFactor(ta);
            line(out, "acceleration began", String.format(Locale.ROOT, "%s (a = %.4f, z = %.4f)",
                    ta <= 0 ? String.format(Locale.ROOT, "%.4f Gyr ago", -ta)
                            : String.format(Locale.ROOT, "in %.4f Gyr", ta), a, 1 / a - 1));
        } else {
            line(out, "acceleration began", "never (within the table)");
        }
        out.println();
        out.printf(Locale.ROOT, "  %10s %14s %14s %14s %14s %9s%n", "t [Gyr]", "a", "H [km/s/Mpc]",
                "k_de [1/Gyr^2]", "rho_de [kg/m3]", "w");
        for (double[] r : samples) {
            out.printf(Locale.ROOT, "  %10.4f %14.6g %14.6g %14.6g %14.6g %9.4f%n", r[0], r[1], r[2], r[3], r[4], r[5]);
        }
        out.printf(Locale.ROOT, "%n  k_de is the dark-energy push per unit distance, a''/a from dark energy alone.%n");
        out.printf(Locale.ROOT, "  valid for t = %.6g to %.6g Gyr (H0 = %.4g km/s/Mpc = %.6g /Gyr)%n",
                t.earliestGyr(), t.latestGyr(), c.h0Kms(), Units.hubbleToPerGyr(c.h0Kms()));
    }

    private static void line(PrintWriter out, String what, String value) {
        out.printf(Locale.ROOT, "  %-22s %s%n", what, value);
    }
}
