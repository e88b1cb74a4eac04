package org.holdfast.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.holdfast.group.GalaxySpec;
import org.holdfast.observe.GroupFrame;
import org.holdfast.output.Provenance;
import org.holdfast.scenario.Scenario;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast validate}: reads and checks a scenario without running it. */
@Command(name = "validate",
        mixinStandardHelpOptions = true,
        header = "Check a scenario and show its members in the centre-of-mass frame.",
        description = {
            "Reads and checks a scenario without running it, and shows the members as the run",
            "would start them: in the group's centre-of-mass frame.",
            "",
            "Example:",
            "  holdfast validate scenarios/hollin-group.toml --json"
        })
public final class ValidateCommand implements Callable<Integer> {

    @Mixin
    ScenarioOptions scenario;

    @Option(names = "--json", description = "Print one JSON object instead of a summary.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Scenario s = scenario.read(Double.NaN);
        PrintWriter out = spec.commandLine().getOut();
        List<GalaxySpec> gs = s.group().galaxies();
        int n = gs.size();
        double[] m = new double[n];
        double[][] p = new double[3][n];
        double[][] v = new double[3][n];
        for (int i = 0; i < n; i++) {
            m[i] = gs.get(i).massMsun();
            for (int c = 0; c < 3; c++) {
                p[c][i] = gs.get(i).positionKpc()[c];
                v[c][i] = gs.get(i).velocityKms()[c];
            }
        }
        GroupFrame.toCentreOfMass(m, p[0], p[1], p[2], v[0], v[1], v[2]);
        if (json) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("scenario", s.name());
            o.put("file", s.file().toString());
            o.put("frame", "centre of mass");
            List<Map<String, Object>> members = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                members.add(Provenance.member(gs.get(i), new double[] {p[0][i], p[1][i], p[2][i]},
                        new double[] {v[0][i], v[1][i], v[2][i]}));
            }
            o.put("galaxies", members);
            o.put("tracers", Provenance.tracers(s));
            o.put("cosmology", Provenance.cosmology(s.cosmology(), s.expansion()));
            o.put("run", Provenance.run(s.run()));
            o.put("uncertain", Provenance.uncertain(s.uncertain()));
            o.put("warnings", s.warnings());
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(o));
        } else {
            out.printf(Locale.ROOT, "%s: valid. \"%s\": %d galaxies, %,d tracers.%n", s.file(), s.name(), n,
                    s.group().tracerCount());
            out.printf(Locale.ROOT, "  cosmology: %s%n", s.cosmology());
            out.printf(Locale.ROOT, "  run: %.4g to %.4g Gyr from today, %s%n", s.run().startGyr(), s.run().untilGyr(),
                    s.run().scheme().key() + (s.run().fixedStep() ? ", fixed step " + s.run().stepMyr() + " Myr"
                            : ", adaptive step (accuracy " + s.run().accuracy() + ")"));
            out.println("  members in the centre-of-mass frame:");
            for (int i = 0; i < n; i++) {
                out.printf(Locale.ROOT, "    %-14s %9.3g Msun  at (%8.1f, %8.1f, %8.1f) kpc  moving (%7.1f, %7.1f, %7.1f) km/s%n",
                        gs.get(i).name(), m[i], p[0][i], p[1][i], p[2][i], v[0][i], v[1][i], v[2][i]);
            }
            String note = scenario.uncertainNote(s);
            if (note != null) {
                out.println("  " + note);
            }
            for (String w : s.warnings()) {
                out.println("  warning: " + w);
            }
        }
        out.flush();
        return 0;
    }
}
