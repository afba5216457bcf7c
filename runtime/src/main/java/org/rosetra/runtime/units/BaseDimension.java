package org.rosetra.runtime.units;

/**
 * The base dimensions of the model, in the order a canonical SI expression lists them
 * ("kg*m^2/s^2"). Angle is a base dimension of its own so that a trigonometric function
 * of a stress is caught before anything runs.
 */
public enum BaseDimension {
    MASS("mass", "kg"),
    LENGTH("length", "m"),
    TIME("time", "s"),
    CURRENT("current", "A"),
    TEMPERATURE("temperature", "K"),
    ANGLE("angle", "rad");

    private final String word;
    private final String siSymbol;

    BaseDimension(String word, String siSymbol) {
        this.word = word;
        this.siSymbol = siSymbol;
    }

    /** Plain word used in messages, e.g. "length". */
    public String word() {
        return word;
    }

    /** Symbol of the SI unit in which values of this dimension are stored. */
    public String siSymbol() {
        return siSymbol;
    }
}
