package org.rosetra.runtime.strain;

/**
 * A strain or stress state, or an argument to one of its operations, that cannot be used:
 * a component that is not a finite number, or columns that do not fit together. The message
 * names the argument, says what was wrong with it and what to do.
 */
public final class StateException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public StateException(String message) {
        super(message);
    }

    /** Throws when {@code value} is NaN or infinite; {@code what} names the argument. */
    public static double requireFinite(String what, double value) {
        if (!Double.isFinite(value)) {
            throw new StateException(what + " is " + value
                    + "; every component and angle must be a finite number (check the readings and the units)");
        }
        return value;
    }
}
