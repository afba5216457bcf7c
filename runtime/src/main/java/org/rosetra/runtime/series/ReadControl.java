package org.rosetra.runtime.series;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Shared by the parts of one read: the user's cancel flag, the first part that failed (the
 * parts after it need not go on: the reader reports the first error in file order) and the
 * bytes read so far for the progress listener.
 */
final class ReadControl {

    private final String shownName;
    private final AtomicBoolean cancel;
    private final AtomicInteger firstFailedPart = new AtomicInteger(Integer.MAX_VALUE);
    private final AtomicLong bytesDone = new AtomicLong();
    private final long bytesTotal;
    private final ProgressListener progress;

    ReadControl(String shownName, ReadOptions options, long bytesTotal) {
        this.shownName = shownName;
        this.cancel = options.cancel();
        this.progress = options.progress();
        this.bytesTotal = bytesTotal;
    }

    /**
     * True when {@code part} should stop because a part before it failed; throws when the
     * user cancelled (the flag, or an interrupt of the thread reading this part).
     */
    boolean shouldStop(int part) {
        if (cancel.get() || Thread.currentThread().isInterrupted()) {
            stopAll();
            throw new SeriesCancelledException(shownName);
        }
        return firstFailedPart.get() < part;
    }

    /** Part {@code part} found bad data: the parts after it can stop. */
    void failed(int part) {
        firstFailedPart.accumulateAndGet(part, Math::min);
    }

    /** Every part can stop: the read is cancelled or will be done again in one pass. */
    void stopAll() {
        firstFailedPart.set(-1);
    }

    void bytesRead(long n) {
        if (n > 0) {
            progress.progress(Math.min(bytesTotal, bytesDone.addAndGet(n)), bytesTotal);
        }
    }
}
