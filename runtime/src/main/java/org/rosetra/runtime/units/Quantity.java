package org.rosetra.runtime.units;

import java.util.Objects;

/**
 * A value with its dimension, stored in SI (strain as a fraction, stress in Pa, angle in
 * rad, temperature in K). Display units are applied only by {@link #in(Unit)}.
 * Every operation either gives a finite result or throws, never NaN.
 *
 * @param si        the value in the coherent SI unit of its dimension, finite
 * @param dimension what it measures
 */
public record Quantity(double si, Dimension dimension) implements Comparable<Quantity> {

    public Quantity {
        Objects.requireNonNull(dimension, "dimension");
        if (!Double.isFinite(si)) {
            throw new QuantityException("a quantity of " + dimension + " must be a finite number, got "
                    + si + "; check the input or the operation that produced it");
        }
    }

    /** {@code of(205, Units.GPA)} is 2.05e11 Pa; {@code of(20, Units.DEG_C)} is 293.15 K. */
    public static Quantity of(double value, Unit unit) {
        if (!Double.isFinite(value)) {
            throw new QuantityException("the value given in " + unit + " is " + value
                    + "; give a finite number");
        }
        return new Quantity(unit.toSi(value), unit.dimension());
    }

    /**
     * A difference or step of {@code value} in {@code unit}: the unit's offset is ignored, so
     * a rise of 10 degC is 10 K (while {@code of(10, DEG_C)} is the temperature 283.15 K).
     */
    public static Quantity ofDifference(double value, Unit unit) {
        return of(value, unit.asDifference());
    }

    /** A plain number. */
    public static Quantity number(double value) {
        return of(value, Unit.ONE);
    }

    /** This value expressed in {@code unit}, for display. */
    public double in(Unit unit) {
        requireSame("express a quantity of " + dimension + " in " + unit, unit.dimension());
        return unit.fromSi(si);
    }

    /** This value read as a difference in {@code unit}, ignoring its offset (a rise of 18 K is 18 degC). */
    public double differenceIn(Unit unit) {
        return in(unit.asDifference());
    }

    public Quantity plus(Quantity other) {
        requireSame("add", other.dimension);
        return new Quantity(si + other.si, dimension);
    }

    public Quantity minus(Quantity other) {
        requireSame("subtract", other.dimension);
        return new Quantity(si - other.si, dimension);
    }

    public Quantity negate() {
        return new Quantity(-si, dimension);
    }

    public Quantity abs() {
        return new Quantity(Math.abs(si), dimension);
    }

    public Quantity times(Quantity other) {
        return new Quantity(si * other.si, dimension.times(other.dimension));
    }

    public Quantity times(double factor) {
        return new Quantity(si * factor, dimension);
    }

    public Quantity over(Quantity other) {
        if (other.si == 0.0) {
            throw new QuantityException("cannot divide a quantity of " + dimension
                    + " by a zero quantity of " + other.dimension + "; the divisor must not be zero");
        }
        return new Quantity(si / other.si, dimension.over(other.dimension));
    }

    public Quantity pow(Rational power) {
        if (si < 0.0 && !power.isInteger()) {
            throw new QuantityException("cannot raise the negative quantity " + si + " (" + dimension
                    + ") to the fractional power " + power + "; the base must not be negative");
        }
        if (si == 0.0 && power.signum() < 0) {
            throw new QuantityException("cannot raise a zero quantity of " + dimension
                    + " to the negative power " + power + "; the base must not be zero");
        }
        return new Quantity(Math.pow(si, power.doubleValue()), dimension.pow(power));
    }

    public Quantity sqrt() {
        return pow(Rational.HALF);
    }

    /** Orders quantities of one dimension; comparing unlike dimensions throws. */
    @Override
    public int compareTo(Quantity other) {
        requireSame("compare", other.dimension);
        return si < other.si ? -1 : (si > other.si ? 1 : 0); // -0.0 equals 0.0 here
    }

    public boolean isLessThan(Quantity other) {
        return compareTo(other) < 0;
    }

    public boolean isGreaterThan(Quantity other) {
        return compareTo(other) > 0;
    }

    private void requireSame(String operation, Dimension other) {
        if (!dimension.equals(other)) {
            throw new DimensionMismatchException(operation, dimension, other);
        }
    }
}
