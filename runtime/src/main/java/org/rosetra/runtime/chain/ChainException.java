package org.rosetra.runtime.chain;

/** A reduction chain whose parts do not fit together; the message says which and what to do. */
public final class ChainException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public ChainException(String message) {
        super(message);
    }
}
