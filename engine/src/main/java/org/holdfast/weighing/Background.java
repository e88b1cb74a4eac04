package org.holdfast.weighing;

import java.util.List;

import org.holdfast.expansion.ExpansionHistory;

/**
 * What the relative orbit feels besides the pair's own gravity: K(t) r, with K in 1/Gyr^2.
 */
public enum Background {
    /** Nothing: the classical (Kepler) timing argument of Kahn &amp; Woltjer 1959. */
    NONE("none", "no background (Kepler)"),
    /**
     * The dark-energy force alone, k(t) = -(4 pi G/3)(rho_de + 3 p_de/c^2) of the history; for
     * a cosmological constant the constant Omega_L H0^2 = Lambda c^2 / 3 (Partridge, Lahav &amp;
     * Hoffman 2013, MNRAS 436, L45).
     */
    DARK_ENERGY("dark_energy", "dark-energy force alone"),
    /**
     * The whole background, a''/a = k(t) - (4 pi G/3) rho_m(t): the pair in the McVittie-like
     * Newtonian limit of Benisty 2024 (A&amp;A 689, L1), as a run's background_matter does.
     */
    FULL("full", "matter and dark energy (full background)");

    private final String key;
    private final String label;

    Background(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** The key used in options, files and output columns. */
    public String key() {
        return key;
    }

    /** A few words for tables. */
    public String label() {
        return label;
    }

    /** Whether the expansion history is needed. */
    public boolean needsHistory() {
        return this != NONE;
    }

    /** The background by its key, or null. */
    public static Background of(String key) {
        for (Background b : values()) {
            if (b.key.equals(key)) {
                return b;
            }
        }
        return null;
    }

    /** The keys, for messages. */
    public static List<String> keys() {
        return List.of(NONE.key, DARK_ENERGY.key, FULL.key);
    }

    /**
     * K(t) in 1/Gyr^2 at time t (Gyr from today). Times a hair before the history's first
     * entry (the Big Bang end of the table) use that entry: the separation there is tiny and
     * the last stretch lasts kyr.
     */
    public double coefficient(ExpansionHistory h, double tGyr) {
        if (this == NONE) {
            return 0;
        }
        double t = Math.max(tGyr, h.earliestGyr());
        double k = h.darkEnergyAcceleration(t);
        return this == FULL ? k + h.matterAcceleration(t) : k;
    }
}
