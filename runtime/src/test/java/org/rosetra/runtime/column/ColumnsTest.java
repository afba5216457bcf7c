package org.rosetra.runtime.column;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ColumnsTest {
    private static final double NA = Double.NaN;

    @Test
    void arithmeticAgreesWithJavaLangMathElementByElement() {
        // Source: java.lang.Math (reference library), element by element.
        double[] a = {1.5, -2.0, 4.0};
        double[] b = {0.5, 3.0, -8.0};
        assertArrayEquals(new double[] {2.0, 1.0, -4.0}, Columns.add(a, b));
        assertArrayEquals(new double[] {1.0, -5.0, 12.0}, Columns.subtract(a, b));
        assertArrayEquals(new double[] {0.75, -6.0, -32.0}, Columns.multiply(a, b));
        assertArrayEquals(new double[] {3.0, -2.0 / 3.0, -0.5}, Columns.divide(a, b), 1e-15);
        assertArrayEquals(new double[] {Math.atan2(1.5, 0.5), Math.atan2(-2.0, 3.0), Math.atan2(4.0, -8.0)},
                Columns.atan2(a, b));
        assertArrayEquals(new double[] {Math.sqrt(1.5), 2.0}, Columns.sqrt(new double[] {1.5, 4.0}));
    }

    @Test
    void aMissingValueStaysMissingAndIsNotAnError() {
        double[] a = {1.0, NA, 3.0};
        double[] b = {2.0, 2.0, NA};
        double[] sum = Columns.add(a, b);
        assertEquals(3.0, sum[0]);
        assertTrue(Double.isNaN(sum[1]));
        assertTrue(Double.isNaN(sum[2]));
        assertTrue(Double.isNaN(Columns.divide(new double[] {NA}, new double[] {0.0})[0]));
    }

    @Test
    void divisionByZeroOfDefinedValuesIsADomainErrorAtItsPosition() {
        ColumnDomainException e = assertThrows(ColumnDomainException.class,
                () -> Columns.divide(new double[] {1, 2}, new double[] {1, 0}));
        assertEquals(1, e.index());
        assertTrue(e.getMessage().contains("division by zero"));
        assertThrows(ColumnDomainException.class, () -> Columns.sqrt(new double[] {-1e-3}));
    }

    @Test
    void extremesSkipMissingValuesAndTakeTheFirstOfEquals() {
        double[] a = {NA, 5, 7, 7, -1};
        assertEquals(2, Columns.indexOfMax(a));
        assertEquals(4, Columns.indexOfMin(a));
        assertEquals(-1, Columns.indexOfMax(new double[] {NA, NA}));
    }
}
