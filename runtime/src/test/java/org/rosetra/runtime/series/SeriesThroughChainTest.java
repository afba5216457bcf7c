package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.runtime.chain.ChainBuffers;
import org.rosetra.runtime.chain.ReductionChain;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * How a script's series will run, end to end on a small invented rig file: a zero window
 * read by {@code stream} (mean of corrected readings), then a {@code fold} through the
 * reduction chain with that zero, on one and two threads. Checked against the handbook
 * closed forms worked in the test: rectangular rosette eps_x = e_a, eps_y = e_c,
 * gamma_xy = 2 e_b - e_a - e_c; plane stress Hooke's law; principal stresses
 * (sx + sy) / 2 +- sqrt(((sx - sy) / 2)^2 + txy^2); von Mises sqrt(s1^2 - s1 s2 + s2^2).
 */
class SeriesThroughChainTest {

    @TempDir
    Path dir;

    private static final double E = 200e9;
    private static final double NU = 0.3;
    private static final double ZERO_FROM = 0.0;
    private static final double ZERO_TO = 0.004;

    @Test
    void zeroWindowThenPeakVonMisesWithItsTime() throws IOException {
        Random random = new Random(4);
        int rows = 3000;
        double[][] arms = new double[3][rows];
        double[] t = new double[rows];
        StringBuilder csv = new StringBuilder("t_s,g1,g2,g3\n");
        for (int i = 0; i < rows; i++) {
            t[i] = i / 1000.0;
            double load = Math.min(1.0, i / 2000.0);
            arms[0][i] = Math.round((12 + 420 * load + random.nextGaussian() * 3) * 100) / 100.0;
            arms[1][i] = Math.round((-7 + 260 * load + random.nextGaussian() * 3) * 100) / 100.0;
            arms[2][i] = Math.round((4 - 126 * load + random.nextGaussian() * 3) * 100) / 100.0;
            csv.append(String.format(Locale.ROOT, "%.3f,%.2f,%.2f,%.2f%n", t[i], arms[0][i], arms[1][i], arms[2][i]));
        }
        Path file = dir.resolve("hoist-rig.csv");
        Files.writeString(file, csv);
        SeriesSource source = new SeriesSource(file, "hoist-rig.csv", ',', '.', "t_s", List.of("g1", "g2", "g3"));

        // Worked here: the zero is each arm's mean over the window, then the closed forms per sample.
        double[] zero = new double[3];
        int inWindow = 0;
        for (int i = 0; i < rows && t[i] <= ZERO_TO; i++) {
            for (int k = 0; k < 3; k++) {
                zero[k] += arms[k][i] * 1e-6;
            }
            inWindow++;
        }
        double expectedPeak = -1;
        double expectedAt = Double.NaN;
        double k = E / (1 - NU * NU);
        double g = E / (2 * (1 + NU));
        for (int i = 0; i < rows; i++) {
            double ea = arms[0][i] * 1e-6 - zero[0] / inWindow;
            double eb = arms[1][i] * 1e-6 - zero[1] / inWindow;
            double ec = arms[2][i] * 1e-6 - zero[2] / inWindow;
            double sx = k * (ea + NU * ec);
            double sy = k * (ec + NU * ea);
            double txy = g * (2 * eb - ea - ec);
            double r = Math.sqrt((sx - sy) * (sx - sy) / 4 + txy * txy);
            double s1 = (sx + sy) / 2 + r;
            double s2 = (sx + sy) / 2 - r;
            double vm = Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
            if (vm > expectedPeak) {
                expectedPeak = vm;
                expectedAt = t[i];
            }
        }

        Gauge gauge = Gauge.withFactor(2.0).withTransverse(0.0);
        Material steel = Material.of("invented rig steel", E, NU, null, null, null, null, null);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.NONE, 0.0, 2.0, RosetteLayout.rectangular(), 0.0,
                steel, PlaneCondition.PLANE_STRESS);
        ReadOptions small = ReadOptions.defaults().withChunkRows(256).withMinBytesPerPart(1).withBufferBytes(4096);

        // Pass 1: the zero window, stopping at the first chunk that runs past its end.
        WindowMean[] means = {new WindowMean(ZERO_FROM, ZERO_TO), new WindowMean(ZERO_FROM, ZERO_TO),
            new WindowMean(ZERO_FROM, ZERO_TO)};
        ChainBuffers zeroBuffers = chain.buffers(small.chunkRows(), EnumSet.noneOf(RosetteMember.class), false);
        double[][] strain = new double[3][small.chunkRows()];
        SeriesReader.stream(source, small, chunk -> {
            toStrain(chunk, strain);
            chain.correctOnly(strain, null, chunk.rows(), zeroBuffers);
            for (int a = 0; a < 3; a++) {
                means[a].add(zeroBuffers.corrected(a), chunk.time(), chunk.rows());
            }
            return chunk.time()[chunk.rows() - 1] <= ZERO_TO;
        });
        assertEquals(inWindow, means[0].count());
        ReductionChain zeroed = chain.withZero(means[0].mean(), means[1].mean(), means[2].mean());

        // Pass 2: the whole file, one accumulator (with its own work columns) per part.
        for (int threads = 1; threads <= 2; threads++) {
            FoldResult<Part> result = SeriesReader.fold(source, small.withThreads(threads), new SeriesFold<>() {
                @Override
                public Part start() {
                    return new Part(zeroed, small.chunkRows());
                }

                @Override
                public void add(Part p, Chunk chunk) {
                    toStrain(chunk, p.strain);
                    zeroed.run(p.strain, null, chunk.rows(), p.buffers);
                    p.vonMises.add(p.buffers.member(RosetteMember.VON_MISES), chunk.time(), chunk.rows());
                }

                @Override
                public Part merge(Part earlier, Part later) {
                    earlier.vonMises.merge(later.vonMises);
                    return earlier;
                }
            });
            assertEquals(threads, result.parts());
            assertEquals(rows, result.value().vonMises.count());
            assertEquals(expectedPeak, result.value().vonMises.max(), expectedPeak * 1e-12, threads + " threads");
            assertEquals(expectedAt, result.value().vonMises.timeOfMax(), 0.0, threads + " threads");
        }
    }

    private static void toStrain(Chunk chunk, double[][] strain) {
        for (int a = 0; a < 3; a++) {
            double[] in = chunk.values(a);
            for (int i = 0; i < chunk.rows(); i++) {
                strain[a][i] = in[i] * 1e-6; // microstrain in the file, a plain fraction in the runtime
            }
        }
    }

    /** One part's work columns and its peak. */
    static final class Part {
        final ChainBuffers buffers;
        final double[][] strain;
        final Extremes vonMises = new Extremes();

        Part(ReductionChain chain, int rows) {
            buffers = chain.buffers(rows, EnumSet.of(RosetteMember.VON_MISES), false);
            strain = new double[3][rows];
        }
    }
}
