package org.rosetra.runtime.series;

/**
 * Readings of one column beyond a plausible limit (for instance 50,000 microstrain, or the
 * gauge's own range): how many, the first and last time, and the worst. Such readings point
 * to a debonded or saturated gauge; the record shows them. Mergeable in file order.
 */
public final class PlausibilityFlag {

    private final double limit;
    private long count;
    private double firstTime = Double.NaN;
    private double lastTime = Double.NaN;
    private double worst = Double.NaN;
    private double timeOfWorst = Double.NaN;

    /** Flags readings whose magnitude exceeds {@code limit} (in the column's own unit). */
    public PlausibilityFlag(double limit) {
        if (!(limit > 0)) {
            throw new IllegalArgumentException("the plausible limit must be positive, not " + limit);
        }
        this.limit = limit;
    }

    public void add(double[] values, double[] times, int n) {
        for (int i = 0; i < n; i++) {
            double v = values[i];
            if (Math.abs(v) > limit) {
                note(v, times[i]);
            }
        }
    }

    private void note(double v, double t) {
        if (count == 0) {
            firstTime = t;
        }
        lastTime = t;
        count++;
        if (!(Math.abs(v) <= Math.abs(worst))) { // NaN worst: the first one found
            worst = v;
            timeOfWorst = t;
        }
    }

    public PlausibilityFlag merge(PlausibilityFlag later) {
        if (later.count == 0) {
            return this;
        }
        if (count == 0) {
            firstTime = later.firstTime;
        }
        lastTime = later.lastTime;
        if (count == 0 || Math.abs(later.worst) > Math.abs(worst)) {
            worst = later.worst;
            timeOfWorst = later.timeOfWorst;
        }
        count += later.count;
        return this;
    }

    public double limit() {
        return limit;
    }

    /** True when some reading went beyond the limit. */
    public boolean raised() {
        return count > 0;
    }

    public long count() {
        return count;
    }

    public double firstTime() {
        return firstTime;
    }

    public double lastTime() {
        return lastTime;
    }

    /** The reading of largest magnitude beyond the limit (the earliest of equals). */
    public double worst() {
        return worst;
    }

    public double timeOfWorst() {
        return timeOfWorst;
    }
}
