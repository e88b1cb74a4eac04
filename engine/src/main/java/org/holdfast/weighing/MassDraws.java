package org.holdfast.weighing;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.IntFunction;
import java.util.stream.IntStream;

import org.holdfast.expansion.ExpansionTable;
import org.holdfast.expansion.InvalidCosmologyException;

/**
 * The timing masses of many draws of uncertain inputs. Draw i depends only on (seed, i) (its
 * inputs come from {@code source}) and is written to slot i, so the answer is the same on any
 * number of threads.
 */
public final class MassDraws {

    /**
     * One draw.
     *
     * @param input what was drawn
     * @param ageGyr the age used
     * @param massMsun by {@link Background#ordinal()}: NaN where there is no solution (no
     *     cosmology, an age beyond it, or no mass that fits)
     */
    public record Draw(WeighingInput input, double ageGyr, double[] massMsun) {
    }

    private MassDraws() {
    }

    /**
     * @param n how many draws
     * @param source the inputs of draw i
     * @param shared the expansion of the central cosmology, or null; used for every draw unless
     *     {@code cosmologyVaries}
     * @param cosmologyVaries solve the cosmology of each draw
     * @param threads worker threads
     */
    public static Draw[] run(int n, IntFunction<WeighingInput> source, ExpansionTable shared, boolean cosmologyVaries,
            int threads) {
        Draw[] out = new Draw[n];
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, n).parallel().forEach(i -> out[i] = one(source.apply(i), shared,
                    cosmologyVaries))).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
        } finally {
            pool.shutdown();
        }
        return out;
    }

    /** The masses of one set of inputs. */
    public static Draw one(WeighingInput in, ExpansionTable shared, boolean cosmologyVaries) {
        ExpansionTable h = shared;
        if (in.cosmology() != null && (cosmologyVaries || h == null)) {
            try {
                h = in.cosmology().solve(1);
            } catch (InvalidCosmologyException e) {
                h = null;
            }
        }
        double age = Double.isNaN(in.ageGyr()) ? (h == null ? Double.NaN : h.ageGyr()) : in.ageGyr();
        double[] m = {Double.NaN, Double.NaN, Double.NaN};
        if (Double.isNaN(age)) {
            return new Draw(in, age, m);
        }
        PairMotion p = new PairMotion(in.separationKpc(), in.radialKms(), in.tangentialKms(), age);
        for (Background b : Background.values()) {
            if (b.needsHistory() && h == null) {
                continue;
            }
            try {
                m[b.ordinal()] = TimingSolver.solve(p, b, h).massMsun();
            } catch (IllegalArgumentException e) {
                m[b.ordinal()] = Double.NaN;
            }
        }
        return new Draw(in, age, m);
    }

    /** The masses of one background over all draws. */
    public static double[] masses(Draw[] draws, Background b) {
        double[] v = new double[draws.length];
        for (int i = 0; i < draws.length; i++) {
            v[i] = draws[i].massMsun()[b.ordinal()];
        }
        return v;
    }
}
