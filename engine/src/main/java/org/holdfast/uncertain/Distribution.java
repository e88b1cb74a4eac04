package org.holdfast.uncertain;

import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.util.FastMath;
import org.apache.commons.rng.UniformRandomProvider;

/**
 * The spread of one uncertain number. Each kind has a central value (what a plain run uses)
 * and draws from a uniform generator through a deterministic, pure-Java transform.
 */
public sealed interface Distribution {

    /** The value a plain run uses: the mean, the median or the mid-point. */
    double central();

    /** One random value. */
    double draw(UniformRandomProvider rng);

    /** Probability that a draw is at or below zero. */
    double probabilityNotPositive();

    /** A short description for messages and tables, e.g. "normal(mean 770, sigma 40)". */
    String describe();

    /** Gaussian with the given mean and standard deviation (sigma may be 0). */
    record Normal(double mean, double sigma) implements Distribution {
        @Override
        public double central() {
            return mean;
        }

        @Override
        public double draw(UniformRandomProvider rng) {
            return mean + sigma * standardNormal(rng);
        }

        @Override
        public double probabilityNotPositive() {
            return sigma == 0 ? (mean <= 0 ? 1 : 0) : standardNormalCdf(-mean / sigma);
        }

        @Override
        public String describe() {
            return "normal(mean " + Format.number(mean) + ", sigma " + Format.number(sigma) + ")";
        }
    }

    /** Log-normal: log10 of the value is Gaussian around log10(median) with sigma in dex. */
    record LogNormal(double median, double sigmaDex) implements Distribution {
        @Override
        public double central() {
            return median;
        }

        @Override
        public double draw(UniformRandomProvider rng) {
            return median * FastMath.pow(10.0, sigmaDex * standardNormal(rng));
        }

        @Override
        public double probabilityNotPositive() {
            return median > 0 ? 0 : 1;
        }

        @Override
        public String describe() {
            return "log-normal(median " + Format.number(median) + ", sigma " + Format.number(sigmaDex) + " dex)";
        }
    }

    /** Uniform on [min, max]. */
    record Uniform(double min, double max) implements Distribution {
        @Override
        public double central() {
            return 0.5 * (min + max);
        }

        @Override
        public double draw(UniformRandomProvider rng) {
            return min + (max - min) * openUnit(rng);
        }

        @Override
        public double probabilityNotPositive() {
            if (max <= 0) {
                return 1;
            }
            return min >= 0 ? (min == 0 && max == 0 ? 1 : 0) : -min / (max - min);
        }

        @Override
        public String describe() {
            return "uniform(min " + Format.number(min) + ", max " + Format.number(max) + ")";
        }
    }

    /**
     * A standard normal deviate by inversion, z = sqrt(2) erfinv(2u - 1), u uniform on (0, 1)
     * (inverse-transform method, e.g. Devroye 1986, Non-Uniform Random Variate Generation,
     * ch. 2, Theorem 2.1). Erf.erfInv is pure Java, so the result is the same on every machine.
     */
    static double standardNormal(UniformRandomProvider rng) {
        return FastMath.sqrt(2.0) * Erf.erfInv(2.0 * openUnit(rng) - 1.0);
    }

    /** Standard normal CDF, Phi(x) = erfc(-x / sqrt 2) / 2. */
    static double standardNormalCdf(double x) {
        return 0.5 * Erf.erfc(-x / FastMath.sqrt(2.0));
    }

    /** A uniform double strictly inside (0, 1): (k + 1/2) 2^-53 with k the top 53 bits. */
    static double openUnit(UniformRandomProvider rng) {
        return ((rng.nextLong() >>> 11) + 0.5) * 0x1.0p-53;
    }
}
