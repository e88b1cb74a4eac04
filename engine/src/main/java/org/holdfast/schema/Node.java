package org.holdfast.schema;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import org.apache.commons.text.similarity.LevenshteinDistance;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;

/**
 * One table of a scenario file, read through a schema: each accessor names the key it wants,
 * checks the type, and on failure throws a {@link ScenarioException} that names the file, the
 * line and the dotted key. {@link #allowOnly} rejects keys the reader does not know, so a typo
 * never passes silently. {@code --set} overrides are consulted first, by dotted path.
 */
public final class Node {

    private final Path file;
    private final TomlTable table;
    private final String path;
    private final TomlPosition position;
    private final Overrides overrides;
    private final NumberReader numbers;

    Node(Path file, TomlTable table, String path, TomlPosition position, Overrides overrides,
            NumberReader numbers) {
        this.file = file;
        this.table = table;
        this.path = path;
        this.position = position;
        this.overrides = overrides;
        this.numbers = numbers;
    }

    /** The file this table came from. */
    public Path file() {
        return file;
    }

    /** The dotted path of this table ("" for the root, "galaxy.NAME" for a galaxy). */
    public String path() {
        return path;
    }

    /** The dotted path of a key in this table. */
    public String keyPath(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** Whether the key is present (in the file or as an override). */
    public boolean has(String key) {
        return table.contains(List.of(key)) || overrides.asMap().containsKey(keyPath(key));
    }

    /** Whether the file itself holds the key (overrides not counted). */
    public boolean hasInFile(String key) {
        return table.contains(List.of(key));
    }

    /** The keys present in the file, in no particular order. */
    public Set<String> keys() {
        return table.keySet();
    }

    /**
     * Rejects any key not in {@code allowed}, suggesting the closest allowed one.
     *
     * @throws ScenarioException for the first unknown key (by line)
     */
    public Node allowOnly(String... allowed) {
        List<String> ok = Arrays.asList(allowed);
        String worst = null;
        int worstLine = Integer.MAX_VALUE;
        for (String k : table.keySet()) {
            if (!ok.contains(k)) {
                int line = lineOf(k);
                if (line < worstLine) {
                    worstLine = line;
                    worst = k;
                }
            }
        }
        if (worst != null) {
            String hint = closest(worst, ok);
            throw error(worst, "unknown key" + (hint == null ? "" : " (did you mean '" + hint + "'?)")
                    + "; allowed here: " + String.join(", ", new TreeSet<>(ok)));
        }
        return this;
    }

    /** A required number. */
    public double number(String key) {
        return readNumber(key, false);
    }

    private double readNumber(String key, boolean mustBePositive) {
        String o = overrides.take(keyPath(key));
        if (o != null) {
            TomlTable given = overrides.inlineTable(keyPath(key), o);
            if (given != null) {
                return finite(key, mustBePositive ? numbers.readPositive(this, key, given) : numbers.read(this, key, given));
            }
            return parseOverrideNumber(key, o);
        }
        Object raw = table.get(List.of(key));
        if (raw == null) {
            throw error(null, "missing required key '" + keyPath(key) + "'");
        }
        return finite(key, mustBePositive ? numbers.readPositive(this, key, raw) : numbers.read(this, key, raw));
    }

    /**
     * Component {@code index} of an assumed number that is not in the file: the mean in a
     * central run, a draw from normal(mean, sigma) at path {@code key.index} in a sampling run
     * ({@link NumberReader#assumeNormal}).
     */
    public double assumedNormal(String key, int index, double mean, double sigma) {
        return numbers.assumeNormal(this, key, index, mean, sigma);
    }

    /** An optional number. */
    public double number(String key, double fallback) {
        return has(key) ? number(key) : fallback;
    }

    /** A required number that must be strictly positive. */
    public double positive(String key) {
        double v = readNumber(key, true);
        if (!(v > 0)) {
            throw error(key, "must be > 0 (got " + fmt(v) + ")");
        }
        return v;
    }

    /** An optional number that must be strictly positive when present. */
    public double positive(String key, double fallback) {
        return has(key) ? positive(key) : fallback;
    }

    /** A required whole number in [min, max]. */
    public long integer(String key, long min, long max) {
        String o = overrides.take(keyPath(key));
        long v;
        if (o != null) {
            try {
                v = Long.parseLong(o);
            } catch (NumberFormatException e) {
                throw new ScenarioException(overrides.optionOf(keyPath(key)), keyPath(key), "expected a whole number, got '" + o + "'");
            }
        } else {
            Object raw = table.get(List.of(key));
            if (raw == null) {
                throw error(null, "missing required key '" + keyPath(key) + "'");
            }
            if (!(raw instanceof Long l)) {
                throw error(key, "expected a whole number, got " + describe(raw));
            }
            v = l;
        }
        if (v < min || v > max) {
            throw error(key, "must be between " + min + " and " + max + " (got " + v + ")");
        }
        return v;
    }

    /** An optional whole number in [min, max]. */
    public long integer(String key, long min, long max, long fallback) {
        return has(key) ? integer(key, min, max) : fallback;
    }

    /** A required string. */
    public String string(String key) {
        String o = overrides.take(keyPath(key));
        if (o != null) {
            return o;
        }
        Object raw = table.get(List.of(key));
        if (raw == null) {
            throw error(null, "missing required key '" + keyPath(key) + "'");
        }
        if (!(raw instanceof String s)) {
            throw error(key, "expected a string, got " + describe(raw));
        }
        return s;
    }

    /** An optional string. */
    public String string(String key, String fallback) {
        return has(key) ? string(key) : fallback;
    }

    /** A required string from a fixed set of choices (case-sensitive). */
    public String choice(String key, Collection<String> choices) {
        String v = string(key);
        if (!choices.contains(v)) {
            String hint = closest(v, choices);
            throw error(key, "unknown value '" + v + "'" + (hint == null ? "" : " (did you mean '" + hint + "'?)")
                    + "; choose one of: " + String.join(", ", choices));
        }
        return v;
    }

    /** An optional string from a fixed set of choices. */
    public String choice(String key, Collection<String> choices, String fallback) {
        return has(key) ? choice(key, choices) : fallback;
    }

    /** An optional boolean. */
    public boolean bool(String key, boolean fallback) {
        String o = overrides.take(keyPath(key));
        if (o != null) {
            if (o.equals("true") || o.equals("false")) {
                return Boolean.parseBoolean(o);
            }
            throw new ScenarioException(overrides.optionOf(keyPath(key)), keyPath(key), "expected true or false, got '" + o + "'");
        }
        Object raw = table.get(List.of(key));
        if (raw == null) {
            return fallback;
        }
        if (!(raw instanceof Boolean b)) {
            throw error(key, "expected true or false, got " + describe(raw));
        }
        return b;
    }

    /**
     * A required vector of numbers of the given length. Each component goes through the
     * number reader, so a component may itself be an uncertain number. Overrides address
     * components as {@code key.0}, {@code key.1}, ... or the whole vector as "[x, y, z]".
     */
    public double[] vector(String key, int length) {
        double[] out = new double[length];
        String whole = overrides.take(keyPath(key));
        if (whole != null) {
            String[] parts = whole.replace("[", "").replace("]", "").split(",");
            if (parts.length != length) {
                throw new ScenarioException(overrides.optionOf(keyPath(key)), keyPath(key), "expected " + length + " numbers, got '" + whole + "'");
            }
            for (int i = 0; i < length; i++) {
                out[i] = parseOverrideNumber(key, parts[i].trim());
            }
            return out;
        }
        Object raw = table.get(List.of(key));
        if (raw == null) {
            throw error(null, "missing required key '" + keyPath(key) + "'");
        }
        if (!(raw instanceof TomlArray arr) || arr.size() != length) {
            throw error(key, "expected an array of " + length + " numbers, got " + describe(raw));
        }
        for (int i = 0; i < length; i++) {
            String ck = key + "." + i;
            String o = overrides.take(keyPath(ck));
            TomlTable given = o == null ? null : overrides.inlineTable(keyPath(ck), o);
            out[i] = given != null ? finite(key, numbers.readComponent(this, key, i, given))
                    : o != null ? parseOverrideNumber(ck, o) : finite(key, numbers.readComponent(this, key, i, arr.get(i)));
        }
        return out;
    }

    /** A sub-table (a [section] or an inline table); null if absent. */
    public Node table(String key) {
        Object raw = table.get(List.of(key));
        if (raw == null) {
            return null;
        }
        if (!(raw instanceof TomlTable t)) {
            throw error(key, "expected a table, got " + describe(raw));
        }
        return new Node(file, t, keyPath(key), table.inputPositionOf(List.of(key)), overrides, numbers);
    }

    /** A required sub-table. */
    public Node requireTable(String key) {
        Node n = table(key);
        if (n == null) {
            throw error(null, "missing required table [" + keyPath(key) + "]");
        }
        return n;
    }

    /**
     * An array of tables ({@code [[galaxy]]}); each element's path is {@code key.NAME} where
     * NAME is the element's {@code nameKey} value, or {@code key[i]} if it has none.
     */
    public List<Node> tables(String key, String nameKey) {
        Object raw = table.get(List.of(key));
        List<Node> out = new ArrayList<>();
        if (raw == null) {
            return out;
        }
        if (!(raw instanceof TomlArray arr)) {
            throw error(key, "expected [[" + key + "]] tables, got " + describe(raw));
        }
        for (int i = 0; i < arr.size(); i++) {
            if (!(arr.get(i) instanceof TomlTable t)) {
                throw error(key, "expected [[" + key + "]] tables, got " + describe(arr.get(i)));
            }
            Object name = nameKey == null ? null : t.get(List.of(nameKey));
            String p = name instanceof String s ? keyPath(key) + "." + s : keyPath(key) + "[" + i + "]";
            out.add(new Node(file, t, p, arr.inputPositionOf(i), overrides, numbers));
        }
        return out;
    }

    /** The raw value of a key, for readers that interpret it themselves; null if absent. */
    public Object raw(String key) {
        return table.get(List.of(key));
    }

    /** Line of a key in the file, or of this table when the key is absent. */
    public int lineOf(String key) {
        TomlPosition p = key == null ? null : table.inputPositionOf(List.of(key));
        if (p == null) {
            p = position;
        }
        return p == null ? 1 : p.line();
    }

    /**
     * "file:line" of a key (or of this table); for a key whose value came from an override
     * ({@code --set}, {@code --vary}), that option instead, since the file's line no longer
     * holds the value at fault.
     */
    public String where(String key) {
        String option = key == null ? null : overrides.sourceOf(keyPath(key));
        return option != null ? option : file + ":" + lineOf(key);
    }

    /** An error about a key of this table (or the table itself when key is null). */
    public ScenarioException error(String key, String message) {
        return new ScenarioException(where(key), key == null ? (path.isEmpty() ? null : path) : keyPath(key), message);
    }

    /** A short description of a raw TOML value's type, for messages. */
    public static String describe(Object raw) {
        if (raw == null) {
            return "nothing";
        }
        if (raw instanceof String s) {
            return "the string \"" + s + "\"";
        }
        if (raw instanceof TomlArray a) {
            return "an array of " + a.size();
        }
        if (raw instanceof TomlTable) {
            return "a table";
        }
        if (raw instanceof Boolean b) {
            return "the boolean " + b;
        }
        return "'" + raw + "'";
    }

    private double parseOverrideNumber(String key, String text) {
        try {
            double v = Double.parseDouble(text);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ScenarioException(overrides.optionOf(keyPath(key)), keyPath(key), "expected a number, got '" + text + "'");
    }

    private double finite(String key, double v) {
        if (!Double.isFinite(v)) {
            throw error(key, "must be a finite number (got " + v + ")");
        }
        return v;
    }

    public static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    /** The allowed word nearest to {@code word} by edit distance, if near enough. */
    static String closest(String word, Collection<String> allowed) {
        String best = null;
        int bestD = Integer.MAX_VALUE;
        for (String a : allowed) {
            int d = editDistance(word.toLowerCase(Locale.ROOT), a.toLowerCase(Locale.ROOT));
            if (d < bestD) {
                bestD = d;
                best = a;
            }
        }
        return bestD <= Math.max(2, word.length() / 3) ? best : null;
    }

    private static int editDistance(String a, String b) {
        return LevenshteinDistance.getDefaultInstance().apply(a, b);
    }
}
