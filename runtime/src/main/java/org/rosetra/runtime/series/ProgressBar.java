package org.rosetra.runtime.series;

import java.io.PrintStream;
import java.util.function.LongSupplier;

/**
 * A one-line progress bar for long reads, drawn with carriage returns. Redraws at most every
 * {@code 100 ms} and only when the shown percentage changes; {@link #finish()} ends the line.
 * Show it only on a terminal (the caller checks {@code System.console() != null}).
 */
public final class ProgressBar implements ProgressListener {

    private static final long REDRAW_NANOS = 100_000_000L;
    private static final int WIDTH = 30;

    private final PrintStream out;
    private final String label;
    private final LongSupplier nanoClock;
    private long lastDrawn = Long.MIN_VALUE;
    private int lastPercent = -1;
    private long lastTotal;
    private boolean finished;

    public ProgressBar(PrintStream out, String label) {
        this(out, label, System::nanoTime);
    }

    /** With a clock of our own, for tests. */
    ProgressBar(PrintStream out, String label, LongSupplier nanoClock) {
        this.out = out;
        this.label = label;
        this.nanoClock = nanoClock;
    }

    @Override
    public synchronized void progress(long bytesDone, long bytesTotal) {
        if (finished || bytesTotal <= 0) {
            return;
        }
        lastTotal = bytesTotal;
        int percent = (int) Math.min(100, bytesDone * 100 / bytesTotal);
        long now = nanoClock.getAsLong();
        if (percent == lastPercent || (lastDrawn != Long.MIN_VALUE && now - lastDrawn < REDRAW_NANOS)) {
            return;
        }
        draw(percent, bytesDone, bytesTotal);
        lastDrawn = now;
    }

    /** Draws the bar full and ends its line; later calls do nothing. */
    public synchronized void finish() {
        if (finished) {
            return;
        }
        if (lastPercent >= 0) {
            draw(100, lastTotal, lastTotal);
            out.print('\n');
            out.flush();
        }
        finished = true;
    }

    private void draw(int percent, long done, long total) {
        int filled = percent * WIDTH / 100;
        StringBuilder s = new StringBuilder(label.length() + WIDTH + 40).append('\r').append(label).append(" [");
        for (int i = 0; i < WIDTH; i++) {
            s.append(i < filled ? '#' : '.');
        }
        s.append("] ").append(String.format(java.util.Locale.ROOT, "%3d%%  %d of %d MB", percent,
                done / 1_000_000, total / 1_000_000));
        out.print(s);
        out.flush();
        lastPercent = percent;
    }
}
