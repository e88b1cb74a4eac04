package org.holdfast.uncertain;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.apache.commons.rng.UniformRandomProvider;
import org.holdfast.schema.Node;
import org.holdfast.schema.NumberReader;
import org.tomlj.TomlTable;

/**
 * The {@link NumberReader} for scenarios whose numbers may be distributions. A plain number
 * passes through; an inline table is read as a {@link Distribution} and replaced by its
 * central value ({@link #central()}) or by draw {@code i} for a seed ({@link #sampling}).
 *
 * <p>Keys read through {@link Node#positive} must be positive: a distribution that puts more
 * than 0.1% of its weight at or below zero is refused with a message that names file, line
 * and key; one that puts between 1e-6 and 0.1% there is accepted with a warning, and draws at
 * or below zero are redrawn. Use one instance per reading of a scenario (it records what it
 * read); it is not meant to be shared between threads.
 *
 * <p>Example: {@code ScenarioFile.open(path, overrides, UncertainNumbers.sampling(42, 7))}
 * reads draw 7 of seed 42; {@link #used()} then lists every uncertain key and its value.
 */
public final class UncertainNumbers implements NumberReader {

    /** A draw at or below zero of a positive key is retried at most this often. */
    private static final int MAX_REDRAWS = 1000;

    private final boolean sampling;
    private final long seed;
    private final long drawIndex;
    private final Map<String, UncertainValue> used = new LinkedHashMap<>();
    private final Map<String, String> warnings = new LinkedHashMap<>();

    private UncertainNumbers(boolean sampling, long seed, long drawIndex) {
        this.sampling = sampling;
        this.seed = seed;
        this.drawIndex = drawIndex;
    }

    /** A reader that uses each distribution's central value (mean, median or mid-point). */
    public static UncertainNumbers central() {
        return new UncertainNumbers(false, 0, 0);
    }

    /**
     * A reader that draws each uncertain number for draw {@code drawIndex} of {@code seed};
     * the same pair always gives the same scenario.
     */
    public static UncertainNumbers sampling(long seed, long drawIndex) {
        if (drawIndex < 0) {
            throw new IllegalArgumentException("draw index must be >= 0, got " + drawIndex);
        }
        return new UncertainNumbers(true, seed, drawIndex);
    }

    /** Whether this reader draws (true) or uses central values (false). */
    public boolean isSampling() {
        return sampling;
    }

    @Override
    public double read(Node node, String key, Object raw) {
        return value(node, key, node.keyPath(key), key, raw, false);
    }

    @Override
    public double readPositive(Node node, String key, Object raw) {
        return value(node, key, node.keyPath(key), key, raw, true);
    }

    @Override
    public double readComponent(Node node, String key, int index, Object raw) {
        return value(node, key, node.keyPath(key) + "." + index, key + " component " + index, raw, false);
    }

    @Override
    public double assumeNormal(Node node, String key, int index, double mean, double sigma) {
        if (!sampling || !(sigma > 0)) {
            return mean;
        }
        String path = node.keyPath(key) + "." + index;
        UncertainValue known = used.get(path);
        if (known != null) {
            return known.value();
        }
        Distribution d = new Distribution.Normal(mean, sigma);
        double v = draw(d, path, false);
        used.put(path, new UncertainValue(path, d, v));
        return v;
    }

    /** Every uncertain key read so far, in the order first read, with the value used. */
    public List<UncertainValue> used() {
        return Collections.unmodifiableList(new ArrayList<>(used.values()));
    }

    /** Warnings about distributions that were accepted (e.g. a small chance of a negative mass). */
    public List<String> warnings() {
        return List.copyOf(warnings.values());
    }

    /**
     * One line for the user: which keys were uncertain and what was used, e.g.
     * "used central values for 1 uncertain value: galaxy.Ar.mass_msun = 1.5e+12
     * (log-normal(median 1.5e+12, sigma 0.2 dex))"; empty if
     * the scenario had no uncertain numbers.
     */
    public String summary() {
        if (used.isEmpty()) {
            return "";
        }
        String head = sampling
                ? "drew (seed " + seed + ", draw " + drawIndex + ") "
                : "used central values for ";
        return head + used.size() + " uncertain value" + (used.size() == 1 ? "" : "s") + ": "
                + used.values().stream()
                        .map(u -> u.path() + " = " + Format.number(u.value())
                                + " (" + u.distribution().describe() + ")")
                        .collect(Collectors.joining(", "));
    }

    private double value(Node node, String key, String path, String what, Object raw, boolean positive) {
        if (!(raw instanceof TomlTable t)) {
            return NumberReader.PLAIN.read(node, key, raw);
        }
        Distribution d = DistributionReader.read(node, key, what, t);
        if (positive) {
            String w = DistributionReader.checkPositive(node, key, what, d);
            if (w != null) {
                warnings.put(path, w);
            }
        }
        UncertainValue known = used.get(path);
        if (known != null) {
            return known.value();
        }
        double v = sampling ? draw(d, path, positive) : d.central();
        used.put(path, new UncertainValue(path, d, v));
        return v;
    }

    private double draw(Distribution d, String path, boolean positive) {
        UniformRandomProvider rng = KeyStreams.stream(seed, drawIndex, path);
        double v = d.draw(rng);
        for (int i = 0; positive && !(v > 0) && i < MAX_REDRAWS; i++) {
            v = d.draw(rng);
        }
        return v;
    }
}
