package org.rosetra.runtime.series;

import java.util.Arrays;

/**
 * A sum of doubles kept exactly, as a list of non-overlapping partial sums (Shewchuk's
 * algorithm, as Python's {@code math.fsum} uses). Its {@link #value()} is the exact sum
 * rounded once, so it does not depend on the order the terms were added in, nor on how a
 * read was split into parts: a zero window read with two threads gives the same mean as
 * with one.
 */
public final class ExactSum {

    private double[] partials = new double[4];
    private int size;
    private double nonFinite; // sum of infinities and NaNs, kept apart as IEEE adds them

    public void add(double x) {
        if (Double.isNaN(x) || Double.isInfinite(x)) {
            nonFinite += x;
            return;
        }
        int kept = 0;
        for (int j = 0; j < size; j++) {
            double y = partials[j];
            if (Math.abs(x) < Math.abs(y)) {
                double t = x;
                x = y;
                y = t;
            }
            double hi = x + y;
            double lo = y - (hi - x);
            if (lo != 0.0) {
                partials[kept++] = lo;
            }
            x = hi;
        }
        if (kept == partials.length) {
            partials = Arrays.copyOf(partials, kept * 2);
        }
        partials[kept++] = x;
        size = kept;
    }

    /** Adds the terms of {@code other} into this sum. */
    public ExactSum add(ExactSum other) {
        for (int j = 0; j < other.size; j++) {
            add(other.partials[j]);
        }
        nonFinite += other.nonFinite;
        return this;
    }

    /** The exact sum rounded to the nearest double (half to even). */
    public double value() {
        if (nonFinite != 0.0 || Double.isNaN(nonFinite)) {
            return nonFinite;
        }
        if (size == 0) {
            return 0.0;
        }
        int n = size - 1;
        double hi = partials[n];
        double lo = 0.0;
        while (n > 0) {
            double x = hi;
            double y = partials[--n];
            hi = x + y;
            double yr = hi - x;
            lo = y - yr;
            if (lo != 0.0) {
                break;
            }
        }
        // A half-way case rounded the wrong way by the last addition (as math.fsum corrects it).
        if (n > 0 && ((lo < 0.0 && partials[n - 1] < 0.0) || (lo > 0.0 && partials[n - 1] > 0.0))) {
            double y = lo * 2.0;
            double x = hi + y;
            double yr = x - hi;
            if (y == yr) {
                hi = x;
            }
        }
        return hi;
    }
}
