package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.ScenarioFile;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Checks, before any run starts, that the keys a sweep varies name numbers of the scenario:
 * a key written in the file must hold a number (or an uncertain number such as
 * {@code { mean = 770, sigma = 40 }}); a key the file leaves at its default is accepted when
 * its table exists and its name is one of the optional numeric keys of the format. The run's
 * own reader has the last word: a key it does not use stops the sweep at the first run.
 */
public final class KeyCheck {

    /** Optional numeric keys that a scenario may leave out (their readers have defaults). */
    static final Set<String> OPTIONAL_NUMBERS = Set.of("start_gyr", "accuracy", "step_myr", "snapshot_every_myr",
            "seed", "w0", "wa", "softening_kpc", "scale_kpc", "concentration", "truncation_kpc", "dispersion_kms");

    /** The keys of an uncertain number's inline table. */
    static final Set<String> UNCERTAIN_KEYS = Set.of("mean", "sigma", "median", "sigma_dex", "min", "max");

    private final Set<String> numbers = new HashSet<>();
    private final Map<String, String> others = new HashMap<>();
    private final Set<String> tables = new HashSet<>();
    private final List<String> galaxies = new java.util.ArrayList<>();

    private KeyCheck(Node root) {
        tables.add("");
        walk(root);
    }

    /** Reads the scenario's keys (syntax errors are reported with file and line). */
    public static KeyCheck of(Path scenario) {
        return new KeyCheck(ScenarioFile.open(scenario, Overrides.none()));
    }

    /**
     * @param option the option the key came from, for the message ("--vary", "--set")
     * @throws ScenarioException if the key is not a number of this scenario
     */
    public void requireNumber(String option, String key) {
        if (numbers.contains(key)) {
            return;
        }
        String what = others.get(key);
        if (what != null) {
            throw new ScenarioException(option, key, "is " + what + ", not a number, so it cannot be varied");
        }
        int dot = key.lastIndexOf('.');
        String parent = dot < 0 ? "" : key.substring(0, dot);
        String leaf = key.substring(dot + 1);
        boolean optional = tables.contains(parent) && OPTIONAL_NUMBERS.contains(leaf);
        boolean velocity = parent.endsWith(".velocity_kms") && leaf.matches("[012]")
                && tables.contains(parent.substring(0, parent.length() - ".velocity_kms".length()));
        if (!optional && !velocity) {
            String hint = Overrides.closestKey(key, knownKeys());
            throw new ScenarioException(option, key, "no such key in this scenario"
                    + (hint == null ? "" : " (did you mean '" + hint + "'?)"));
        }
    }

    /** Every key this scenario has or may have: for "did you mean". */
    private Set<String> knownKeys() {
        Set<String> all = new java.util.TreeSet<>(numbers);
        all.addAll(others.keySet());
        for (String t : tables) {
            for (String leaf : OPTIONAL_NUMBERS) {
                all.add(t.isEmpty() ? leaf : t + "." + leaf);
            }
        }
        return all;
    }

    /** The names of the scenario's galaxies, in file order. */
    public List<String> galaxyNames() {
        return List.copyOf(galaxies);
    }

    /**
     * @param option the option that names the member ("--pair", "--member")
     * @throws ScenarioException if the scenario has no galaxy of that name, with the nearest name
     */
    public void requireGalaxy(String option, String name) {
        if (galaxies.contains(name)) {
            return;
        }
        String hint = Overrides.closestKey(name, galaxies);
        throw new ScenarioException(option, name, "no such member"
                + (hint == null ? "" : " (did you mean '" + hint + "'?)") + "; the scenario has "
                + String.join(", ", galaxies));
    }

    /**
     * Checks a fixed override ({@code --set}), which may be of any type: the key must be in the
     * file, or be an optional numeric key of an existing table.
     *
     * @throws ScenarioException if the scenario has no such key
     */
    public void requireKnown(String option, String key) {
        if (!others.containsKey(key)) {
            requireNumber(option, key);
        }
    }

    private void walk(Node node) {
        for (String k : node.keys()) {
            String path = node.keyPath(k);
            Object raw = node.raw(k);
            if (raw instanceof Long || raw instanceof Double || isUncertain(raw)) {
                numbers.add(path);
            } else if (raw instanceof TomlTable) {
                tables.add(path);
                walk(node.table(k));
            } else if (raw instanceof TomlArray arr && !arr.isEmpty() && arr.get(0) instanceof TomlTable) {
                List<Node> elements = node.tables(k, "name");
                if (node.path().isEmpty() && k.equals("galaxy")) {
                    for (Node e : elements) {
                        galaxies.add(e.path().substring("galaxy.".length()));
                    }
                }
                for (Node e : elements) {
                    tables.add(e.path());
                    walk(e);
                }
            } else if (raw instanceof TomlArray arr) {
                others.put(path, "a vector (vary one component, e.g. " + path + ".0)");
                for (int i = 0; i < arr.size(); i++) {
                    Object c = arr.get(i);
                    if (c instanceof Long || c instanceof Double || isUncertain(c)) {
                        numbers.add(path + "." + i);
                    }
                }
            } else {
                others.put(path, Node.describe(raw));
            }
        }
    }

    private static boolean isUncertain(Object raw) {
        return raw instanceof TomlTable t && !t.isEmpty() && UNCERTAIN_KEYS.containsAll(t.keySet());
    }
}
