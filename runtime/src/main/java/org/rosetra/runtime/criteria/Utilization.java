package org.rosetra.runtime.criteria;

import java.util.Objects;

/**
 * Utilization of a check {@code LEFT op RIGHT} in one case, as LANGUAGE.md defines it:
 * LEFT / RIGHT for {@code <} and {@code <=}, RIGHT / LEFT for {@code >} and {@code >=}.
 * Whether the case passes is the comparison itself, never the ratio.
 *
 * <p>Where the ratio's denominator (the capacity) is zero, the ratio is not a number; so that
 * no NaN or arbitrary value is ever reported:
 * <ul>
 *   <li>0 / 0 (both sides zero) gives 1: the two sides are equal, as every case with
 *       LEFT == RIGHT gives 1 (the conservative choice);</li>
 *   <li>nonzero / 0 gives {@code Double.POSITIVE_INFINITY}, which callers must show as
 *       "unbounded" (see {@link #isUnbounded}), never as a number.</li>
 * </ul>
 * A negative utilization means the two sides have opposite signs; it is reported as computed.
 */
public final class Utilization {

    private Utilization() {
    }

    /** Utilization of {@code left op right}; see the class comment for a zero capacity. */
    public static double of(double left, Comparison op, double right) {
        Objects.requireNonNull(op, "op");
        CriterionException.requireFinite("check", "the left side", left);
        CriterionException.requireFinite("check", "the right side", right);
        return raw(left, op, right);
    }

    /** True for a utilization whose capacity was zero and demand nonzero. */
    public static boolean isUnbounded(double utilization) {
        return utilization == Double.POSITIVE_INFINITY;
    }

    /**
     * Per case utilization and pass over columns of left and right values (one value per case
     * or sample), and the check's outcome. {@code utilizationOut} and {@code passOut} may be
     * null when only the outcome is wanted.
     */
    public static CheckOutcome evaluate(double[] left, Comparison op, double[] right, int n,
                                        double[] utilizationOut, boolean[] passOut) {
        Objects.requireNonNull(op, "op");
        CriterionException.requireColumns("check", n, left, right);
        if (utilizationOut != null && utilizationOut.length < n) {
            throw new CriterionException("check: the utilization column holds "
                    + utilizationOut.length + " values but n = " + n + "; give at least n");
        }
        if (passOut != null && passOut.length < n) {
            throw new CriterionException("check: the pass column holds " + passOut.length
                    + " values but n = " + n + "; give at least n");
        }
        boolean allPass = true;
        int governing = -1;
        double highest = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double l = left[i];
            double r = right[i];
            if (!Double.isFinite(l) || !Double.isFinite(r)) {
                throw new CriterionException("check: case " + i + " has left side " + l
                        + " and right side " + r + "; both must be finite numbers");
            }
            double u = raw(l, op, r);
            boolean pass = op.holds(l, r);
            allPass &= pass;
            if (utilizationOut != null) {
                utilizationOut[i] = u;
            }
            if (passOut != null) {
                passOut[i] = pass;
            }
            if (u > highest) { // strict: the first of equal utilizations governs
                highest = u;
                governing = i;
            }
        }
        if (governing < 0) {
            return new CheckOutcome(true, -1, 0.0, false);
        }
        return new CheckOutcome(allPass, governing, highest, isUnbounded(highest));
    }

    private static double raw(double left, Comparison op, double right) {
        double demand = op.leftIsDemand() ? left : right;
        double capacity = op.leftIsDemand() ? right : left;
        if (capacity == 0) {
            return demand == 0 ? 1.0 : Double.POSITIVE_INFINITY;
        }
        return demand / capacity;
    }
}
