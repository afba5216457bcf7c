package org.rosetra.runtime.units;

/** Two quantities, or a quantity and a unit, whose dimensions an operation needs to agree. */
public final class DimensionMismatchException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final transient Dimension left;
    private final transient Dimension right;

    /**
     * @param operation what was attempted, e.g. "add" or "express in MPa"
     */
    public DimensionMismatchException(String operation, Dimension left, Dimension right) {
        super("cannot " + operation + ": " + left + " and " + right
                + " are different dimensions; give both sides the same dimension");
        this.left = left;
        this.right = right;
    }

    public Dimension left() {
        return left;
    }

    public Dimension right() {
        return right;
    }
}
