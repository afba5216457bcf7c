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
        double hi = max;
        double lo = min;
        double tHi = timeOfMax;
        double tLo = timeOfMin;
        long skipped = 0;
        int i = 0;
        if (hi != hi) {
            // Nothing defined yet: the first defined value starts both ends.
            while (i < n && values[i] != values[i]) {
                i++;
                skipped++;
            }
            if (i < n) {
                hi = lo = values[i];
                tHi = tLo = times[i];
                i++;
            }
        }
        for (; i < n; i++) {
            double v = values[i];
            if (v > hi) {
                hi = v;
                tHi = times[i];
            } else if (v < lo) {
                lo = v;
                tLo = times[i];
            } else if (v != v) {
                skipped++;
            }
        }
        max = hi;
        min = lo;
        timeOfMax = tHi;
        timeOfMin = tLo;
        count += n;
        notNumbers += skipped;
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
