package org.rosetra.runtime.series.bench;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.rosetra.runtime.series.Chunk;
import org.rosetra.runtime.series.Extremes;
import org.rosetra.runtime.series.FoldResult;
import org.rosetra.runtime.series.ProgressBar;
import org.rosetra.runtime.series.ReadOptions;
import org.rosetra.runtime.series.SeriesFold;
import org.rosetra.runtime.series.SeriesReader;
import org.rosetra.runtime.series.SeriesSource;

/**
 * The series benchmark's Java side (run by bench/series, not a unit test): reads
 * {@code t_s,g1,g2,g3} with the series reader and reduces every sample as the peer does,
 * then prints the same line. Rectangular rosette (0/45/90 deg): eps_x = e_a, eps_y = e_c,
 * gamma_xy = 2 e_b - e_a - e_c; plane stress, E = 200 GPa, nu = 0.3; principal stresses;
 * von Mises; its maximum and when.
 *
 * <p>usage: SeriesBench FILE.csv [THREADS]
 */
public final class SeriesBench {

    private SeriesBench() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        int threads = args.length > 1 ? Integer.parseInt(args[1]) : 2;
        SeriesSource source = new SeriesSource(file, file.toString(), ',', '.', "t_s", List.of("g1", "g2", "g3"));
        ReadOptions options = ReadOptions.defaults().withThreads(threads);
        // A bar only for a person watching; under the benchmark runner there is no console.
        ProgressBar bar = System.console() != null ? new ProgressBar(System.err, "reading " + file.getFileName()) : null;
        if (bar != null) {
            options = options.withProgress(bar);
        }
        FoldResult<PeakVonMises> result = SeriesReader.fold(source, options, new PeakVonMisesFold(options.chunkRows()));
        if (bar != null) {
            bar.finish();
        }
        Extremes vm = result.value().extremes;
        System.out.printf(Locale.ROOT, "samples %d  max von Mises %.6f MPa at t = %.3f s%n",
                result.samples(), vm.max() / 1e6, vm.timeOfMax());
    }

    /** Per part: the extremes of von Mises and a reused column to compute it in. */
    static final class PeakVonMises {
        final Extremes extremes = new Extremes();
        final double[] vonMises;

        PeakVonMises(int rows) {
            vonMises = new double[rows];
        }
    }

    static final class PeakVonMisesFold implements SeriesFold<PeakVonMises> {
        private static final double E = 200e9;
        private static final double NU = 0.3;
        private static final double K = E / (1.0 - NU * NU);
        private static final double G = E / (2.0 * (1.0 + NU));
        private static final double MICRO = 1e-6;

        private final int rows;

        PeakVonMisesFold(int rows) {
            this.rows = rows;
        }

        @Override
        public PeakVonMises start() {
            return new PeakVonMises(rows);
        }

        @Override
        public void add(PeakVonMises acc, Chunk chunk) {
            double[] ga = chunk.values(0);
            double[] gb = chunk.values(1);
            double[] gc = chunk.values(2);
            double[] vm = acc.vonMises;
            int n = chunk.rows();
            for (int i = 0; i < n; i++) {
                // Same operations in the same order as the peer, so the results agree to the bit.
                double ea = ga[i] * MICRO;
                double eb = gb[i] * MICRO;
                double ec = gc[i] * MICRO;
                double ex = ea;
                double ey = ec;
                double gxy = 2.0 * eb - ea - ec;
                double sx = K * (ex + NU * ey);
                double sy = K * (ey + NU * ex);
                double txy = G * gxy;
                double centre = (sx + sy) / 2.0;
                double half = (sx - sy) / 2.0;
                double radius = Math.sqrt(half * half + txy * txy);
                double s1 = centre + radius;
                double s2 = centre - radius;
                vm[i] = Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
            }
            acc.extremes.add(vm, chunk.time(), n);
        }

        @Override
        public PeakVonMises merge(PeakVonMises earlier, PeakVonMises later) {
            earlier.extremes.merge(later.extremes);
            return earlier;
        }
    }
}
