package org.holdfast.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.fates.TimingArgument;
import org.holdfast.scenario.ScenarioException;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code holdfast timing}: the timing-argument mass of a pair, with and without the dark-energy force. */
@Command(name = "timing",
        header = "The timing-argument mass of a pair, with and without the dark-energy force.",
        mixinStandardHelpOptions = true,
        description = {
            "Finds the mass of a pair from its separation and radial velocity today, assuming the two",
            "started together at the Big Bang on a radial orbit (the timing argument). The orbit is",
            "integrated back with the engine, with and without the dark-energy force of the cosmology.",
            "",
            "Example:",
            "  holdfast timing --separation-kpc 784 --radial-velocity-kms -130 --h0 70 --omega-m 0.3 --json"
        })
public final class TimingCommand implements Callable<Integer> {

    @Option(names = "--separation-kpc", required = true, paramLabel = "KPC", description = "Separation today, kpc.")
    double separationKpc;

    @Option(names = "--radial-velocity-kms", required = true, paramLabel = "KM_S",
            description = "Radial velocity today, km/s (negative: approaching).")
    double radialKms;

    @Option(names = "--age-gyr", paramLabel = "GYR",
            description = "Time since the Big Bang, Gyr (default: the cosmology's age).")
    Double ageGyr;

    @Mixin
    CosmologyOptions cosmology;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        if (!(separationKpc > 0) || Double.isInfinite(separationKpc)) {
            throw new ScenarioException("--separation-kpc", null, "must be a positive number of kpc");
        }
        if (!Double.isFinite(radialKms)) {
            throw new ScenarioException("--radial-velocity-kms", null, "must be a finite number of km/s");
        }
        ExpansionTable table = CosmologyOptions.solve(cosmology.cosmology(), 1);
        double age = ageGyr == null ? table.ageGyr() : ageGyr;
        if (!(age > 0) || age > table.ageGyr()) {
            throw new ScenarioException("--age-gyr", null, String.format(Locale.ROOT,
                    "must be positive and at most the cosmology's age, %.4f Gyr (got %s)", table.ageGyr(), age));
        }
        TimingArgument pair = new TimingArgument(table, separationKpc, radialKms, age);
        TimingArgument.Solution de;
        TimingArgument.Solution plain;
        try {
            de = pair.solve(true);
            plain = pair.solve(false);
        } catch (IllegalArgumentException e) {
            throw new ScenarioException("--separation-kpc/--radial-velocity-kms", null, e.getMessage());
        }
        double eta = pair.keplerPhase(plain.massMsun());
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            Map<String, Object> m = ExpansionCommand.map();
            m.put("separation_kpc", separationKpc);
            m.put("radial_velocity_kms", radialKms);
            m.put("age_gyr", age);
            m.put("mass_msun", de.massMsun());
            m.put("mass_msun_no_dark_energy", plain.massMsun());
            m.put("eta_rad", eta);
            m.put("max_separation_kpc", de.maxSeparationKpc());
            m.put("max_separation_gyr", de.maxSeparationGyr());
            m.put("max_separation_kpc_no_dark_energy", plain.maxSeparationKpc());
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(m));
        } else {
            out.printf(Locale.ROOT, "Timing argument: a pair %.1f kpc apart, %s at %.1f km/s, %.3f Gyr after the Big Bang%n",
                    separationKpc, radialKms < 0 ? "approaching" : "receding", Math.abs(radialKms), age);
            out.printf(Locale.ROOT, "  with the dark-energy force   %.4g Msun  (farthest apart %.0f kpc, %.2f Gyr ago)%n",
                    de.massMsun(), de.maxSeparationKpc(), -de.maxSeparationGyr());
            out.printf(Locale.ROOT, "  without it                   %.4g Msun  (farthest apart %.0f kpc; Kepler phase %.4f rad)%n",
                    plain.massMsun(), plain.maxSeparationKpc(), eta);
            out.printf(Locale.ROOT, "  the dark-energy force changes the mass by %+.1f%%%n",
                    100 * (de.massMsun() / plain.massMsun() - 1));
        }
        out.flush();
        return 0;
    }
}
