package org.rosetra.runtime.units;

/**
 * Arithmetic on quantities that has no finite answer (division by zero, the root of a
 * negative value, overflow), raised instead of letting NaN or infinity through.
 */
public final class QuantityException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    public QuantityException(String message) {
        super(message);
    }
}
