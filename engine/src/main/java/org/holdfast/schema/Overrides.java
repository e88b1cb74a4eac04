package org.holdfast.schema;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

import org.tomlj.Toml;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.Node;

/**
 * Values given on the command line ({@code --set KEY=VALUE}, or a sweep's {@code --vary}) that
 * replace scenario values. Keys are dotted paths as {@link Node#path()} spells them; galaxies
 * are addressed by name ({@code galaxy.NAME.mass_msun}). Every override must be used by the
 * reader, otherwise it names a key that does not exist and {@link #checkAllUsed()} reports it.
 * Each override remembers the option it came from, so that a problem with a value the reader
 * took from it is blamed on that option rather than on the file's line it replaced.
 *
 * <p>A value may be an inline TOML table where the scenario takes a number, to make it
 * uncertain from the command line: {@code --set 'galaxy.Harl.mass_msun={ median = 1.2e12,
 * sigma_dex = 0.2 }'} reads exactly as the same table written in the file would.
 */
public final class Overrides {

    /** Where override errors are reported. */
    public static final String OPTION = "--set";

    private final Map<String, String> values = new LinkedHashMap<>();
    private final Map<String, String> options = new LinkedHashMap<>();
    private final Set<String> used = new LinkedHashSet<>();
    private final Set<String> asked = new LinkedHashSet<>();

    /** No overrides. */
    public static Overrides none() {
        return new Overrides();
    }

    /**
     * Parses {@code KEY=VALUE} assignments.
     *
     * @throws ScenarioException for an assignment without '=' or with an empty key
     */
    public static Overrides parse(Iterable<String> assignments) {
        Overrides o = new Overrides();
        for (String a : assignments) {
            int eq = a.indexOf('=');
            if (eq <= 0) {
                throw new ScenarioException(OPTION, a, "expected KEY=VALUE");
            }
            o.put(a.substring(0, eq).trim(), a.substring(eq + 1).trim(), OPTION);
        }
        return o;
    }

    /**
     * Adds or replaces one override that no option of the user's gave (a program's own
     * setting): a problem with its value is reported at the key's place in the file.
     */
    public Overrides put(String dottedKey, String value) {
        values.put(dottedKey, value);
        options.remove(dottedKey);
        return this;
    }

    /**
     * Adds or replaces one override that the user gave with an option.
     *
     * @param option the option it came from ("--set", "--vary"), named in error messages
     */
    public Overrides put(String dottedKey, String value, String option) {
        values.put(dottedKey, value);
        options.put(dottedKey, option);
        return this;
    }

    /** A copy, with nothing marked as used. */
    public Overrides copy() {
        Overrides o = new Overrides();
        o.values.putAll(values);
        o.options.putAll(options);
        return o;
    }

    /** The option an override came from ("--set" when none was recorded). */
    public String optionOf(String dottedKey) {
        return options.getOrDefault(dottedKey, OPTION);
    }

    /**
     * The option whose value the reader took for a key, or for one of its components
     * ({@code key.0}, {@code key.1}, ...) when the key is a vector; null when the file's own
     * value was used.
     */
    String sourceOf(String dottedKey) {
        if (used.contains(dottedKey) && options.containsKey(dottedKey)) {
            return options.get(dottedKey);
        }
        for (String k : used) {
            if (k.length() > dottedKey.length() + 1 && k.startsWith(dottedKey + ".") && options.containsKey(k)
                    && k.substring(dottedKey.length() + 1).chars().allMatch(Character::isDigit)) {
                return options.get(k);
            }
        }
        return null;
    }

    /** The override for a key, marking it used; null if none. */
    String take(String dottedKey) {
        asked.add(dottedKey);
        String v = values.get(dottedKey);
        if (v != null) {
            used.add(dottedKey);
        }
        return v;
    }

    /** All overrides as given, in order. */
    public Map<String, String> asMap() {
        return java.util.Collections.unmodifiableMap(values);
    }

    /**
     * @throws ScenarioException naming the first override that matched no key, with the nearest
     *     key the reader looked for ("did you mean 'galaxy.Harl.mass_msun'?")
     */
    public void checkAllUsed() {
        for (String k : values.keySet()) {
            if (!used.contains(k)) {
                String hint = closestKey(k, asked);
                throw new ScenarioException(optionOf(k), k, "no such key in this scenario"
                        + (hint == null ? "" : " (did you mean '" + hint + "'?)"));
            }
        }
    }

    /**
     * The key nearest a mistyped dotted key: first the part that differs (a galaxy's name, a
     * table's or a key's), then the whole; null when nothing is near.
     */
    public static String closestKey(String key, java.util.Collection<String> known) {
        String best = Node.closest(key, known);
        if (best != null) {
            return best;
        }
        // A long key with a short wrong part (a misspelt galaxy name) is far from everything as a
        // whole: compare the keys of the same shape part by part, and accept one wrong part.
        String[] parts = key.split("\\.", -1);
        String found = null;
        for (String k : known) {
            String[] o = k.split("\\.", -1);
            if (o.length != parts.length) {
                continue;
            }
            int wrong = -1;
            int differ = 0;
            for (int i = 0; i < o.length; i++) {
                if (!o[i].equals(parts[i])) {
                    wrong = i;
                    differ++;
                }
            }
            if (differ == 1 && Node.closest(parts[wrong], java.util.List.of(o[wrong])) != null) {
                if (found != null && !found.equals(k)) {
                    return null;
                }
                found = k;
            }
        }
        return found;
    }

    /**
     * An override's value as an inline table ("{ median = 1.2e12, sigma_dex = 0.2 }"), or null
     * when it is not written as one.
     *
     * @throws ScenarioException naming the option and the key when the table does not parse
     */
    public TomlTable inlineTable(String dottedKey, String value) {
        String t = value.trim();
        if (!t.startsWith("{")) {
            return null;
        }
        TomlParseResult r = Toml.parse("value = " + t);
        if (r.hasErrors() || !(r.get("value") instanceof TomlTable table)) {
            throw new ScenarioException(optionOf(dottedKey), dottedKey, "expected a number or an inline table such as"
                    + " { median = 1.2e12, sigma_dex = 0.2 }, got '" + t + "'");
        }
        return table;
    }
}
