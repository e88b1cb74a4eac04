package org.holdfast.expansion;

import java.util.Locale;
import java.util.Map;

import org.holdfast.bench.BenchSuite;

/**
 * Cost of the expansion table: one a(t) plus dark-energy lookup, as the dynamics does at every
 * kick (times advancing as in a run; also scattered times, and a whole rip history including
 * the log-time segments), and building the table. Warm-up first; every result feeds a sink that is reported, so
 * the JIT cannot drop the work.
 */
public final class ExpansionBench implements BenchSuite {

    static final double LOOKUP_TARGET_NS = 50;
    static final double BUILD_TARGET_MS = 50;

    @Override
    public String name() {
        return "expansion";
    }

    @Override
    public void run(boolean quick, Map<String, Object> results) {
        Cosmology lambda = new Cosmology(70, 0.3, 0, 0, new ConstantW(-1));
        Cosmology phantom = new Cosmology(70, 0.3, 0, 0, new W0WaDarkEnergy(-1.3, 0.2));
        int builds = quick ? 3 : 15;
        double sink = 0;
        for (int i = 0; i < builds; i++) {
            sink += lambda.solve().ageGyr() + phantom.solve().ageGyr();
        }
        double buildMs = Double.MAX_VALUE;
        ExpansionTable table = null;
        for (int i = 0; i < builds; i++) {
            long t0 = System.nanoTime();
            table = phantom.solve();
            buildMs = Math.min(buildMs, (System.nanoTime() - t0) / 1e6);
            sink += table.ageGyr();
        }
        double lambdaMs = Double.MAX_VALUE;
        for (int i = 0; i < builds; i++) {
            long t0 = System.nanoTime();
            ExpansionTable t = lambda.solve();
            lambdaMs = Math.min(lambdaMs, (System.nanoTime() - t0) / 1e6);
            sink += t.ageGyr();
        }
        int n = quick ? 200_000 : 2_000_000;
        // as a run uses it: all bodies ask at the same time, which advances step by step
        ExpansionTable lambdaTable = lambda.solve();
        sink += run(lambdaTable, -5, 20, n);
        long t0 = System.nanoTime();
        sink += run(lambdaTable, -5, 20, n);
        double lookupNs = (System.nanoTime() - t0) / (double) n;
        // scattered times over the middle of the history: every lookup misses the cache
        double[] mid = times(-5, 20);
        sink += lookups(lambdaTable, mid, n);
        long t3 = System.nanoTime();
        sink += lookups(lambdaTable, mid, n);
        double randomNs = (System.nanoTime() - t3) / (double) n;
        // the whole history of a rip, half of it in the log-time segments near either singularity
        double[] whole = times(-13, Math.min(20, table.latestGyr()));
        sink += lookups(table, whole, n);
        long t2 = System.nanoTime();
        sink += lookups(table, whole, n);
        double wholeNs = (System.nanoTime() - t2) / (double) n;
        double[] times = mid;
        sink += expBaseline(times, n);
        long t1 = System.nanoTime();
        sink += expBaseline(times, n);
        double expNs = (System.nanoTime() - t1) / (double) n;

        results.put("expansion_lookup_ns", round(lookupNs));
        results.put("expansion_lookup_scattered_ns", round(randomNs));
        results.put("expansion_lookup_whole_history_ns", round(wholeNs));
        results.put("expansion_math_exp_baseline_ns", round(expNs));
        results.put("expansion_lookup_target_ns", LOOKUP_TARGET_NS);
        results.put("expansion_table_build_ms", round(buildMs));
        results.put("expansion_table_build_target_ms", BUILD_TARGET_MS);
        results.put("expansion_table_build_lambda_1000gyr_ms", round(lambdaMs));
        results.put("expansion_table_intervals", table.intervals());
        results.put("expansion_table_kib", table.tableBytes() / 1024);
        results.put("expansion_sink", String.format(Locale.ROOT, "%.6g", sink));
    }

    /** Times spread evenly over [lo, hi] in a scrambled order (golden-ratio steps). */
    private static double[] times(double lo, double hi) {
        double[] t = new double[4096];
        for (int i = 0; i < t.length; i++) {
            t[i] = lo + (hi - lo) * ((i * 0.6180339887498949) % 1.0);
        }
        return t;
    }

    /** 16 bodies per time, times advancing evenly from lo to hi: a(t) and k(t) for each. */
    private static double run(ExpansionTable t, double lo, double hi, int n) {
        double s = 0;
        double step = (hi - lo) / (n >> 4);
        for (int i = 0; i < n; i++) {
            double tt = lo + step * (i >> 4);
            s += t.scaleFactor(tt) + t.darkEnergyAcceleration(tt);
        }
        return s;
    }

    /** One a(t) and one k(t) per step, as a kick does. */
    private static double lookups(ExpansionTable t, double[] times, int n) {
        double s = 0;
        int mask = times.length - 1;
        for (int i = 0; i < n; i++) {
            double tt = times[i & mask];
            s += t.scaleFactor(tt) + t.darkEnergyAcceleration(tt);
        }
        return s;
    }

    /** One Math.exp per step: the machine's yardstick (a(t) needs one exp too). */
    private static double expBaseline(double[] times, int n) {
        double s = 0;
        int mask = times.length - 1;
        for (int i = 0; i < n; i++) {
            s += Math.exp(times[i & mask] * 0.01);
        }
        return s;
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
