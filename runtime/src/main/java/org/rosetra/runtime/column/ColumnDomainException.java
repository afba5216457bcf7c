package org.rosetra.runtime.column;

/**
 * An operation on a column met a value it has no answer for (a division by zero, the square
 * root of a negative number) at one position of the column, where every input was defined.
 */
public final class ColumnDomainException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int index;

    public ColumnDomainException(int index, String message) {
        super(message);
        this.index = index;
    }

    /** Position in the column (the case or sample) where it happened. */
    public int index() {
        return index;
    }
}
