package org.rosetra.runtime.units;

import java.util.Objects;

/**
 * A unit of measure: its symbol as written, its dimension, and the affine map to SI,
 * {@code si = (value + offset) * scale}. Only a bare absolute-temperature unit such as
 * {@code degC} has an offset; any unit built from it by {@link #times}, {@link #over} or
 * {@link #pow} means a temperature difference and keeps only the scale, so
 * {@code ue/degC} is 1e-6 per kelvin.
 *
 * @param symbol    the symbol as written, e.g. "N/mm^2"; empty for a plain number
 * @param dimension what the unit measures
 * @param scale     SI value of one unit step, finite and positive
 * @param offset    added to a reading before scaling; 0 except for absolute temperatures
 */
public record Unit(String symbol, Dimension dimension, double scale, double offset) {

    /** The unit of a plain number. */
    public static final Unit ONE = new Unit("", Dimension.NONE, 1.0, 0.0);

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
        if (!(scale > 0.0) || !Double.isFinite(scale)) {
            throw new IllegalArgumentException("scale of unit '" + symbol + "' is " + scale
                    + "; give a finite positive factor to SI");
        }
        if (!Double.isFinite(offset)) {
            throw new IllegalArgumentException("offset of unit '" + symbol + "' is " + offset
                    + "; give a finite offset (0 unless it is an absolute temperature)");
        }
    }

    /** A unit without offset. */
    public static Unit linear(String symbol, Dimension dimension, double scale) {
        return new Unit(symbol, dimension, scale, 0.0);
    }

    /** The coherent SI unit of a dimension (scale 1), labelled with its SI expression. */
    public static Unit coherent(Dimension dimension) {
        return dimension.isNone() ? ONE : linear(dimension.siExpression(), dimension, 1.0);
    }

    public double toSi(double value) {
        return (value + offset) * scale;
    }

    public double fromSi(double si) {
        return si / scale - offset;
    }

    /** True for a unit of absolute temperature with a shifted zero (degC, degF). */
    public boolean isAffine() {
        return offset != 0.0;
    }

    /** The same step size without the offset: what the symbol means inside a compound. */
    public Unit asDifference() {
        return isAffine() ? new Unit(symbol, dimension, scale, 0.0) : this;
    }

    public Unit times(Unit other) {
        return linear(join(symbol, "*", other.symbol), dimension.times(other.dimension),
                scale * other.scale);
    }

    public Unit over(Unit other) {
        return linear(join(symbol, "/", other.symbol), dimension.over(other.dimension),
                scale / other.scale);
    }

    public Unit pow(Rational power) {
        if (symbol.isEmpty()) {
            return linear("", dimension.pow(power), Math.pow(scale, power.doubleValue()));
        }
        String base = isCompound(symbol) ? "(" + symbol + ")" : symbol;
        String exponent = power.isInteger() ? power.toString() : "(" + power + ")";
        return linear(base + "^" + exponent, dimension.pow(power),
                Math.pow(scale, power.doubleValue()));
    }

    public Unit pow(int power) {
        return pow(Rational.of(power));
    }

    /** The same unit under another label, e.g. the text a user wrote. */
    public Unit withSymbol(String newSymbol) {
        return new Unit(newSymbol, dimension, scale, offset);
    }

    @Override
    public String toString() {
        return symbol.isEmpty() ? "1" : symbol;
    }

    private static String join(String left, String operator, String right) {
        if (right.isEmpty()) {
            return left;
        }
        String rightPart = operator.equals("/") && isCompound(right) ? "(" + right + ")" : right;
        if (left.isEmpty()) {
            return operator.equals("*") ? right : "1/" + rightPart;
        }
        return left + operator + rightPart;
    }

    private static boolean isCompound(String symbol) {
        return symbol.contains("*") || symbol.contains("/");
    }
}
