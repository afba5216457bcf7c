package org.rosetra.runtime.results;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Random;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * Prints the throughput of {@link ResultColumns#compute} (all 18 members, with a material)
 * in samples per second. Not a unit test: run it by hand, e.g.
 * {@code java -cp runtime/target/classes:runtime/target/test-classes:<commons-math3.jar>
 * org.rosetra.runtime.results.ResultColumnsBenchmark [samplesPerChunk] [rounds] [without-theta]}
 * (the last leaves out theta_p, to show what its atan2 costs).
 */
public final class ResultColumnsBenchmark {

    private ResultColumnsBenchmark() {
    }

    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 65_536;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 15;
        Random random = new Random(1L);
        double[] x = new double[n];
        double[] y = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 1e-3 * random.nextGaussian();
            y[i] = 1e-3 * random.nextGaussian();
            g[i] = 1e-3 * random.nextGaussian();
        }
        Material steel = Material.of("bench_steel", 200e9, 0.3, null, 355e6, null, null, null);
        EnumMap<RosetteMember, double[]> out = new EnumMap<>(RosetteMember.class);
        boolean withoutTheta = args.length > 2 && args[2].equals("without-theta");
        for (RosetteMember m : RosetteMember.values()) {
            if (!(withoutTheta && m == RosetteMember.THETA_P)) {
                out.put(m, new double[n]);
            }
        }
        long chunksPerRound = Math.max(1, 20_000_000L / n);
        double checksum = 0;
        for (int round = 0; round < rounds; round++) {
            PlaneCondition c = round % 2 == 0 ? PlaneCondition.PLANE_STRESS : PlaneCondition.PLANE_STRAIN;
            long start = System.nanoTime();
            for (long k = 0; k < chunksPerRound; k++) {
                ResultColumns.compute(x, y, g, n, steel, c, out);
                checksum += out.get(RosetteMember.VON_MISES)[(int) (k % n)];
            }
            double seconds = (System.nanoTime() - start) * 1e-9;
            double samples = (double) chunksPerRound * n;
            System.out.printf(Locale.ROOT, "round %2d  %-12s  %6.2f M samples/s  (%.1f ns/sample)%n",
                    round, c.scriptName(), samples / seconds / 1e6, seconds / samples * 1e9);
        }
        System.out.printf(Locale.ROOT, "checksum %.6e%n", checksum);
    }
}
