package org.holdfast.run;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.bench.BenchSuite;
import org.holdfast.expansion.ExpansionHistory;
import org.holdfast.forces.PairGravity;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.units.Units;
import org.holdfast.integrators.Scheme;

/**
 * Benchmarks of the dynamics: the direct-sum pair loop against the same loop in C (when gcc is
 * on the PATH), tracer updates on all cores and on one, and the peak heap of a run with 10^6
 * tracers.
 */
public final class DynamicsBench implements BenchSuite {

    private static final int N_PAIRS = 1024;
    private static final int N_TRACERS = 1_000_000;
    private static final int N_GALAXIES = 16;

    @Override
    public String name() {
        return "dynamics";
    }

    @Override
    public void run(boolean quick, Map<String, Object> results) {
        double seconds = quick ? 0.3 : 2;
        double java = pairInteractionsPerSecond(seconds);
        results.put("pair_interactions_per_s", sci(java));
        Double c = cPairInteractionsPerSecond(seconds);
        if (c == null) {
            results.put("c_pair_interactions_per_s", "gcc not found");
        } else {
            results.put("c_pair_interactions_per_s", sci(c));
            double ratio = c / java;
            results.put("pair_c_over_java", String.format(Locale.ROOT, "%.2f (target <= 1.5)%s", ratio,
                    ratio <= 1.5 ? "" : " MISSED"));
        }
        int steps = quick ? 2 : 16;
        // warm the JIT first, then alternate, keeping the best of each (other load only slows a run down)
        tracerUpdatesPerSecond(1, 2, null, null);
        double all = tracerUpdatesPerSecond(0, steps, results, "peak_heap_mb_1e6_tracers");
        double one = tracerUpdatesPerSecond(1, steps, null, null);
        for (int rep = 0; rep < (quick ? 0 : 2); rep++) {
            all = Math.max(all, tracerUpdatesPerSecond(0, steps, null, null));
            one = Math.max(one, tracerUpdatesPerSecond(1, steps, null, null));
        }
        int cores = Runtime.getRuntime().availableProcessors();
        results.put("tracer_updates_per_s", sci(all) + " (" + cores + " cores)");
        results.put("tracer_updates_per_s_1thread", sci(one));
        double speedup = all / one;
        results.put("tracer_speedup", String.format(Locale.ROOT, "%.2f (target >= 1.8 on 2 cores)%s", speedup,
                cores >= 2 && speedup < 1.8 ? " MISSED" : ""));
    }

    private static String sci(double v) {
        return String.format(Locale.ROOT, "%.3e", v);
    }

    /** Softened point masses in a box, the same set for the Java and C loops. */
    private static double[][] pairSet() {
        UniformRandomProvider rng = RandomSource.XO_SHI_RO_256_PP.create(1234L);
        double[][] s = new double[5][N_PAIRS];
        for (int i = 0; i < N_PAIRS; i++) {
            s[0][i] = 1000 * rng.nextDouble();
            s[1][i] = 1000 * rng.nextDouble();
            s[2][i] = 1000 * rng.nextDouble();
            s[3][i] = 1e10;
            s[4][i] = 1.0;
        }
        return s;
    }

    static double pairInteractionsPerSecond(double seconds) {
        double[][] s = pairSet();
        double[] ax = new double[N_PAIRS];
        double[] ay = new double[N_PAIRS];
        double[] az = new double[N_PAIRS];
        long pairs = (long) N_PAIRS * (N_PAIRS - 1) / 2;
        for (int w = 0; w < 20; w++) {
            PairGravity.softenedDirectSum(N_PAIRS, s[0], s[1], s[2], s[3], s[4], ax, ay, az);
        }
        long calls = 0;
        long t0 = System.nanoTime();
        long t1;
        do {
            PairGravity.softenedDirectSum(N_PAIRS, s[0], s[1], s[2], s[3], s[4], ax, ay, az);
            calls++;
            t1 = System.nanoTime();
        } while (t1 - t0 < seconds * 1e9);
        if (!Double.isFinite(ax[0])) {
            throw new IllegalStateException("benchmark produced " + ax[0]);
        }
        return calls * pairs / ((t1 - t0) * 1e-9);
    }

    /** The same loop in C, compiled with gcc -O3 and timed by itself; null if gcc is not on the PATH. */
    static Double cPairInteractionsPerSecond(double seconds) {
        try {
            Path dir = Files.createTempDirectory("holdfast-bench");
            Path src = dir.resolve("pairs.c");
            Path exe = dir.resolve("pairs");
            Files.writeString(src, cSource(seconds), StandardCharsets.US_ASCII);
            Process cc = new ProcessBuilder("gcc", "-O3", "-o", exe.toString(), src.toString(), "-lm")
                    .redirectErrorStream(true).start();
            cc.getInputStream().readAllBytes();
            if (!cc.waitFor(60, TimeUnit.SECONDS) || cc.exitValue() != 0) {
                return null;
            }
            Process run = new ProcessBuilder(exe.toString()).redirectErrorStream(true).start();
            String out = new String(run.getInputStream().readAllBytes(), StandardCharsets.US_ASCII).trim();
            run.waitFor(60, TimeUnit.SECONDS);
            Files.deleteIfExists(exe);
            Files.deleteIfExists(src);
            Files.deleteIfExists(dir);
            return Double.parseDouble(out);
        } catch (IOException e) {
            return null;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return null;
        }
    }

    private static String cSource(double seconds) {
        double[][] s = pairSet();
        StringBuilder data = new StringBuilder();
        for (int k = 0; k < 3; k++) {
            data.append("static const double P").append(k).append("[N] = {");
            for (int i = 0; i < N_PAIRS; i++) {
                data.append(i == 0 ? "" : ",").append(Double.toString(s[k][i]));
            }
            data.append("};\n");
        }
        return "#include <stdio.h>\n#include <math.h>\n#include <time.h>\n#define N " + N_PAIRS + "\n" + data
                + "static double x[N],y[N],z[N],m[N],e2[N],ax[N],ay[N],az[N];\n"
                + "static void sum(int n){const double g=" + Units.G + ";\n"
                + " for(int i=0;i<n;i++){double xi=x[i],yi=y[i],zi=z[i],ei=e2[i],mi=m[i],axi=0,ayi=0,azi=0;\n"
                + "  for(int j=i+1;j<n;j++){double dx=x[j]-xi,dy=y[j]-yi,dz=z[j]-zi;\n"
                + "   double s2=dx*dx+dy*dy+dz*dz+ei+e2[j];double f=g/(s2*sqrt(s2));double fj=f*m[j],fi=f*mi;\n"
                + "   axi+=fj*dx;ayi+=fj*dy;azi+=fj*dz;ax[j]-=fi*dx;ay[j]-=fi*dy;az[j]-=fi*dz;}\n"
                + "  ax[i]+=axi;ay[i]+=ayi;az[i]+=azi;}}\n"
                + "static double now(){struct timespec t;clock_gettime(CLOCK_MONOTONIC,&t);return t.tv_sec+1e-9*t.tv_nsec;}\n"
                + "int main(void){for(int i=0;i<N;i++){x[i]=P0[i];y[i]=P1[i];z[i]=P2[i];m[i]=1e10;e2[i]=1.0;}\n"
                + " for(int w=0;w<20;w++)sum(N);long calls=0;double t0=now(),t1;\n"
                + " do{sum(N);calls++;t1=now();}while(t1-t0<" + seconds + ");\n"
                + " if(ax[0]!=ax[0])return 1;printf(\"%.6e\\n\",calls*(double)N*(N-1)/2/(t1-t0));return 0;}\n";
    }

    /** A group of 16 identical NFW members with 10^6 disk stars among them. */
    static GroupSpec tracerGroup() {
        List<GalaxySpec> gs = new ArrayList<>();
        UniformRandomProvider rng = RandomSource.XO_SHI_RO_256_PP.create(77L);
        for (int i = 0; i < N_GALAXIES; i++) {
            double[] pos = {1500 * rng.nextDouble(), 1500 * rng.nextDouble(), 1500 * rng.nextDouble()};
            gs.add(new GalaxySpec("Bench-" + i, 5e11, pos, new double[] {0, 0, 0},
                    new HaloSpec("nfw", Double.NaN, Double.NaN, 10, Double.NaN),
                    new StarsSpec(N_TRACERS / N_GALAXIES, "disk", 3, new double[] {0, 0, 1}, 10)));
        }
        return new GroupSpec(gs, null);
    }

    /**
     * Tracer updates (one full step of one tracer) per second over fixed leapfrog steps; optionally
     * records the peak heap of the run under heapKey.
     */
    static double tracerUpdatesPerSecond(int threads, int steps, Map<String, Object> results, String heapKey) {
        ExpansionHistory h = new IntegratorBench.ConstantDarkEnergy();
        RunSettings s = new RunSettings(0, steps * 1e-3, Scheme.LEAPFROG, Double.NaN, 1, Double.NaN,
                true, false, 5);
        if (heapKey != null) {
            System.gc();
            ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
        }
        try (Simulation sim = Simulation.create(tracerGroup(), s, h, threads)) {
            RunResult r = sim.run(List.of());
            if (heapKey != null) {
                long peak = 0;
                for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
                    if (p.getType() == MemoryType.HEAP) {
                        peak += p.getPeakUsage().getUsed();
                    }
                }
                results.put(heapKey, String.format(Locale.ROOT, "%.0f (target < 1024; max heap %d MB)",
                        peak / 1048576.0, Runtime.getRuntime().maxMemory() / 1048576));
            }
            return (double) sim.tracerCount() * r.steps() / r.wallSeconds();
        }
    }
}
