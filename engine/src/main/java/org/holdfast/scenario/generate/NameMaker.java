package org.holdfast.scenario.generate;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * Invented member names built from syllables (two or three of them, e.g. "Veskaro"), never
 * repeated within one group.
 */
final class NameMaker {

    private static final String[] ONSETS = {"b", "d", "f", "g", "k", "l", "m", "n", "p", "r", "s", "t", "v", "z",
        "br", "dr", "kl", "sk", "st", "th", "tr", "vr"};
    private static final String[] VOWELS = {"a", "e", "i", "o", "u", "ae", "ia", "ou"};
    private static final String[] CODAS = {"", "", "", "n", "r", "s", "l", "th", "x"};

    private final UniformRandomProvider rng;
    private final Set<String> used = new HashSet<>();

    NameMaker(UniformRandomProvider rng) {
        this.rng = rng;
    }

    /** A new name, unused so far in this group. */
    String next() {
        while (true) {
            int syllables = 2 + rng.nextInt(2);
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < syllables; i++) {
                sb.append(pick(ONSETS)).append(pick(VOWELS));
            }
            sb.append(pick(CODAS));
            String name = sb.substring(0, 1).toUpperCase(Locale.ROOT) + sb.substring(1);
            if (used.add(name)) {
                return name;
            }
        }
    }

    private String pick(String[] from) {
        return from[rng.nextInt(from.length)];
    }
}
