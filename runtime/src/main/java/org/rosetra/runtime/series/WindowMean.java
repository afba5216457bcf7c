package org.rosetra.runtime.series;

/**
 * Mean of one column over the samples whose time lies in {@code [from, to]}, for a zero
 * taken as a time window. The sum is exact ({@link ExactSum}), so merging parts in any
 * split gives the same mean as one pass.
 */
public final class WindowMean {

    private final double from;
    private final double to;
    private final ExactSum sum = new ExactSum();
    private long count;

    public WindowMean(double from, double to) {
        if (!(from <= to)) {
            throw new IllegalArgumentException("the window's start " + from + " is after its end " + to);
        }
        this.from = from;
        this.to = to;
    }

    /** Adds the rows {@code 0..n-1} whose time is in the window. */
    public void add(double[] values, double[] times, int n) {
        for (int i = 0; i < n; i++) {
            double t = times[i];
            if (t >= from && t <= to) {
                sum.add(values[i]);
                count++;
            }
        }
    }

    public WindowMean merge(WindowMean later) {
        sum.add(later.sum);
        count += later.count;
        return this;
    }

    public double from() {
        return from;
    }

    public double to() {
        return to;
    }

    /** Samples that fell in the window. */
    public long count() {
        return count;
    }

    /** The mean; the caller reports a window with no samples (see {@link #count()}). */
    public double mean() {
        if (count == 0) {
            throw new IllegalStateException("no samples between " + from + " and " + to);
        }
        return sum.value() / count;
    }
}
