package org.rosetra.runtime.results;

/** A result member asked for that cannot be given, or columns that do not fit; says why. */
public final class ResultException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public ResultException(String message) {
        super(message);
    }
}
