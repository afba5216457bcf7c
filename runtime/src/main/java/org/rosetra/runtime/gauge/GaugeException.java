package org.rosetra.runtime.gauge;

/**
 * A gauge, bridge or reading that cannot be corrected. The message says which argument was
 * wrong, its value, and what to do about it.
 */
public final class GaugeException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public GaugeException(String message) {
        super(message);
    }
}
