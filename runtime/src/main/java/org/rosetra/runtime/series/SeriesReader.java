package org.rosetra.runtime.series;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.NoSuchFileException;
import java.nio.file.StandardOpenOption;

/**
 * Reads a measured series from a CSV file (RFC 4180, header row) in chunks of reused
 * columns, so memory stays flat however long the file is.
 *
 * <p>{@link #stream} reads in one pass, in file order, and handles every RFC 4180 form.
 * {@link #fold} splits the data into byte ranges at line boundaries, one per thread, and
 * merges the per-part accumulators in file order; a file with any quote character is read
 * again in one pass, since a line break inside quotes could fall on a split. Either way the
 * first bad value in file order is reported, with its exact line.
 */
public final class SeriesReader {

    private SeriesReader() {
    }

    /** The header row of the source's file. */
    public static SeriesHeader header(SeriesSource source) {
        try (FileChannel channel = open(source)) {
            return SeriesHeader.read(channel, source.shownName(), source.delimiter());
        } catch (IOException e) {
            throw unreadable(source, e);
        }
    }

    /**
     * Reads the file in one pass, handing each chunk to {@code sink} until the file ends or
     * the sink returns false. Returns the number of samples handed over.
     *
     * @throws SeriesDataException     on bad data (nothing after it reaches the sink)
     * @throws SeriesCancelledException when cancelled through the options or by an interrupt
     */
    public static long stream(SeriesSource source, ReadOptions options, ChunkSink sink) {
        try (FileChannel channel = open(source)) {
            long size = channel.size();
            SeriesHeader header = SeriesHeader.read(channel, source.shownName(), source.delimiter());
            ColumnLayout layout = ColumnLayout.of(source, header);
            ReadControl control = new ReadControl(source.shownName(), options, size);
            control.bytesRead(header.dataStart());
            PartParser parser = new PartParser(0, channel, source, layout, true, size, control, options);
            PartOutcome outcome = parser.read(header.dataStart(), size, false, header.lines() + 1, 0, sink);
            if (outcome.error() != null) {
                throw outcome.error();
            }
            if (outcome.rows() == 0 && !outcome.stoppedEarly()) {
                throw noRows(source, header);
            }
            return outcome.rows();
        } catch (IOException e) {
            throw unreadable(source, e);
        }
    }

    /**
     * Folds the whole file, in parallel parts when the options allow and the file is large
     * enough. The result does not depend on the number of threads when the fold's merge is
     * exact.
     *
     * @throws SeriesDataException     on bad data: the first in file order
     * @throws SeriesCancelledException when cancelled through the options or by an interrupt
     */
    public static <A> FoldResult<A> fold(SeriesSource source, ReadOptions options, SeriesFold<A> fold) {
        try (FileChannel channel = open(source)) {
            long size = channel.size();
            SeriesHeader header = SeriesHeader.read(channel, source.shownName(), source.delimiter());
            ColumnLayout layout = ColumnLayout.of(source, header);
            long dataBytes = size - header.dataStart();
            int parts = (int) Math.max(1, Math.min(options.threads(), dataBytes / options.minBytesPerPart()));
            if (parts > 1) {
                FoldResult<A> result = new ParallelFold<>(channel, source, layout, header, size, options, fold).run(parts);
                if (result != null) {
                    return result;
                }
                // A quote was seen: read again in one pass, which handles quoted line breaks.
            }
            A accumulator = fold.start();
            ReadControl control = new ReadControl(source.shownName(), options, size);
            control.bytesRead(header.dataStart());
            PartParser parser = new PartParser(0, channel, source, layout, true, size, control, options);
            PartOutcome outcome = parser.read(header.dataStart(), size, false, header.lines() + 1, 0, chunk -> {
                fold.add(accumulator, chunk);
                return true;
            });
            if (outcome.error() != null) {
                throw outcome.error();
            }
            if (outcome.rows() == 0) {
                throw noRows(source, header);
            }
            return new FoldResult<>(accumulator, outcome.rows(), 1);
        } catch (IOException e) {
            throw unreadable(source, e);
        }
    }

    static SeriesDataException noRows(SeriesSource source, SeriesHeader header) {
        return new SeriesDataException(source.shownName(), header.lines() + 1, null,
                "no data rows after the header");
    }

    private static FileChannel open(SeriesSource source) {
        try {
            return FileChannel.open(source.file(), StandardOpenOption.READ);
        } catch (NoSuchFileException e) {
            throw new SeriesDataException(source.shownName(), 0, null, "no such file");
        } catch (IOException e) {
            throw unreadable(source, e);
        }
    }

    static SeriesDataException unreadable(SeriesSource source, IOException e) {
        return new SeriesDataException(source.shownName(), 0, null,
                "cannot be read: " + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
    }
}
