package org.holdfast.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.holdfast.expansion.Cosmology;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.RipLadder;
import org.holdfast.units.TimeWords;
import org.holdfast.units.Units;

/** The readable table and the JSON object that {@code holdfast expansion} prints. */
final class ExpansionReport {

    private ExpansionReport() {
    }

    static Map<String, Object> json(ExpansionTable t, List<double[]> samples, List<RipLadder.Rung> ladder) {
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
        m.put("rip_ladder", ladderJson(t, ladder));
        return m;
    }

    /** The rip ladder as JSON rows; null without a rip. */
    private static List<Map<String, Object>> ladderJson(ExpansionTable t, List<RipLadder.Rung> ladder) {
        if (t.ripGyr().isEmpty()) {
            return null;
        }
        double rip = t.ripGyr().getAsDouble();
        List<Map<String, Object>> rows = new ArrayList<>();
        for (RipLadder.Rung r : ladder) {
            Map<String, Object> s = ExpansionCommand.map();
            s.put("system", r.key());
            s.put("description", r.system());
            s.put("mass_msun", Double.isNaN(r.massMsun()) ? null : r.massMsun());
            s.put("radius_kpc", r.radiusKpc());
            s.put("period_gyr", r.periodGyr());
            s.put("holdfast_before_rip_gyr", Double.isNaN(r.holdfastBeforeRipGyr()) ? null : r.holdfastBeforeRipGyr());
            s.put("holdfast_gyr", Double.isNaN(r.holdfastBeforeRipGyr()) ? null : rip - r.holdfastBeforeRipGyr());
            s.put("ckw2003_before_rip_gyr", r.ckwBeforeRipGyr());
            s.put("ckw2003_gyr", rip - r.ckwBeforeRipGyr());
            s.put("estimate", r.orderOfMagnitude() ? "order of magnitude" : "computed");
            rows.add(s);
        }
        return rows;
    }

    /** The rip ladder as a table under the landmarks. */
    private static void ladderText(PrintWriter out, ExpansionTable t, List<RipLadder.Rung> ladder) {
        if (ladder.isEmpty()) {
            return;
        }
        out.println();
        out.println("  Rip ladder: how long before the big rip each comes apart");
        out.printf(Locale.ROOT, "  %-52s %-22s %-22s%n", "system", "holdfast's criterion", "CKW 2003 rule");
        for (RipLadder.Rung r : ladder) {
            String hf = Double.isNaN(r.holdfastBeforeRipGyr()) ? "-"
                    : r.holdfastBeforeRipGyr() >= t.ripGyr().getAsDouble() ? "unbound already"
                    : TimeWords.span(r.holdfastBeforeRipGyr());
            String ckw = TimeWords.span(r.ckwBeforeRipGyr()) + (r.orderOfMagnitude() ? " (order of magnitude)" : "");
            out.printf(Locale.ROOT, "  %-52s %-22s %s%n", r.system(), hf, ckw);
        }
        out.println("  holdfast's criterion: a circular orbit of radius R about mass M keeps its angular momentum and");
        out.println("  comes apart when k = (27/256) G M / R^3 (its effective potential loses its barrier); a planet's");
        out.println("  surface when k = G M / R^3. CKW 2003 rule: P sqrt(2|1+3w|) / (6 pi |1+w|) before the rip, P the");
        out.println("  period (Caldwell, Kamionkowski & Weinberg 2003, PRL 91, 071301). The atom: that rule for the Bohr");
        out.println("  orbit, an order-of-magnitude estimate only (atoms are held by electromagnetism).");
    }

    static void text(PrintWriter out, String title, ExpansionTable t, List<double[]> samples,
            List<RipLadder.Rung> ladder) {
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
        ladderText(out, t, ladder);
    }

    private static void line(PrintWriter out, String what, String value) {
        out.printf(Locale.ROOT, "  %-22s %s%n", what, value);
    }
}
