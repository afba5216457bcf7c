package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Progress reported in bytes, the bar's throttling, and cancelling a read part way. */
class ProgressAndCancelTest {

    @TempDir
    Path dir;

    private SeriesSource bigSource() throws IOException {
        StringBuilder s = new StringBuilder("t_s,g1\n");
        for (int i = 1; i <= 50_000; i++) {
            s.append(i).append(",1.5\n");
        }
        Path file = dir.resolve("long.csv");
        Files.writeString(file, s);
        return new SeriesSource(file, "long.csv", ',', '.', "t_s", List.of("g1"));
    }

    @Test
    void progressReachesTheFileSizeWithOneAndTwoThreads() throws IOException {
        SeriesSource source = bigSource();
        long size = Files.size(source.file());
        for (int threads = 1; threads <= 2; threads++) {
            AtomicLong last = new AtomicLong();
            ReadOptions options = ReadOptions.defaults().withThreads(threads).withMinBytesPerPart(1)
                    .withBufferBytes(4096).withProgress((done, total) -> {
                        assertEquals(size, total);
                        assertTrue(done <= total);
                        last.accumulateAndGet(done, Math::max);
                    });
            SeriesReader.fold(source, options, new SeriesReaderValuesTest.ColumnChecksum());
            assertEquals(size, last.get(), threads + " threads");
        }
    }

    @Test
    void cancelFlagStopsAReadWithACleanException() throws IOException {
        SeriesSource source = bigSource();
        for (int threads = 1; threads <= 2; threads++) {
            AtomicBoolean cancel = new AtomicBoolean();
            AtomicLong chunks = new AtomicLong();
            ReadOptions options = ReadOptions.defaults().withThreads(threads).withMinBytesPerPart(1)
                    .withChunkRows(100).withCancel(cancel);
            SeriesCancelledException e = assertThrows(SeriesCancelledException.class,
                    () -> SeriesReader.fold(source, options, new SeriesReaderValuesTest.ColumnChecksum() {
                        @Override
                        public void add(double[] acc, Chunk chunk) {
                            if (chunks.incrementAndGet() == 3) {
                                cancel.set(true);
                            }
                        }
                    }));
            assertEquals("long.csv: reading was cancelled", e.getMessage());
            assertTrue(chunks.get() < 500, "stopped early: " + chunks.get() + " chunks");
        }
    }

    @Test
    void interruptStopsAStreamAndKeepsTheInterruptStatus() throws IOException {
        SeriesSource source = bigSource();
        ReadOptions options = ReadOptions.defaults().withChunkRows(100);
        assertThrows(SeriesCancelledException.class, () -> SeriesReader.stream(source, options, chunk -> {
            Thread.currentThread().interrupt();
            return true;
        }));
        assertTrue(Thread.interrupted(), "interrupt status kept for the caller");
    }

    @Test
    void sinkCanStopEarly() throws IOException {
        SeriesSource source = bigSource();
        long samples = SeriesReader.stream(source, ReadOptions.defaults().withChunkRows(1000), chunk -> chunk.time()[0] < 2000);
        assertEquals(3000, samples); // chunks start at t = 1, 1001, 2001: the third says stop
    }

    @Test
    void progressBarIsThrottledAndEndsItsLine() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream out = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        long[] now = {0};
        ProgressBar bar = new ProgressBar(out, "reading", () -> now[0]);
        bar.progress(0, 1000);
        for (int i = 1; i <= 1000; i++) {
            now[0] += 1_000_000; // 1 ms a call: at most one redraw in a hundred
            bar.progress(i, 1000);
        }
        bar.finish();
        bar.finish();
        String text = bytes.toString(StandardCharsets.UTF_8);
        long draws = text.chars().filter(c -> c == '\r').count();
        assertTrue(draws <= 12, draws + " redraws");
        assertTrue(text.endsWith("] 100%  0 of 0 MB\n"), text);
        assertEquals(1, text.chars().filter(c -> c == '\n').count());
    }

    @Test
    void progressBarThatNeverDrewStaysSilent() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ProgressBar bar = new ProgressBar(new PrintStream(bytes, true, StandardCharsets.UTF_8), "reading");
        bar.finish();
        assertEquals(0, bytes.size());
    }
}
