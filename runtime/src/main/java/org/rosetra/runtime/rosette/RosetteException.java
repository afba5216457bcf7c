package org.rosetra.runtime.rosette;

/**
 * A rosette layout or solve that cannot give a trustworthy strain state. The message names
 * the angles or values at fault and what to do.
 */
public final class RosetteException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public RosetteException(String message) {
        super(message);
    }
}
