package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Values read from small CSV files, checked against {@link ReferenceCsv}: an RFC 4180 reader
 * written independently in the test, with {@link Double#parseDouble} for every value.
 */
class SeriesReaderValuesTest {

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, text.getBytes(StandardCharsets.UTF_8));
        return file;
    }

    private static String randomSeries(Random random, int rows, char delimiter, char decimalMark, String newline) {
        StringBuilder s = new StringBuilder("t_s" + delimiter + "g1" + delimiter + "note" + delimiter + "g2" + newline);
        double t = 0;
        for (int i = 0; i < rows; i++) {
            t += 0.001 + random.nextInt(3) * 0.001;
            String g1 = switch (i % 7) {
                case 0 -> String.format(Locale.ROOT, "%.2f", random.nextGaussian() * 500);
                case 1 -> String.format(Locale.ROOT, "%.6e", random.nextGaussian() * 1e-3);
                case 2 -> Long.toString(random.nextInt(100_000) - 50_000);
                case 3 -> String.format(Locale.ROOT, "%.17f", random.nextDouble());
                case 4 -> "-0.00";
                case 5 -> "+" + String.format(Locale.ROOT, "%.3f", random.nextDouble() * 10);
                default -> Double.toString(random.nextGaussian() * 1e5);
            };
            String g2 = String.format(Locale.ROOT, "%.2f", random.nextGaussian() * 100);
            String time = String.format(Locale.ROOT, "%.3f", t);
            if (decimalMark == ',') {
                g1 = g1.replace('.', ',');
                g2 = g2.replace('.', ',');
                time = time.replace('.', ',');
            }
            s.append(time).append(delimiter).append(g1).append(delimiter).append("run ").append(i % 5)
                    .append(delimiter).append(g2).append(newline);
        }
        return s.toString();
    }

    private void assertSameAsReference(String text, char delimiter, char decimalMark, ReadOptions options)
            throws IOException {
        Path file = write("series.csv", text);
        SeriesSource source = new SeriesSource(file, "series.csv", delimiter, decimalMark, "t_s", List.of("g2", "g1"));
        Collected read = Collected.read(source, options);
        double[][] expected = ReferenceCsv.columns(text, delimiter, decimalMark, List.of("t_s", "g2", "g1"));
        assertEquals(expected[0].length, read.rows);
        for (int c = 0; c < expected.length; c++) {
            assertArrayEquals(expected[c], read.columns[c], 0.0, "column " + c + " (reference: Double.parseDouble)");
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 7, 64, 65_536})
    void commaAndPointMatchDoubleParseDoubleBitForBit(int chunkRows) throws IOException {
        String text = randomSeries(new Random(11), 3000, ',', '.', "\n");
        assertSameAsReference(text, ',', '.', ReadOptions.defaults().withChunkRows(chunkRows).withBufferBytes(97));
    }

    /**
     * Every column read, so most rows take the reader's tight pass for plain decimals; the
     * rows it must leave to the general parser (exponents, more digits than a double holds
     * exactly, a '+' sign, -0, rows cut by a read) are mixed in. Reference: Double.parseDouble.
     */
    @ParameterizedTest
    @ValueSource(ints = {16, 61, 97, 4096, 1 << 16})
    void everyColumnReadMatchesDoubleParseDoubleBitForBit(int bufferBytes) throws IOException {
        for (String newline : List.of("\n", "\r\n")) {
            String text = randomSeries(new Random(21), 3000, ',', '.', newline)
                    .replaceAll(",run [0-9]", "").replace("t_s,g1,note,g2", "t_s,g1,g2");
            Path file = write("all.csv", text);
            SeriesSource source = new SeriesSource(file, "all.csv", ',', '.', "t_s", List.of("g2", "g1"));
            Collected read = Collected.read(source, ReadOptions.defaults().withBufferBytes(bufferBytes));
            double[][] expected = ReferenceCsv.columns(text, ',', '.', List.of("t_s", "g2", "g1"));
            assertEquals(expected[0].length, read.rows);
            for (int c = 0; c < expected.length; c++) {
                assertArrayEquals(expected[c], read.columns[c], 0.0, "column " + c + " (reference: Double.parseDouble)");
            }
        }
    }

    @Test
    void semicolonWithDecimalComma() throws IOException {
        String text = randomSeries(new Random(12), 2000, ';', ',', "\n");
        assertSameAsReference(text, ';', ',', ReadOptions.defaults().withBufferBytes(128));
    }

    @Test
    void tabDelimiter() throws IOException {
        String text = randomSeries(new Random(13), 2000, '\t', '.', "\n");
        assertSameAsReference(text, '\t', '.', ReadOptions.defaults());
    }

    @Test
    void crlfLineEnds() throws IOException {
        String text = randomSeries(new Random(14), 2000, ',', '.', "\r\n");
        assertSameAsReference(text, ',', '.', ReadOptions.defaults().withBufferBytes(61));
    }

    @Test
    void byteOrderMarkAndNoNewlineAtTheEnd() throws IOException {
        String text = "\uFEFF" + randomSeries(new Random(15), 500, ',', '.', "\n").stripTrailing();
        assertSameAsReference(text, ',', '.', ReadOptions.defaults());
        assertSameAsReference(text.replace("\n", "\r\n"), ',', '.', ReadOptions.defaults().withBufferBytes(50));
    }

    @Test
    void quotedNamesAndFields() throws IOException {
        // RFC 4180 sections 2.5 to 2.7: quoted fields may hold delimiters, line breaks and "" for a quote.
        String text = "\"t_s\",\"g1\",\"note, with \"\"quotes\"\"\",g2\n"
                + "0.001,\"1.5\",\"a, b\",2\n"
                + "0.002,-3,\"two\nlines\",\"4.25\"\n"
                + "0.003,\"7\",\"\",8\n";
        assertSameAsReference(text, ',', '.', ReadOptions.defaults().withBufferBytes(16));
        Path file = write("q.csv", text);
        SeriesHeader header = SeriesReader.header(SeriesSource.commaSeparated(file, "t_s"));
        assertEquals(List.of("t_s", "g1", "note, with \"quotes\"", "g2"), header.names());
    }

    @Test
    void blankLinesAreSkippedButCounted() throws IOException {
        String text = "t_s,g1,note,g2\n\n0.1,1,x,2\n\r\n0.2,3,y,4\n\n";
        Path file = write("b.csv", text);
        SeriesSource source = new SeriesSource(file, "b.csv", ',', '.', "t_s", List.of("g2", "g1"));
        Collected read = Collected.read(source, ReadOptions.defaults().withChunkRows(1));
        assertArrayEquals(new double[] {2, 4}, read.columns[1]);
        // Lines counted by hand: the header is line 1, the rows are on lines 3 and 5.
        assertArrayEquals(new long[] {3, 5}, read.chunkFirstLines);
    }

    @Test
    void spacesAroundNumbersAndNamesAreAllowed() throws IOException {
        String text = "t_s , g1 ,note, g2\n 0.5 , 12.5 ,x, -3 \n";
        assertSameAsReference(text, ',', '.', ReadOptions.defaults());
    }

    @Test
    void parallelFoldReadsTheSameValuesAsOnePass() throws IOException {
        String text = randomSeries(new Random(16), 20_000, ',', '.', "\n");
        Path file = write("p.csv", text);
        SeriesSource source = new SeriesSource(file, "p.csv", ',', '.', "t_s", List.of("g2", "g1"));
        double[][] expected = ReferenceCsv.columns(text, ',', '.', List.of("t_s", "g2", "g1"));
        for (int threads = 1; threads <= 4; threads++) {
            ReadOptions options = ReadOptions.defaults().withThreads(threads).withMinBytesPerPart(1)
                    .withBufferBytes(1000).withChunkRows(333);
            FoldResult<double[]> sums = SeriesReader.fold(source, options, new ColumnChecksum());
            assertEquals(threads, sums.parts());
            assertEquals(expected[0].length, sums.samples());
            // Sums computed here from the reference values, in the same per-row order.
            assertEquals(ColumnChecksum.of(expected), sums.value()[0], 0.0, threads + " threads");
        }
    }

    /** A fold that checks every row: an order-free exact checksum of all values' bits. */
    static class ColumnChecksum implements SeriesFold<double[]> {
        @Override
        public double[] start() {
            return new double[1];
        }

        @Override
        public void add(double[] acc, Chunk chunk) {
            for (int c = 0; c < chunk.columns().length; c++) {
                for (int i = 0; i < chunk.rows(); i++) {
                    acc[0] += (Double.doubleToLongBits(chunk.columns()[c][i]) * (c + 1L)) & 0xFFFF;
                }
            }
        }

        @Override
        public double[] merge(double[] earlier, double[] later) {
            earlier[0] += later[0];
            return earlier;
        }

        static double of(double[][] columns) {
            double sum = 0;
            for (int c = 0; c < columns.length; c++) {
                for (double v : columns[c]) {
                    sum += (Double.doubleToLongBits(v) * (c + 1L)) & 0xFFFF;
                }
            }
            return sum;
        }
    }
}
