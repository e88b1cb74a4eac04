package org.holdfast.uncertain;

import java.nio.charset.StandardCharsets;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.core.source64.XoRoShiRo128PlusPlus;

/**
 * One independent generator per (seed, draw index, key path). The three are mixed into a
 * 128-bit seed for XoRoShiRo128++ (Blackman and Vigna 2021, ACM TOMS 47, 36), so a key's draw
 * depends neither on which other keys exist nor on the order they are read in.
 */
final class KeyStreams {

    private static final long GOLDEN = 0x9E3779B97F4A7C15L;

    private KeyStreams() {
    }

    static UniformRandomProvider stream(long seed, long drawIndex, String path) {
        long h = mix(mix(seed + GOLDEN) ^ drawIndex);
        h = mix(h ^ fnv1a(path));
        return new XoRoShiRo128PlusPlus(mix(h + GOLDEN), mix(h + 2 * GOLDEN));
    }

    /**
     * The 64-bit finaliser of SplitMix64 (Steele, Lea and Flood 2014, OOPSLA, "Fast splittable
     * pseudorandom number generators"; constants as published there).
     */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** 64-bit FNV-1a of the UTF-8 bytes (Fowler, Noll and Vo; offset basis and prime as published). */
    static long fnv1a(String text) {
        long h = 0xCBF29CE484222325L;
        for (byte b : text.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xFF;
            h *= 0x100000001B3L;
        }
        return h;
    }
}
