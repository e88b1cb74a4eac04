package org.holdfast.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.output.Charts;
import org.holdfast.schema.ScenarioException;
import org.holdfast.units.Units;
import org.holdfast.weighing.Background;
import org.holdfast.weighing.DarkEnergyBound;
import org.holdfast.weighing.KeplerTiming;
import org.holdfast.weighing.MassDraws;
import org.holdfast.weighing.PairMotion;
import org.holdfast.weighing.PairOrbit;
import org.holdfast.weighing.Spread;
import org.holdfast.weighing.TimingSolver;
import org.holdfast.weighing.WeighingInput;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/** What {@code holdfast timing} found, and how it is printed and written. */
final class TimingReport {

    private final PairMotion pair;
    private final ExpansionTable table;
    private final Map<Background, TimingSolver.Weighing> central = new EnumMap<>(Background.class);
    private final Map<Background, String> refused = new EnumMap<>(Background.class);
    private final Map<Background, Spread> spreads = new EnumMap<>(Background.class);
    private final MassDraws.Draw[] draws;
    private final DarkEnergyBound.Result bound;
    private final WeighingInput input;
    private final KeplerTiming.Orbit kepler;
    private String boundOn = "lambda";

    private TimingReport(WeighingInput input, PairMotion pair, ExpansionTable table, MassDraws.Draw[] draws,
            DarkEnergyBound.Result bound) {
        this.input = input;
        this.pair = pair;
        this.table = table;
        this.draws = draws;
        this.bound = bound;
        this.kepler = KeplerTiming.solve(pair);
    }

    static TimingReport compute(WeighingInput in, ExpansionTable table, MassDraws.Draw[] draws,
            DarkEnergyBound.Result bound, String boundOn) {
        double age = Double.isNaN(in.ageGyr()) ? table.ageGyr() : in.ageGyr();
        PairMotion p = new PairMotion(in.separationKpc(), in.radialKms(), in.tangentialKms(), age);
        TimingReport r = new TimingReport(in, p, table, draws, bound);
        r.boundOn = boundOn;
        for (Background b : Background.values()) {
            if (b.needsHistory() && table == null) {
                r.refused.put(b, "no cosmology given");
                continue;
            }
            try {
                r.central.put(b, TimingSolver.solve(p, b, table));
            } catch (TimingSolver.AgeBeyondCosmology e) {
                r.refused.put(b, e.getMessage());
            } catch (IllegalArgumentException e) {
                if (b == Background.NONE) {
                    throw new ScenarioException("--separation-kpc/--radial-velocity-kms", null, e.getMessage());
                }
                r.refused.put(b, e.getMessage());
            }
            if (draws != null) {
                r.spreads.put(b, Spread.of(MassDraws.masses(draws, b)));
            }
        }
        return r;
    }

    private static String m(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    void print(PrintWriter w) {
        w.printf(Locale.ROOT, "Timing argument: a pair %.1f kpc apart, radial %.1f km/s, tangential %.1f km/s, %.4g Gyr"
                + " after the Big Bang%n", pair.separationKpc(), pair.radialKms(), pair.tangentialKms(), pair.ageGyr());
        w.printf(Locale.ROOT, "  %-40s %-11s %-7s %-13s %-11s %s%n", "background", "mass Msun", "e", "pericentre kpc",
                "period Gyr", "vs none");
        TimingSolver.Weighing none = central.get(Background.NONE);
        for (Background b : Background.values()) {
            TimingSolver.Weighing x = central.get(b);
            if (x == null) {
                w.printf(Locale.ROOT, "  %-40s refused: %s%n", b.label(), refused.get(b));
                continue;
            }
            w.printf(Locale.ROOT, "  %-40s %-11s %-7.4f %-13.4g %-11.4g %s%n", b.label(), m(x.massMsun()),
                    x.eccentricity(), x.pericentreKpc(), x.periodGyr(),
                    b == Background.NONE ? "" : String.format(Locale.ROOT, "%+.1f%%", 100 * (x.massMsun() / none.massMsun() - 1)));
        }
        if (draws != null) {
            w.printf(Locale.ROOT, "%d draws: median [68%%] [95%%] of the mass, Msun%n", draws.length);
            for (Background b : Background.values()) {
                Spread s = spreads.get(b);
                if (s.count() == 0) {
                    continue;
                }
                w.printf(Locale.ROOT, "  %-40s %s [%s, %s] [%s, %s]  mean %s sd %s%s%n", b.label(), m(s.median()),
                        m(s.lo68()), m(s.hi68()), m(s.lo95()), m(s.hi95()), m(s.mean()), m(s.sd()),
                        s.missing() > 0 ? "  (" + s.missing() + " draws without a solution)" : "");
            }
        }
        if (bound != null && boundOn.equals("w")) {
            w.printf(Locale.ROOT, "Dark energy against an independent mass of %s +- %s Msun: %.3g < w < %.3g (one-sided"
                    + " 95%% bounds), most likely %.3g, median %.3g%n", m(input.independentMassMsun()),
                    m(input.independentSigmaMsun()), bound.lower95(), bound.upper95(), bound.best(), bound.median());
        } else if (bound != null) {
            w.printf(Locale.ROOT, "Dark energy against an independent mass of %s +- %s Msun: Lambda / Lambda_cosmology"
                    + " < %.3g (95%%), most likely %.3g, median %.3g%n", m(input.independentMassMsun()),
                    m(input.independentSigmaMsun()), bound.upper95(), bound.best(), bound.median());
        }
    }

    private Map<String, Object> weighingJson(TimingSolver.Weighing x) {
        Map<String, Object> o = ExpansionCommand.map();
        o.put("mass_msun", x.massMsun());
        o.put("eccentricity", x.eccentricity());
        o.put("semi_major_axis_kpc", finite(x.semiMajorKpc()));
        o.put("pericentre_kpc", x.pericentreKpc());
        o.put("period_gyr", finite(x.periodGyr()));
        o.put("big_bang_separation_kpc", x.bigBangSeparationKpc());
        o.put("max_separation_kpc", x.maxSeparationKpc());
        o.put("max_separation_gyr", x.maxSeparationGyr());
        return o;
    }

    private static Object finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    private static Map<String, Object> spreadJson(Spread s) {
        Map<String, Object> o = ExpansionCommand.map();
        o.put("draws", s.count());
        o.put("without_solution", s.missing());
        o.put("median_msun", finite(s.median()));
        o.put("lo68_msun", finite(s.lo68()));
        o.put("hi68_msun", finite(s.hi68()));
        o.put("lo95_msun", finite(s.lo95()));
        o.put("hi95_msun", finite(s.hi95()));
        o.put("mean_msun", finite(s.mean()));
        o.put("sd_msun", finite(s.sd()));
        return o;
    }

    String json() throws IOException {
        Map<String, Object> j = ExpansionCommand.map();
        j.put("separation_kpc", pair.separationKpc());
        j.put("radial_velocity_kms", pair.radialKms());
        j.put("tangential_velocity_kms", pair.tangentialKms());
        j.put("age_gyr", pair.ageGyr());
        TimingSolver.Weighing de = central.get(Background.DARK_ENERGY);
        TimingSolver.Weighing none = central.get(Background.NONE);
        j.put("mass_msun", de == null ? null : de.massMsun());
        j.put("mass_msun_no_dark_energy", none.massMsun());
        j.put("mass_msun_full_background", central.containsKey(Background.FULL) ? central.get(Background.FULL).massMsun() : null);
        j.put("eta_rad", kepler == null ? null : kepler.etaRad());
        j.put("max_separation_kpc", de == null ? null : de.maxSeparationKpc());
        j.put("max_separation_gyr", de == null ? null : de.maxSeparationGyr());
        j.put("max_separation_kpc_no_dark_energy", none.maxSeparationKpc());
        Map<String, Object> all = ExpansionCommand.map();
        for (Background b : Background.values()) {
            all.put(b.key(), central.containsKey(b) ? weighingJson(central.get(b)) : Map.of("refused", refused.get(b)));
        }
        j.put("backgrounds", all);
        if (draws != null) {
            Map<String, Object> s = ExpansionCommand.map();
            for (Background b : Background.values()) {
                s.put(b.key(), spreadJson(spreads.get(b)));
            }
            j.put("samples", s);
        }
        if (bound != null) {
            Map<String, Object> o = ExpansionCommand.map();
            o.put("independent_mass_msun", input.independentMassMsun());
            o.put("independent_sigma_msun", input.independentSigmaMsun());
            o.put("parameter", boundOn.equals("w") ? "w" : "lambda_ratio");
            o.put("upper95", bound.upper95());
            o.put("lower95", bound.lower95());
            o.put("best", bound.best());
            o.put("median", bound.median());
            o.put("lambda_reference_per_m2", lambdaPerM2());
            j.put("dark_energy_bound", o);
        }
        return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(j);
    }

    /** Lambda = 3 Omega_L H0^2 / c^2 of the cosmology, in m^-2 (null without one). */
    private Object lambdaPerM2() {
        if (table == null) {
            return null;
        }
        double h0 = table.cosmology().h0Kms() * 1e3 / (Units.MPC_KM * 1e3);
        return 3 * table.cosmology().omegaDe() * h0 * h0 / (Units.C_SI * Units.C_SI);
    }

    /** Refuses an --out that exists and is not an empty folder, before anything is computed into it. */
    static void checkOut(Path out) {
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw new ScenarioException("--out", null, "exists and is not a folder: " + out);
        }
    }

    void write(Path dir) throws IOException {
        Files.createDirectories(dir);
        writeText(dir.resolve("summary.json"), json() + "\n");
        if (draws != null) {
            writeText(dir.resolve("draws.csv"), drawsCsv());
            TimingPlots.histogram(draws, dir.resolve("mass-histogram.png"));
        }
        TimingPlots.orbits(pair, table, central, dir.resolve("orbit.png"));
        if (bound != null) {
            StringBuilder b = new StringBuilder(boundOn.equals("w") ? "w,likelihood\n" : "lambda_ratio,likelihood\n");
            for (int k = 0; k < bound.ratio().length; k++) {
                b.append(String.format(Locale.ROOT, "%.6g,%.6g%n", bound.ratio()[k], bound.likelihood()[k]));
            }
            writeText(dir.resolve("bound.csv"), b.toString());
            TimingPlots.bound(bound, boundOn.equals("w") ? "w (constant)" : "Lambda / Lambda of the cosmology",
                    dir.resolve("bound.png"));
        }
    }

    private String drawsCsv() {
        StringBuilder b = new StringBuilder("draw,separation_kpc,radial_velocity_kms,tangential_velocity_kms,age_gyr");
        for (Background g : Background.values()) {
            b.append(",mass_msun_").append(g.key());
        }
        b.append('\n');
        for (int i = 0; i < draws.length; i++) {
            MassDraws.Draw d = draws[i];
            b.append(i).append(',').append(num(d.input().separationKpc())).append(',').append(num(d.input().radialKms()))
                    .append(',').append(num(d.input().tangentialKms())).append(',').append(num(d.ageGyr()));
            for (double v : d.massMsun()) {
                b.append(',').append(Double.isFinite(v) ? num(v) : "");
            }
            b.append('\n');
        }
        return b.toString();
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.10g", v);
    }

    static void writeText(Path file, String text) {
        Path tmp = file.resolveSibling(file.getFileName() + ".part");
        try {
            Files.writeString(tmp, text);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    /** The field of a background for drawing, K(t). */
    static DoubleUnaryOperator field(Background b, ExpansionTable h) {
        return b == Background.NONE ? t -> 0.0 : t -> b.coefficient(h, t);
    }
}
