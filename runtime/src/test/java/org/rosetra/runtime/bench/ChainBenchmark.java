package org.rosetra.runtime.bench;

import java.lang.management.ManagementFactory;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import org.rosetra.runtime.chain.ChainBuffers;
import org.rosetra.runtime.chain.ReductionChain;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * Times the whole in-memory chain for one rectangular rosette: quarter three-wire bridge with
 * lead wires, thermal output from a temperature column, zero, solve, Hooke, principal
 * stresses and von Mises. Single thread, after warm-up; prints the median of several runs.
 * Not a unit test (run it with bench/chain).
 *
 * <p>Arguments (all optional): samples per run (20000000), chunk (65536), runs (7), warm-up runs (3).
 */
public final class ChainBenchmark {

    private static final double UE = 1e-6;
    /** Distinct chunks of invented readings, cycled; enough to leave the caches honest. */
    private static final int DISTINCT_CHUNKS = 8;

    private ChainBenchmark() {
    }

    public static void main(String[] args) {
        long samples = args.length > 0 ? Long.parseLong(args[0]) : 20_000_000L;
        int chunk = args.length > 1 ? Integer.parseInt(args[1]) : 65_536;
        int runs = args.length > 2 ? Integer.parseInt(args[2]) : 7;
        int warmups = args.length > 3 ? Integer.parseInt(args[3]) : 3;

        Gauge gauge = Gauge.withFactor(2.09).withTransverse(0.006).withResistance(350)
                .withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        Material steel = Material.of("bench steel", 205e9, 0.29, null, 355e6, null, null, null);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00,
                RosetteLayout.rectangular(), Math.toRadians(15), steel, PlaneCondition.PLANE_STRESS)
                .withZero(3 * UE, -2 * UE, 5 * UE);

        double[][][] arms = new double[DISTINCT_CHUNKS][3][chunk];
        double[][] temperature = new double[DISTINCT_CHUNKS][chunk];
        for (int c = 0; c < DISTINCT_CHUNKS; c++) {
            for (int i = 0; i < chunk; i++) {
                double t = (c * (double) chunk + i) * 1e-4;
                arms[c][0][i] = (412 * Math.sin(t) + 30) * UE;
                arms[c][1][i] = (-38 * Math.sin(t + 0.4) + 120 * Math.cos(3 * t)) * UE;
                arms[c][2][i] = (-121 * Math.cos(t) + 15) * UE;
                temperature[c][i] = 21 + 4 * Math.sin(0.01 * t);
            }
        }

        System.out.printf(Locale.ROOT, "ChainBenchmark: rectangular rosette, quarter 3-wire bridge + lead,"
                + " thermal output with a temperature column, zero, solve, Hooke, principal, von Mises%n");
        System.out.printf(Locale.ROOT, "%,d samples per run in chunks of %,d, %d warm-up runs, %d timed runs,"
                + " single thread; %d cores visible (figures on a shared machine are preliminary)%n",
                samples, chunk, warmups, runs, Runtime.getRuntime().availableProcessors());

        report("von_mises only", chain, EnumSet.of(RosetteMember.VON_MISES), arms, temperature, samples, chunk,
                runs, warmups);
        report("all 18 members", chain, EnumSet.allOf(RosetteMember.class), arms, temperature, samples, chunk,
                runs, warmups);
    }

    private static void report(String label, ReductionChain chain, Set<RosetteMember> members, double[][][] arms,
                               double[][] temperature, long samples, int chunk, int runs, int warmups) {
        ChainBuffers buffers = chain.buffers(chunk, members, false);
        double sink = 0;
        for (int w = 0; w < warmups; w++) {
            sink += runOnce(chain, buffers, arms, temperature, samples, chunk);
        }
        double[] rates = new double[runs];
        long allocatedBefore = allocatedBytes();
        for (int r = 0; r < runs; r++) {
            long start = System.nanoTime();
            sink += runOnce(chain, buffers, arms, temperature, samples, chunk);
            long elapsed = System.nanoTime() - start;
            rates[r] = samples / (elapsed * 1e-9);
        }
        long allocated = allocatedBytes() - allocatedBefore;
        long chunks = runs * ((samples + chunk - 1) / chunk);
        double[] sorted = rates.clone();
        Arrays.sort(sorted);
        double median = sorted[runs / 2];
        System.out.printf(Locale.ROOT, "%-16s median %8.2f M samples/s per core  (min %.2f, max %.2f;"
                + " %.1f ns/sample; %s bytes allocated per chunk)  [check %.6e]%n", label, median / 1e6,
                sorted[0] / 1e6, sorted[runs - 1] / 1e6, 1e9 / median,
                allocated < 0 ? "?" : String.format(Locale.ROOT, "%.0f", allocated / (double) chunks), sink);
    }

    /** Bytes this thread has allocated so far, or -1 where the JVM cannot say. */
    private static long allocatedBytes() {
        if (ManagementFactory.getThreadMXBean() instanceof com.sun.management.ThreadMXBean bean) {
            return bean.getThreadAllocatedBytes(Thread.currentThread().getId());
        }
        return -1;
    }

    /** One pass over {@code samples}; returns a checksum so the work cannot be optimized away. */
    private static double runOnce(ReductionChain chain, ChainBuffers buffers, double[][][] arms,
                                  double[][] temperature, long samples, int chunk) {
        double sum = 0;
        long done = 0;
        int c = 0;
        while (done < samples) {
            int n = (int) Math.min(chunk, samples - done);
            chain.run(arms[c], temperature[c], n, buffers);
            double[] vm = buffers.has(RosetteMember.VON_MISES) ? buffers.member(RosetteMember.VON_MISES)
                    : buffers.epsX();
            sum += vm[n - 1];
            done += n;
            c = (c + 1) % DISTINCT_CHUNKS;
        }
        return sum;
    }
}
