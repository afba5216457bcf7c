package org.rosetra.runtime.units;

import java.util.function.Supplier;
import org.apache.commons.math3.exception.MathArithmeticException;
import org.apache.commons.math3.fraction.Fraction;

/**
 * An exact rational number in lowest terms with a positive denominator, used for the
 * exponents of a {@link Dimension} so that {@code sqrt(area)} is exactly a length.
 */
public record Rational(int numerator, int denominator) implements Comparable<Rational> {

    public static final Rational ZERO = new Rational(0, 1);
    public static final Rational ONE = new Rational(1, 1);
    public static final Rational HALF = new Rational(1, 2);

    /** Normalizes to lowest terms with a positive denominator, so that equals is exact. */
    public Rational {
        if (denominator == 0) {
            throw new IllegalArgumentException("denominator of the rational " + numerator
                    + "/0 is zero; give a non-zero denominator");
        }
        int num = numerator;
        int den = denominator;
        Fraction reduced = exact(() -> new Fraction(num, den));
        numerator = reduced.getNumerator();
        denominator = reduced.getDenominator();
    }

    public static Rational of(int whole) {
        return new Rational(whole, 1);
    }

    public static Rational of(int numerator, int denominator) {
        return new Rational(numerator, denominator);
    }

    public Rational plus(Rational other) {
        return from(exact(() -> fraction().add(other.fraction())));
    }

    public Rational minus(Rational other) {
        return from(exact(() -> fraction().subtract(other.fraction())));
    }

    public Rational times(Rational other) {
        return from(exact(() -> fraction().multiply(other.fraction())));
    }

    public Rational dividedBy(Rational other) {
        if (other.isZero()) {
            throw new IllegalArgumentException("cannot divide the rational " + this
                    + " by zero; give a non-zero divisor");
        }
        return from(exact(() -> fraction().divide(other.fraction())));
    }

    public Rational negate() {
        return from(exact(() -> fraction().negate()));
    }

    public boolean isZero() {
        return numerator == 0;
    }

    public boolean isInteger() {
        return denominator == 1;
    }

    public int signum() {
        return Integer.signum(numerator);
    }

    public double doubleValue() {
        return (double) numerator / denominator;
    }

    @Override
    public int compareTo(Rational other) {
        return Long.compare((long) numerator * other.denominator, (long) other.numerator * denominator);
    }

    /** "2", "-1", "1/2", "-3/2". */
    @Override
    public String toString() {
        return isInteger() ? Integer.toString(numerator) : numerator + "/" + denominator;
    }

    private Fraction fraction() {
        return new Fraction(numerator, denominator);
    }

    private static Rational from(Fraction fraction) {
        return new Rational(fraction.getNumerator(), fraction.getDenominator());
    }

    /** Commons Math signals int overflow with its own exception; ours says what to do. */
    private static Fraction exact(Supplier<Fraction> computation) {
        try {
            return computation.get();
        } catch (MathArithmeticException overflow) {
            throw new ArithmeticException("exponent arithmetic overflowed the range of int: "
                    + overflow.getMessage() + "; use smaller exponents");
        }
    }
}
