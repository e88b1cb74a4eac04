package org.holdfast.expansion;

import java.util.Locale;
import java.util.Map;

import org.holdfast.bench.BenchSuite;

/**
 * Cost of the expansion table: one a(t) plus dark-energy lookup, as the dynamics does at every
 * kick, and building the table. Warm-up first; every result feeds a sink that is reported, so
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
        Cosmology lambda = new Cosmology(70, 0.3, 0, 0, new CosmologicalConstant());
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
        double[] times = new double[4096];
        double lo = -10;
        double hi = Math.min(20, table.latestGyr());
        for (int i = 0; i < times.length; i++) {
            times[i] = lo + (hi - lo) * ((i * 0.6180339887498949) % 1.0);
        }
        sink += lookups(table, times, n);
        long t0 = System.nanoTime();
        sink += lookups(table, times, n);
        double lookupNs = (System.nanoTime() - t0) / (double) n;

        sink += expBaseline(times, n);
        long t1 = System.nanoTime();
        sink += expBaseline(times, n);
        double expNs = (System.nanoTime() - t1) / (double) n;

        results.put("expansion_lookup_ns", round(lookupNs));
        results.put("expansion_math_exp_baseline_ns", round(expNs));
        results.put("expansion_lookup_target_ns", LOOKUP_TARGET_NS);
        results.put("expansion_table_build_ms", round(buildMs));
        results.put("expansion_table_build_target_ms", BUILD_TARGET_MS);
        results.put("expansion_table_build_lambda_1000gyr_ms", round(lambdaMs));
        results.put("expansion_table_intervals", table.intervals());
        results.put("expansion_table_kib", table.tableBytes() / 1024);
        results.put("expansion_sink", String.format(Locale.ROOT, "%.6g", sink));
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
