package org.holdfast.scenario;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

/**
 * Values given on the command line ({@code --set KEY=VALUE}) that replace scenario values.
 * Keys are dotted paths as {@link Node#path()} spells them; galaxies are addressed by name
 * ({@code galaxy.NAME.mass_msun}). Every override must be used by the reader, otherwise it
 * names a key that does not exist and {@link #checkAllUsed()} reports it.
 */
public final class Overrides {

    /** Where override errors are reported. */
    public static final String OPTION = "--set";

    private final Map<String, String> values = new LinkedHashMap<>();
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
            o.put(a.substring(0, eq).trim(), a.substring(eq + 1).trim());
        }
        return o;
    }

    /** Adds or replaces one override. */
    public Overrides put(String dottedKey, String value) {
        values.put(dottedKey, value);
        return this;
    }

    /** A copy, with nothing marked as used. */
    public Overrides copy() {
        Overrides o = new Overrides();
        o.values.putAll(values);
        return o;
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
                throw new ScenarioException(OPTION, k, "no such key in this scenario");
            }
        }
    }
}
