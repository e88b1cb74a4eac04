package org.holdfast.scenario;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

/**
 * Values given on the command line ({@code --set KEY=VALUE}, or a sweep's {@code --vary}) that
 * replace scenario values. Keys are dotted paths as {@link Node#path()} spells them; galaxies
 * are addressed by name ({@code galaxy.NAME.mass_msun}). Every override must be used by the
 * reader, otherwise it names a key that does not exist and {@link #checkAllUsed()} reports it.
 * Each override remembers the option it came from, so that a problem with a value the reader
 * took from it is blamed on that option rather than on the file's line it replaced.
 */
public final class Overrides {

    /** Where override errors are reported. */
    public static final String OPTION = "--set";

    private final Map<String, String> values = new LinkedHashMap<>();
    private final Map<String, String> options = new LinkedHashMap<>();
    private final Set<String> used = new LinkedHashSet<>();

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

    /** @throws ScenarioException naming the first override that matched no key */
    public void checkAllUsed() {
        for (String k : values.keySet()) {
            if (!used.contains(k)) {
                throw new ScenarioException(optionOf(k), k, "no such key in this scenario");
            }
        }
    }
}
