package org.holdfast.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.ServiceLoader;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import org.holdfast.bench.BenchSuite;

/** {@code holdfast bench}: runs every registered {@link BenchSuite} and reports the figures. */
@Command(name = "bench",
        mixinStandardHelpOptions = true,
        header = "Measure the hot paths against their targets.",
        description = {
            "Measures the speed of the hot paths and prints the figures with their targets.",
            "",
            "Example:",
            "  holdfast bench --json > bench.json"
        })
public final class BenchCommand implements Callable<Integer> {

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    boolean json;

    @Option(names = "--quick", description = "Fewer repetitions (rough figures, for smoke tests).")
    boolean quick;

    @Option(names = "--only", paramLabel = "SUITE", description = "Run only the named suite.")
    String only;

    @Spec
    CommandSpec spec;

    private static final java.util.regex.Pattern LEADING_NUMBER =
            java.util.regex.Pattern.compile("^\\s*([-+]?[0-9]*\\.?[0-9]+(?:[eE][-+]?[0-9]+)?)(.*)$");

    /**
     * For JSON, a figure that a suite gave as text ("15.2 frames/s (target >= 20: met)") becomes
     * its number under the key and the whole text under {@code KEY_note}, so that tools read
     * numbers.
     */
    static Map<String, Object> numeric(Map<String, Object> results) {
        Map<String, Object> out = new LinkedHashMap<>();
        results.forEach((k, v) -> {
            if (v instanceof String text) {
                java.util.regex.Matcher m = LEADING_NUMBER.matcher(text);
                if (m.matches()) {
                    out.put(k, Double.parseDouble(m.group(1)));
                    if (!m.group(2).isBlank()) {
                        out.put(k + "_note", text);
                    }
                    return;
                }
            }
            out.put(k, v);
        });
        return out;
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        Map<String, Object> results = new LinkedHashMap<>();
        results.put("cores", Runtime.getRuntime().availableProcessors());
        results.put("java", System.getProperty("java.version"));
        boolean any = false;
        for (BenchSuite suite : ServiceLoader.load(BenchSuite.class)) {
            if (only != null && !only.equals(suite.name())) {
                continue;
            }
            any = true;
            if (!json) {
                out.println("== " + suite.name());
                out.flush();
            }
            Map<String, Object> mine = new LinkedHashMap<>();
            suite.run(quick, mine);
            if (!json) {
                mine.forEach((k, v) -> out.printf("  %-40s %s%n", k, v));
                out.flush();
            }
            results.putAll(mine);
        }
        if (!any && only != null) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                    "no benchmark suite named '" + only + "'");
        }
        if (json) {
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                    .writeValueAsString(numeric(results)));
        }
        out.flush();
        return 0;
    }
}
