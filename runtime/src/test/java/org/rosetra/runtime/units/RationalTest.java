package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.fraction.Fraction;
import org.junit.jupiter.api.Test;

class RationalTest {

    @Test
    void normalizesToLowestTermsWithPositiveDenominator() {
        // reference library: Commons Math Fraction reduces 2/-4 to -1/2
        Fraction reference = new Fraction(2, -4);
        Rational value = Rational.of(2, -4);
        assertEquals(reference.getNumerator(), value.numerator());
        assertEquals(reference.getDenominator(), value.denominator());
        assertEquals(Rational.of(-1, 2), value);
        assertEquals(Rational.ZERO, Rational.of(0, 7));
    }

    @Test
    void arithmeticIsExact() {
        // arithmetic of fractions (from memory): 1/2 + 1/3 = 5/6, 1/2 - 1/3 = 1/6, 2/3 * 3/4 = 1/2, (1/2) / (1/4) = 2
        assertEquals(Rational.of(5, 6), Rational.HALF.plus(Rational.of(1, 3)));
        assertEquals(Rational.of(1, 6), Rational.HALF.minus(Rational.of(1, 3)));
        assertEquals(Rational.HALF, Rational.of(2, 3).times(Rational.of(3, 4)));
        assertEquals(Rational.of(2), Rational.HALF.dividedBy(Rational.of(1, 4)));
        assertEquals(Rational.of(-1, 2), Rational.HALF.negate());
        assertTrue(Rational.of(4, 2).isInteger());
        assertEquals("-3/2", Rational.of(3, -2).toString());
        assertEquals("2", Rational.of(4, 2).toString());
        assertEquals(0.75, Rational.of(3, 4).doubleValue());
        assertTrue(Rational.of(1, 3).compareTo(Rational.HALF) < 0);
    }

    @Test
    void zeroDenominatorIsRefused() {
        IllegalArgumentException error = assertThrows(IllegalArgumentException.class, () -> Rational.of(1, 0));
        assertTrue(error.getMessage().contains("denominator"), error.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Rational.ONE.dividedBy(Rational.ZERO));
    }

    @Test
    void overflowIsReportedNotWrapped() {
        assertThrows(ArithmeticException.class,
                () -> Rational.of(Integer.MAX_VALUE).plus(Rational.ONE));
    }
}
