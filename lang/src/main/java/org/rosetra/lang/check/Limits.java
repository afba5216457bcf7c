package org.rosetra.lang.check;

/** The range a literal field value must lie in. */
public record Limits(double low, boolean lowInclusive, double high, boolean highInclusive) {

    public static final Limits POSITIVE = new Limits(0, false, Double.POSITIVE_INFINITY, false);
    public static final Limits NOT_NEGATIVE = new Limits(0, true, Double.POSITIVE_INFINITY, false);
    public static final Limits POISSON = new Limits(-1, false, 0.5, false);

    public boolean contains(double value) {
        boolean aboveLow = lowInclusive ? value >= low : value > low;
        boolean belowHigh = highInclusive ? value <= high : value < high;
        return aboveLow && belowHigh;
    }

    /** "greater than 0", "0 or more", "in (-1, 0.5)". */
    public String describe() {
        if (Double.isInfinite(high)) {
            return lowInclusive ? format(low) + " or more" : "greater than " + format(low);
        }
        return "in " + (lowInclusive ? "[" : "(") + format(low) + ", " + format(high)
                + (highInclusive ? "]" : ")");
    }

    private static String format(double value) {
        return value == Math.rint(value) ? Long.toString((long) value) : Double.toString(value);
    }
}
