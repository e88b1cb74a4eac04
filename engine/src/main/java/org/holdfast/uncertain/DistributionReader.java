package org.holdfast.uncertain;

import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import org.holdfast.schema.Node;
import org.tomlj.TomlTable;

/**
 * Reads one distribution written as an inline table and checks it. Every error names the
 * file, line and key of the uncertain number through {@link Node#error}.
 */
final class DistributionReader {

    /** Above this chance of a value at or below zero, a key that must be positive is refused. */
    static final double REFUSE_NOT_POSITIVE = 1e-3;

    /** Above this chance (and up to the refusal level) the reader warns. */
    static final double WARN_NOT_POSITIVE = 1e-6;

    private static final Set<String> NORMAL = Set.of("mean", "sigma");
    private static final Set<String> LOG_NORMAL = Set.of("median", "sigma_dex");
    private static final Set<String> UNIFORM = Set.of("min", "max");
    private static final String FORMS =
            "write { mean = M, sigma = S } (normal), { median = M, sigma_dex = S } (log-normal)"
            + " or { min = A, max = B } (uniform)";

    private DistributionReader() {
    }

    /**
     * @param node the table holding the key
     * @param key the key, for messages
     * @param what "key" or "key component i", for messages
     */
    static Distribution read(Node node, String key, String what, TomlTable t) {
        Set<String> keys = new TreeSet<>(t.keySet());
        if (keys.equals(NORMAL)) {
            double sigma = field(node, key, t, "sigma");
            if (sigma < 0) {
                throw node.error(key, what + ": sigma must be >= 0 (got " + Format.number(sigma) + ")");
            }
            return new Distribution.Normal(field(node, key, t, "mean"), sigma);
        }
        if (keys.equals(LOG_NORMAL)) {
            double median = field(node, key, t, "median");
            double sigmaDex = field(node, key, t, "sigma_dex");
            if (!(median > 0)) {
                throw node.error(key, what + ": a log-normal needs median > 0 (got " + Format.number(median) + ")");
            }
            if (sigmaDex < 0) {
                throw node.error(key, what + ": sigma_dex must be >= 0 (got " + Format.number(sigmaDex) + ")");
            }
            return new Distribution.LogNormal(median, sigmaDex);
        }
        if (keys.equals(UNIFORM)) {
            double min = field(node, key, t, "min");
            double max = field(node, key, t, "max");
            if (min > max) {
                throw node.error(key, what + ": min must not exceed max (got min " + Format.number(min)
                        + ", max " + Format.number(max) + ")");
            }
            return new Distribution.Uniform(min, max);
        }
        throw node.error(key, what + ": not a number or a known distribution (keys "
                + String.join(", ", keys) + "); " + FORMS);
    }

    /**
     * Refuses a distribution of a key that must be positive when it puts more than
     * {@link #REFUSE_NOT_POSITIVE} of its weight at or below zero.
     *
     * @return a warning when that chance is small but not negligible, else null
     */
    static String checkPositive(Node node, String key, String what, Distribution d) {
        double p = d.probabilityNotPositive();
        if (p > REFUSE_NOT_POSITIVE) {
            String hint = d instanceof Distribution.Normal
                    ? "; for a positive quantity use a log-normal { median = M, sigma_dex = S }" : "";
            throw node.error(key, what + " must be > 0, but " + d.describe() + " gives a value <= 0 with probability "
                    + percent(p) + hint);
        }
        if (p > WARN_NOT_POSITIVE) {
            return node.where(key) + ": " + node.keyPath(key) + ": " + d.describe()
                    + " gives a value <= 0 with probability " + percent(p)
                    + "; such draws are redrawn (the normal is truncated at zero)";
        }
        return null;
    }

    private static double field(Node node, String key, TomlTable t, String name) {
        Object v = t.get(name);
        double x;
        if (v instanceof Double d) {
            x = d;
        } else if (v instanceof Long l) {
            x = l;
        } else {
            throw node.error(key, "'" + name + "' must be a number, got " + Node.describe(v));
        }
        if (!Double.isFinite(x)) {
            throw node.error(key, "'" + name + "' must be a finite number (got " + x + ")");
        }
        return x;
    }

    private static String percent(double p) {
        return String.format(Locale.ROOT, "%.2g%%", 100 * p);
    }
}
