package org.rosetra.runtime.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class UtilizationTest {

    @Test
    void ratioFollowsTheComparison() {
        // LANGUAGE.md: LEFT / RIGHT for < and <=, RIGHT / LEFT for > and >=.
        assertEquals(0.5, Utilization.of(100, Comparison.LESS_OR_EQUAL, 200), 0);
        assertEquals(0.5, Utilization.of(100, Comparison.LESS, 200), 0);
        assertEquals(0.5, Utilization.of(200, Comparison.GREATER_OR_EQUAL, 100), 0);
        assertEquals(0.5, Utilization.of(200, Comparison.GREATER, 100), 0);
    }

    @Test
    void zeroCapacity() {
        // Documented choice: 0 / 0 is 1 (the sides are equal), nonzero / 0 is unbounded.
        assertEquals(1, Utilization.of(0, Comparison.LESS_OR_EQUAL, 0), 0);
        double u = Utilization.of(5, Comparison.LESS_OR_EQUAL, 0);
        assertTrue(Utilization.isUnbounded(u));
        assertTrue(Utilization.isUnbounded(Utilization.of(0, Comparison.GREATER, 3)));
        assertThrows(CriterionException.class, () -> Utilization.of(Double.NaN, Comparison.LESS, 1));
    }

    @Test
    void governingCaseIsTheHighestAndTheFirstOfEquals() {
        double[] left = {100, 180, 90, 180};
        double[] right = {200, 200, 200, 200};
        double[] u = new double[4];
        boolean[] pass = new boolean[4];
        CheckOutcome o = Utilization.evaluate(left, Comparison.LESS_OR_EQUAL, right, 4, u, pass);
        assertTrue(o.pass());
        assertEquals(1, o.governing());
        assertEquals(0.9, o.utilization(), 1e-15);
        assertFalse(o.unbounded());
        assertEquals(0.45, u[2], 1e-15);

        double[] over = {100, 250, 90};
        CheckOutcome f = Utilization.evaluate(over, Comparison.LESS, new double[] {200, 200, 200}, 3, null, pass);
        assertFalse(f.pass());
        assertEquals(1, f.governing());
        assertFalse(pass[1]);
        assertTrue(pass[0]);
        // Pass is the comparison itself: 200 < 200 fails even though the utilization is exactly 1.
        CheckOutcome edge = Utilization.evaluate(new double[] {200}, Comparison.LESS, new double[] {200}, 1, null, null);
        assertFalse(edge.pass());
        assertEquals(1, edge.utilization(), 0);
        CheckOutcome none = Utilization.evaluate(new double[0], Comparison.LESS, new double[0], 0, null, null);
        assertEquals(-1, none.governing());
        assertTrue(none.pass());
        CriterionException e = assertThrows(CriterionException.class, () -> Utilization.evaluate(
                new double[] {1, Double.NaN}, Comparison.LESS, new double[] {2, 2}, 2, null, null));
        assertTrue(e.getMessage().contains("case 1"), e.getMessage());
    }
}
