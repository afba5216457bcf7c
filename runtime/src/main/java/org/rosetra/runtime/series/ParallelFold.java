package org.rosetra.runtime.series;

import java.io.IOException;
import java.nio.channels.FileChannel;

/**
 * One fold over a file split into byte ranges, each read on its own thread into its own
 * accumulator (the calling thread reads the first). The accumulators are merged in file
 * order; lines are made absolute by adding up the line breaks of the parts before; the time
 * is checked across each split, as if the file had been read in one pass.
 */
final class ParallelFold<A> {

    private final FileChannel channel;
    private final SeriesSource source;
    private final ColumnLayout layout;
    private final SeriesHeader header;
    private final long size;
    private final ReadOptions options;
    private final SeriesFold<A> fold;

    ParallelFold(FileChannel channel, SeriesSource source, ColumnLayout layout, SeriesHeader header,
                 long size, ReadOptions options, SeriesFold<A> fold) {
        this.channel = channel;
        this.source = source;
        this.layout = layout;
        this.header = header;
        this.size = size;
        this.options = options;
        this.fold = fold;
    }

    /** The merged result, or null when a quote was seen and the file must be read in one pass. */
    FoldResult<A> run(int parts) throws IOException {
        ReadControl control = new ReadControl(source.shownName(), options, size);
        control.bytesRead(header.dataStart());
        long dataStart = header.dataStart();
        long dataBytes = size - dataStart;
        @SuppressWarnings("unchecked")
        A[] accumulators = (A[]) new Object[parts];
        PartOutcome[] outcomes = new PartOutcome[parts];
        Throwable[] failures = new Throwable[parts];
        Thread[] threads = new Thread[parts];
        for (int k = parts - 1; k >= 0; k--) {
            final int part = k;
            long start = dataStart + dataBytes * k / parts;
            long end = dataStart + dataBytes * (k + 1) / parts;
            Runnable work = () -> {
                try {
                    A accumulator = fold.start();
                    accumulators[part] = accumulator;
                    PartParser parser = new PartParser(part, channel, source, layout, false, size, control, options);
                    long lineBase = part == 0 ? header.lines() + 1 : 0;
                    outcomes[part] = parser.read(start, end, part > 0, lineBase, 0, chunk -> {
                        fold.add(accumulator, chunk);
                        return true;
                    });
                } catch (Throwable t) {
                    control.stopAll();
                    failures[part] = t;
                }
            };
            if (k == 0) {
                work.run();
            } else {
                threads[k] = new Thread(work, "series-part-" + k);
                threads[k].setDaemon(true);
                threads[k].start();
            }
        }
        boolean interrupted = false;
        for (int k = 1; k < parts; k++) {
            while (true) {
                try {
                    threads[k].join();
                    break;
                } catch (InterruptedException e) {
                    interrupted = true;
                    control.stopAll();
                }
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
            throw new SeriesCancelledException(source.shownName());
        }
        for (Throwable t : failures) {
            if (t instanceof SeriesCancelledException c) {
                throw c;
            }
        }
        for (Throwable t : failures) {
            if (t instanceof PartParser.QuoteSeen) {
                return null;
            }
        }
        for (Throwable t : failures) {
            if (t instanceof IOException io) {
                throw io;
            }
            if (t instanceof RuntimeException r) {
                throw r;
            }
            if (t instanceof Error e) {
                throw e;
            }
        }
        return merge(accumulators, outcomes);
    }

    private FoldResult<A> merge(A[] accumulators, PartOutcome[] outcomes) {
        long lineBase = header.lines() + 1;
        long samples = 0;
        boolean havePrevious = false;
        double previousTime = Double.NaN;
        A merged = null;
        for (int k = 0; k < outcomes.length; k++) {
            PartOutcome o = outcomes[k];
            long shift = k == 0 ? 0 : lineBase;
            if (k > 0 && o.rows() > 0 && havePrevious && !(o.firstTime() > previousTime)) {
                String timeName = source.timeColumn();
                throw new SeriesDataException(source.shownName(), shift + o.firstRowLine(), timeName,
                        "time " + o.firstTime() + " does not increase (the sample before is at " + previousTime + ")");
            }
            if (o.error() != null) {
                throw k == 0 ? o.error() : o.error().shiftedBy(shift);
            }
            merged = merged == null ? accumulators[k] : fold.merge(merged, accumulators[k]);
            samples += o.rows();
            lineBase += o.lineBreaks();
            if (o.rows() > 0) {
                havePrevious = true;
                previousTime = o.lastTime();
            }
        }
        if (samples == 0) {
            throw SeriesReader.noRows(source, header);
        }
        return new FoldResult<>(merged, samples, outcomes.length);
    }
}
