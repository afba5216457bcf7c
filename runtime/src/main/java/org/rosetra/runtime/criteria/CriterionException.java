package org.rosetra.runtime.criteria;

/** A criterion or check asked of values it cannot judge; the message says which and why. */
public final class CriterionException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public CriterionException(String message) {
        super(message);
    }

    static void requireFinite(String criterion, String what, double value) {
        if (!Double.isFinite(value)) {
            throw new CriterionException(criterion + ": " + what + " is " + value
                    + "; a criterion needs finite numbers (check the values it was given)");
        }
    }

    static void requirePositive(String criterion, String what, double value) {
        if (!(Double.isFinite(value) && value > 0)) {
            throw new CriterionException(criterion + ": " + what + " = " + value
                    + " must be a positive, finite strength");
        }
    }

    static void requireColumns(String criterion, int n, double[]... columns) {
        if (n < 0) {
            throw new CriterionException(criterion + ": the number of values n = " + n
                    + " is negative; give n >= 0");
        }
        for (int i = 0; i < columns.length; i++) {
            if (columns[i] == null || columns[i].length < n) {
                throw new CriterionException(criterion + ": column " + (i + 1) + " holds "
                        + (columns[i] == null ? "nothing" : columns[i].length + " values")
                        + " but n = " + n + "; give every column at least n values");
            }
        }
    }
}
