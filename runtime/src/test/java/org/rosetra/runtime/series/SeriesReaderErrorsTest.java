package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Bad data: every case gives {@code FILE:LINE: error: column "NAME": ...} with the line
 * counted by hand in the test (header = line 1), the same from one pass and from a fold on
 * 1, 2 or 3 threads.
 */
class SeriesReaderErrorsTest {

    @TempDir
    Path dir;

    private SeriesSource source(String text) throws IOException {
        Path file = dir.resolve("hoist-run.csv");
        Files.write(file, text.getBytes(StandardCharsets.UTF_8));
        return new SeriesSource(file, "data/hoist-run.csv", ',', '.', "t_s", List.of("g1", "g2", "g3"));
    }

    private static final SeriesFold<Extremes> COUNT_ONLY = new SeriesFold<>() {
        @Override
        public Extremes start() {
            return new Extremes();
        }

        @Override
        public void add(Extremes acc, Chunk chunk) {
            acc.add(chunk.values(0), chunk.time(), chunk.rows());
        }

        @Override
        public Extremes merge(Extremes earlier, Extremes later) {
            return earlier.merge(later);
        }
    };

    /** The error of a one-pass read, checked equal to that of folds on 1 to 3 threads. */
    private static SeriesDataException errorOf(SeriesSource source) {
        ReadOptions small = ReadOptions.defaults().withBufferBytes(32).withChunkRows(3).withMinBytesPerPart(1);
        SeriesDataException once = assertThrows(SeriesDataException.class,
                () -> SeriesReader.stream(source, small, chunk -> true));
        for (int threads = 1; threads <= 3; threads++) {
            ReadOptions options = small.withThreads(threads);
            SeriesDataException folded = assertThrows(SeriesDataException.class,
                    () -> SeriesReader.fold(source, options, COUNT_ONLY));
            assertEquals(once.getMessage(), folded.getMessage(), threads + " threads");
        }
        return once;
    }

    private static final String HEADER = "t_s,g1,g2,g3\n";

    @Test
    void notANumberNamesFileLineAndColumn() throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,abc,6\n0.003,7,8,9\n"));
        assertEquals("data/hoist-run.csv:3: error: column \"g2\": \"abc\" is not a number", e.getMessage());
        assertEquals(3, e.line());
        assertEquals("g2", e.column());
        assertEquals(e.getMessage(), e.toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "0x1p3", "1.5d", "1.2.3", "1e", "--1", "1,5", "."})
    void javaOnlyFormsAreNotNumbers(String text) throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,6\n0.003," + text.replace(",", ";") + ",8,9\n"));
        assertEquals(4, e.line());
        assertEquals("g1", e.column());
    }

    @Test
    void decimalCommaInAPointFileGetsAHint() throws IOException {
        Path file = dir.resolve("semi.csv");
        Files.writeString(file, "t_s;g1\n0.1;1,5\n");
        SeriesSource source = new SeriesSource(file, "semi.csv", ';', '.', "t_s", List.of("g1"));
        SeriesDataException e = assertThrows(SeriesDataException.class, () -> SeriesReader.stream(source, ReadOptions.defaults(), c -> true));
        assertEquals("semi.csv:2: error: column \"g1\": \"1,5\" is not a number (decimal mark is '.')", e.getMessage());
    }

    @Test
    void emptyFieldIsAMissingValue() throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,6\n0.003,7,8,9\n0.004,1,,3\n"));
        assertEquals("data/hoist-run.csv:5: error: column \"g2\": missing value", e.getMessage());
        SeriesDataException last = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,\n"));
        assertEquals("data/hoist-run.csv:3: error: column \"g3\": missing value", last.getMessage());
        SeriesDataException spaces = errorOf(source(HEADER + "0.001,1,  ,3\n"));
        assertEquals("data/hoist-run.csv:2: error: column \"g2\": missing value", spaces.getMessage());
    }

    @Test
    void timeThatDoesNotIncrease() throws IOException {
        SeriesDataException same = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,6\n0.002,7,8,9\n"));
        assertEquals("data/hoist-run.csv:4: error: column \"t_s\": time 0.002 does not increase"
                + " (the sample before is at 0.002)", same.getMessage());
        SeriesDataException back = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,6\n0.003,7,8,9\n0.0025,7,8,9\n"));
        assertEquals(5, back.line());
        assertEquals("t_s", back.column());
    }

    @Test
    void columnNotInTheHeaderListsTheColumnsAndSuggestsOne() throws IOException {
        Path file = dir.resolve("hoist-run.csv");
        Files.writeString(file, "t_s,g1,g2,g_3\n0.001,1,2,3\n");
        SeriesSource source = new SeriesSource(file, "data/hoist-run.csv", ',', '.', "t_s", List.of("g1", "g2", "g3"));
        SeriesDataException e = assertThrows(SeriesDataException.class, () -> SeriesReader.fold(source, ReadOptions.defaults(), COUNT_ONLY));
        assertEquals("data/hoist-run.csv:1: error: column \"g3\": not in the header (its columns: t_s, g1, g2, g_3);"
                + " did you mean \"g_3\"?", e.getMessage());
        SeriesSource far = new SeriesSource(file, "f.csv", ',', '.', "time", List.of("g1"));
        SeriesDataException noHint = assertThrows(SeriesDataException.class,
                () -> SeriesReader.stream(far, ReadOptions.defaults(), c -> true));
        assertEquals("f.csv:1: error: column \"time\": not in the header (its columns: t_s, g1, g2, g_3)", noHint.getMessage());
    }

    @Test
    void rowWithTooFewFieldsNamesTheFirstMissingColumn() throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5\n0.003,7,8,9\n"));
        assertEquals("data/hoist-run.csv:3: error: column \"g3\": missing: the row has 3 fields, the header has 4", e.getMessage());
        SeriesDataException crlf = errorOf(source((HEADER + "0.001,1,2,3\n0.002\n").replace("\n", "\r\n")));
        assertEquals("data/hoist-run.csv:3: error: column \"g1\": missing: the row has 1 field, the header has 4", crlf.getMessage());
    }

    @Test
    void rowWithTooManyFields() throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,4,5,6,7,8\n"));
        assertEquals("data/hoist-run.csv:3: error: the row has 6 fields, the header has 4 (t_s, g1, g2, g3)", e.getMessage());
        assertNull(e.column());
    }

    @Test
    void emptyFileHeaderOnlyAndBlankRowsOnly() throws IOException {
        assertEquals("data/hoist-run.csv:1: error: the file is empty", errorOf(source("")).getMessage());
        assertEquals("data/hoist-run.csv:2: error: no data rows after the header", errorOf(source(HEADER)).getMessage());
        assertEquals("data/hoist-run.csv:2: error: no data rows after the header", errorOf(source("t_s,g1,g2,g3")).getMessage());
        assertEquals("data/hoist-run.csv:2: error: no data rows after the header", errorOf(source(HEADER + "\n\n\r\n")).getMessage());
    }

    @Test
    void missingFile() {
        SeriesSource source = new SeriesSource(dir.resolve("absent.csv"), "data/absent.csv", ',', '.', "t_s", List.of());
        SeriesDataException e = assertThrows(SeriesDataException.class, () -> SeriesReader.stream(source, ReadOptions.defaults(), c -> true));
        assertEquals("data/absent.csv: error: no such file", e.getMessage());
    }

    @Test
    void quoteLeftOpen() throws IOException {
        SeriesDataException e = errorOf(source(HEADER + "0.001,1,2,3\n0.002,\"4,5,6\n0.003,7,8,9\n"));
        assertEquals("data/hoist-run.csv:3: error: a quote opened here is not closed before the end of the file", e.getMessage());
        SeriesDataException header = errorOf(source("t_s,\"g1,g2,g3\n0.001,1,2,3\n"));
        assertEquals("data/hoist-run.csv:1: error: a quote opened in the header is not closed", header.getMessage());
        SeriesDataException after = errorOf(source(HEADER + "0.001,\"1\"x,2,3\n"));
        assertEquals(2, after.line());
        assertEquals("g1", after.column());
    }

    @Test
    void linesStayExactAfterAQuotedLineBreak() throws IOException {
        // The quoted field takes lines 3 and 4, so the bad row after it is on line 5.
        String text = "t_s,g1,g2,g3,note\n0.001,1,2,3,a\n0.002,4,5,6,\"two\nlines\"\n0.003,7,x,9,b\n";
        Path file = dir.resolve("hoist-run.csv");
        Files.writeString(file, text);
        SeriesSource source = new SeriesSource(file, "data/hoist-run.csv", ',', '.', "t_s", List.of("g1", "g2", "g3"));
        assertEquals("data/hoist-run.csv:5: error: column \"g2\": \"x\" is not a number", errorOf(source).getMessage());
    }

    /** A bad value or a step back in time at every row in turn: so at and around every split. */
    @Test
    void everyPositionGivesItsOwnLineWithAnyNumberOfThreads() throws IOException {
        int rows = 120;
        for (int bad = 0; bad < rows; bad++) {
            for (int kind = 0; kind < 3; kind++) {
                StringBuilder s = new StringBuilder(HEADER);
                for (int i = 0; i < rows; i++) {
                    double t = (i + 1) * 0.001;
                    if (i == bad && kind == 1) {
                        t = bad * 0.001 - 0.0005; // before the previous sample (or 0-ish for the first, then fine)
                    }
                    s.append(String.format(Locale.ROOT, "%.4f", t)).append(',')
                            .append(i == bad && kind == 0 ? "1.2.3" : "1").append(',')
                            .append(i == bad && kind == 2 ? "" : "2").append(',').append("3\n");
                }
                SeriesSource source = source(s.toString());
                if (kind == 1 && bad == 0) {
                    continue; // a first sample has nothing to be before
                }
                SeriesDataException e = errorOf(source);
                assertEquals(bad + 2, e.line(), "row " + bad + ", kind " + kind + ": " + e.getMessage());
                assertEquals(kind == 0 ? "g1" : kind == 1 ? "t_s" : "g2", e.column());
            }
        }
    }

    @Test
    void aFileWithoutLineBreaksIsRefusedNotLoaded() throws IOException {
        String longHeader = "t_s," + "g".repeat(SeriesHeader.LONGEST + 10) + "\n0.1,1\n";
        assertEquals("data/hoist-run.csv:1: error: the header row is longer than 1 MiB: is this a CSV file with"
                + " one row per line?", errorOf(source(longHeader)).getMessage());
        String longRow = HEADER + "0.001,1,2,3\n0.002,1,2," + "3".repeat(PartParser.LONGEST_ROW + 10) + "\n";
        SeriesDataException e = assertThrows(SeriesDataException.class,
                () -> SeriesReader.stream(source(longRow), ReadOptions.defaults(), chunk -> true));
        assertEquals("data/hoist-run.csv:3: error: a row longer than 16 MiB: is this a CSV file with one row per line?",
                e.getMessage());
    }
}
