package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A fold on 1 to 4 threads gives exactly what one pass gives: extremes with their times
 * (ties included), window means and plausibility flags, checked against a plain scan of the
 * values the test itself wrote.
 */
class ParallelFoldTest {

    @TempDir
    Path dir;

    /** Everything a series run keeps, for two columns. */
    static final class Summary {
        final Extremes[] extremes = {new Extremes(), new Extremes()};
        final WindowMean[] zero = {new WindowMean(0.5, 2.0), new WindowMean(0.5, 2.0)};
        final PlausibilityFlag[] flags = {new PlausibilityFlag(400), new PlausibilityFlag(400)};

        String describe() {
            StringBuilder s = new StringBuilder();
            for (int c = 0; c < 2; c++) {
                s.append(extremes[c]).append(" zero ").append(zero[c].mean()).append(" n ").append(zero[c].count())
                        .append(" flag ").append(flags[c].count()).append(' ').append(flags[c].firstTime()).append(' ')
                        .append(flags[c].lastTime()).append(' ').append(flags[c].worst()).append(' ')
                        .append(flags[c].timeOfWorst()).append('\n');
            }
            return s.toString();
        }
    }

    static final class SummaryFold implements SeriesFold<Summary> {
        @Override
        public Summary start() {
            return new Summary();
        }

        @Override
        public void add(Summary s, Chunk chunk) {
            for (int c = 0; c < 2; c++) {
                s.extremes[c].add(chunk.values(c), chunk.time(), chunk.rows());
                s.zero[c].add(chunk.values(c), chunk.time(), chunk.rows());
                s.flags[c].add(chunk.values(c), chunk.time(), chunk.rows());
            }
        }

        @Override
        public Summary merge(Summary earlier, Summary later) {
            for (int c = 0; c < 2; c++) {
                earlier.extremes[c].merge(later.extremes[c]);
                earlier.zero[c].merge(later.zero[c]);
                earlier.flags[c].merge(later.flags[c]);
            }
            return earlier;
        }
    }

    @Test
    void sameResultWithAnyThreadsBufferAndChunkSize() throws IOException {
        Random random = new Random(21);
        int rows = 30_000;
        StringBuilder s = new StringBuilder("t_s,g1,g2\n");
        double[][] v = new double[2][rows];
        double[] t = new double[rows];
        for (int i = 0; i < rows; i++) {
            t[i] = i / 1000.0;
            v[0][i] = random.nextInt(1000) - 500;           // whole numbers: many ties of max and min
            v[1][i] = Math.round(random.nextGaussian() * 1e4) / 100.0;
            s.append(String.format(Locale.ROOT, "%.3f,%.0f,%.2f%n", t[i], v[0][i], v[1][i]));
        }
        Path file = dir.resolve("rig.csv");
        Files.writeString(file, s);
        SeriesSource source = new SeriesSource(file, "rig.csv", ',', '.', "t_s", List.of("g1", "g2"));

        // Reference: a plain scan written here (first index of the extreme value = earliest time).
        double max = Double.NEGATIVE_INFINITY;
        int at = -1;
        for (int i = 0; i < rows; i++) {
            if (v[0][i] > max) {
                max = v[0][i];
                at = i;
            }
        }

        String once = null;
        for (int threads = 1; threads <= 4; threads++) {
            for (int buffer : new int[] {64, 1000, 1 << 20}) {
                for (int chunk : new int[] {1, 777, 65_536}) {
                    ReadOptions options = ReadOptions.defaults().withThreads(threads).withMinBytesPerPart(1)
                            .withBufferBytes(buffer).withChunkRows(chunk);
                    FoldResult<Summary> result = SeriesReader.fold(source, options, new SummaryFold());
                    assertEquals(threads, result.parts());
                    assertEquals(rows, result.samples());
                    String described = result.value().describe();
                    if (once == null) {
                        once = described;
                        assertEquals(max, result.value().extremes[0].max());
                        assertEquals(t[at], result.value().extremes[0].timeOfMax());
                        assertEquals(rows, result.value().extremes[0].count());
                    }
                    assertEquals(once, described, threads + " threads, buffer " + buffer + ", chunk " + chunk);
                }
            }
        }
    }

    @Test
    void aFileWithQuotesIsReadInOnePassWithTheSameResult() throws IOException {
        StringBuilder s = new StringBuilder("t_s,\"g1\",g2,note\n");
        for (int i = 0; i < 5000; i++) {
            s.append(i).append(',').append(i % 97).append(",\"").append(i % 13).append("\",")
                    .append(i % 50 == 0 ? "\"a\nb\"" : "x").append('\n');
        }
        Path file = dir.resolve("quoted.csv");
        Files.writeString(file, s);
        SeriesSource source = new SeriesSource(file, "quoted.csv", ',', '.', "t_s", List.of("g1", "g2"));
        ReadOptions options = ReadOptions.defaults().withThreads(2).withMinBytesPerPart(1).withBufferBytes(256);
        FoldResult<Summary> result = SeriesReader.fold(source, options, new SummaryFold());
        assertEquals(1, result.parts());
        assertEquals(5000, result.samples());
        // By hand: g1 = i mod 97 peaks first at i = 96; g2 = i mod 13 peaks first at i = 12.
        assertEquals(96, result.value().extremes[0].max());
        assertEquals(96, result.value().extremes[0].timeOfMax());
        assertEquals(12, result.value().extremes[1].timeOfMax());
    }
}
