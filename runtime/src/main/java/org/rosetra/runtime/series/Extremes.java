package org.rosetra.runtime.series;

/**
 * Largest and smallest value of one column over a series, with the time of each; a tie
 * keeps the earliest time. One accumulator per part of a read; {@link #merge} in file order
 * gives exactly what one pass would. Values that are not numbers (NaN from a computation)
 * are counted apart and never win.
 */
public final class Extremes {

    private double max = Double.NaN;
    private double min = Double.NaN;
    private double timeOfMax = Double.NaN;
    private double timeOfMin = Double.NaN;
    private long count;
    private long notNumbers;

    /** Adds rows {@code 0..n-1} of a column and its times, in time order. */
    public void add(double[] values, double[] times, int n) {
        // Two light passes instead of one branchy one: the chunk's largest and smallest value
        // (conditional moves, no unpredictable branches), then, only when one of them beats the
        // running extreme, the first sample that holds it (ties keep the earliest).
        double hi = Double.NEGATIVE_INFINITY;
        double lo = Double.POSITIVE_INFINITY;
        long skipped = 0;
        for (int i = 0; i < n; i++) {
            double v = values[i];
            hi = v > hi ? v : hi;
            lo = v < lo ? v : lo;
            skipped += v != v ? 1 : 0;
        }
        count += n;
        notNumbers += skipped;
        if (skipped == n) {
            return;
        }
        if (max != max || hi > max) {
            max = hi;
            timeOfMax = times[firstIndexOf(values, hi, n)];
        }
        if (min != min || lo < min) {
            min = lo;
            timeOfMin = times[firstIndexOf(values, lo, n)];
        }
    }

    private static int firstIndexOf(double[] values, double v, int n) {
        for (int i = 0; i < n; i++) {
            if (values[i] == v) {
                return i;
            }
        }
        throw new IllegalStateException("a chunk's extreme is not in the chunk");
    }


    /** Merges {@code later}, whose samples all come after this one's, into this one. */
    public Extremes merge(Extremes later) {
        if (later.max > max || (max != max && later.max == later.max)) {
            max = later.max;
            timeOfMax = later.timeOfMax;
        }
        if (later.min < min || (min != min && later.min == later.min)) {
            min = later.min;
            timeOfMin = later.timeOfMin;
        }
        count += later.count;
        notNumbers += later.notNumbers;
        return this;
    }

    /** Largest value, NaN when no sample had one. */
    public double max() {
        return max;
    }

    public double min() {
        return min;
    }

    /** Time of the first sample that reached {@link #max()}. */
    public double timeOfMax() {
        return timeOfMax;
    }

    public double timeOfMin() {
        return timeOfMin;
    }

    /** Samples added, not-a-number ones included. */
    public long count() {
        return count;
    }

    /** Samples whose value was not a number. */
    public long notNumbers() {
        return notNumbers;
    }

    @Override
    public String toString() {
        return "Extremes[max=" + max + " at " + timeOfMax + ", min=" + min + " at " + timeOfMin
                + ", count=" + count + (notNumbers > 0 ? ", not numbers=" + notNumbers : "") + "]";
    }
}
