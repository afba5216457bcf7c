package org.rosetra.runtime.combine;

/** A load combination whose terms do not fit together; the message says which and why. */
public final class CombinationException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public CombinationException(String message) {
        super(message);
    }
}
