package org.holdfast.uncertain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.stream.IntStream;

import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;
import org.junit.jupiter.api.Test;
import org.tomlj.TomlTable;

/**
 * Statistics and reproducibility of seeded draws. Draw i of a scenario is the unit a sweep
 * runs, so every sample here is taken as draw i of one seed, i = 0 .. N-1, the way a sweep
 * takes them.
 */
class UncertainSamplingTest {

    private static final int N = 100_000;

    /** Three standard errors: a fixed seed makes this deterministic (common practice). */
    private static final double Z = 3.0;

    private static final Node NODE = ScenarioFile.parse(Path.of("draws.toml"), String.join("\n",
            "a = { mean = 770, sigma = 40 }",
            "b = { median = 1.5e12, sigma_dex = 0.2 }",
            "c = { min = -1.3, max = -0.7 }",
            "d = { mean = 770, sigma = 40 }", ""), Overrides.none(), UncertainNumbers.central());

    /**
     * Draw i = 0 .. N-1 of one key, as the reader makes it: the key's own stream for
     * (seed, i, path) fed to its distribution ({@link #theReaderDrawsFromTheKeysOwnStream}
     * checks that this is what the reader returns).
     */
    private static double[] draws(String key, long seed) {
        Distribution d = DistributionReader.read(NODE, key, key, (TomlTable) NODE.raw(key));
        double[] x = new double[N];
        for (int i = 0; i < N; i++) {
            x[i] = d.draw(KeyStreams.stream(seed, i, key));
        }
        return x;
    }

    @Test
    void theReaderDrawsFromTheKeysOwnStream() {
        for (String key : new String[] {"a", "b", "c"}) {
            Distribution d = DistributionReader.read(NODE, key, key, (TomlTable) NODE.raw(key));
            for (int i = 0; i < N; i += 997) {
                assertEquals(d.draw(KeyStreams.stream(16, i, key)),
                        UncertainNumbers.sampling(16, i).read(NODE, key, NODE.raw(key)), "key " + key + ", draw " + i);
            }
        }
    }

    /**
     * Sample mean and standard deviation against the inputs, each within Z of its standard
     * error: SE(mean) = sigma / sqrt(N); SE(s) = sqrt((m4 - s^4) / N) / (2 s), the delta method
     * on the variance of s^2 (Kendall and Stuart 1977, The Advanced Theory of Statistics,
     * vol. 1, 4th ed., eq. 10.9 for var(m2), to leading order in 1/N).
     */
    private static void assertMoments(double[] x, double mean, double sd) {
        double m = 0;
        for (double v : x) {
            m += v;
        }
        m /= x.length;
        double m2 = 0;
        double m4 = 0;
        for (double v : x) {
            double d = (v - m) * (v - m);
            m2 += d;
            m4 += d * d;
        }
        double s = Math.sqrt(m2 / (x.length - 1));
        m4 /= x.length;
        double seMean = sd / Math.sqrt(x.length);
        double seSd = Math.sqrt((m4 - s * s * s * s) / x.length) / (2 * s);
        assertEquals(mean, m, Z * seMean, "mean");
        assertEquals(sd, s, Z * seSd, "standard deviation");
    }

    @Test
    void normalDrawsHaveTheGivenMeanAndSigma() {
        assertMoments(draws("a", 11), 770, 40);
    }

    @Test
    void logNormalDrawsHaveTheGivenMedianAndDexWidthInLog10() {
        double[] x = draws("b", 12);
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.log10(x[i]);
        }
        assertMoments(x, Math.log10(1.5e12), 0.2);
    }

    @Test
    void uniformDrawsHaveMidPointAndWidthOverRootTwelve() {
        // Uniform on [a, b]: mean (a + b) / 2, standard deviation (b - a) / sqrt(12)
        // (common practice; any probability text).
        double[] x = draws("c", 13);
        assertMoments(x, -1.0, 0.6 / Math.sqrt(12));
        for (double v : x) {
            assertTrue(v > -1.3 && v < -0.7, "outside [min, max]: " + v);
        }
    }

    @Test
    void twoKeysWithTheSameDistributionAreUncorrelated() {
        // Independent streams: the sample correlation of independent variables has standard
        // error 1/sqrt(N) to leading order (Fisher 1915, Biometrika 10, 507).
        double[] a = draws("a", 14);
        double[] d = draws("d", 14);
        double ma = 0;
        double md = 0;
        for (int i = 0; i < N; i++) {
            ma += a[i];
            md += d[i];
        }
        ma /= N;
        md /= N;
        double sad = 0;
        double saa = 0;
        double sdd = 0;
        for (int i = 0; i < N; i++) {
            sad += (a[i] - ma) * (d[i] - md);
            saa += (a[i] - ma) * (a[i] - ma);
            sdd += (d[i] - md) * (d[i] - md);
        }
        double r = sad / Math.sqrt(saa * sdd);
        assertEquals(0, r, Z / Math.sqrt(N), "correlation of two keys");
    }

    @Test
    void theDrawDoesNotDependOnThreads() {
        double[] serial = IntStream.range(0, N / 10)
                .mapToDouble(i -> UncertainNumbers.sampling(15, i).read(NODE, "b", NODE.raw("b")))
                .toArray();
        double[] parallel = IntStream.range(0, N / 10).parallel()
                .mapToDouble(i -> UncertainNumbers.sampling(15, i).read(NODE, "b", NODE.raw("b")))
                .toArray();
        assertArrayEquals(serial, parallel);
    }

    @Test
    void theDrawIsTheSameBitsOnAnyMachine() {
        // Regression values written down once on the development machine (not physics). The
        // generator is integer arithmetic and the transforms are pure Java (commons-math3 FastMath
        // and Erf), so any JVM on any processor must reproduce them bit for bit.
        String[][] gold = {
            {"2026", "0", "-0x1.5fd0e1d589929p-1", "0x1.ef7fd4aa90512p38", "-0x1.2d82427d475a5p0"},
            {"2026", "1", "0x1.d6d304961fd3ep-1", "0x1.df14c3352dd72p39", "-0x1.99fef376af2c2p-1"},
            {"1", "99999", "-0x1.631e568bda2b5p-2", "0x1.4bd832f6765a8p39", "-0x1.27939e65fe74fp0"},
            {"-7", "3", "0x1.73dec2fd9c6bp0", "0x1.c43417959a569p39", "-0x1.92c70a8b7c595p-1"},
        };
        Node n = ScenarioFile.parse(Path.of("gold.toml"), String.join("\n",
                "a = { mean = 0, sigma = 1 }",
                "b = { median = 1e12, sigma_dex = 0.3 }",
                "c = { min = -1.3, max = -0.7 }", ""), Overrides.none(), UncertainNumbers.central());
        for (String[] row : gold) {
            UncertainNumbers u = UncertainNumbers.sampling(Long.parseLong(row[0]), Long.parseLong(row[1]));
            String[] keys = {"a", "b", "c"};
            for (int k = 0; k < 3; k++) {
                assertEquals(Double.parseDouble(row[2 + k]), u.read(n, keys[k], n.raw(keys[k])),
                        "seed " + row[0] + " draw " + row[1] + " key " + keys[k]);
            }
        }
    }
}
