package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The mergeable accumulators, checked against values worked out in the test: a plain scan
 * for extremes, BigDecimal for exact sums, and merging at every split point against one pass.
 */
class AccumulatorsTest {

    private static double[] times(int n) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.001;
        }
        return t;
    }

    @Test
    void extremesKeepTheEarliestTimeOfATie() {
        double[] v = {3, 7, 1, 7, -2, 5, -2};
        Extremes e = new Extremes();
        e.add(v, times(v.length), v.length);
        // Worked by hand: max 7 first at index 1, min -2 first at index 4.
        assertEquals(7, e.max());
        assertEquals(0.001, e.timeOfMax());
        assertEquals(-2, e.min());
        assertEquals(0.004, e.timeOfMin());
        assertEquals(7, e.count());
    }

    @Test
    void extremesMergedAtEverySplitEqualOnePass() {
        Random random = new Random(3);
        double[] v = new double[200];
        for (int i = 0; i < v.length; i++) {
            v[i] = random.nextInt(9) - 4; // many ties
        }
        v[50] = Double.NaN;
        double[] t = times(v.length);
        Extremes whole = new Extremes();
        whole.add(v, t, v.length);
        for (int split = 0; split <= v.length; split++) {
            Extremes a = new Extremes();
            Extremes b = new Extremes();
            a.add(Arrays.copyOfRange(v, 0, split), Arrays.copyOfRange(t, 0, split), split);
            b.add(Arrays.copyOfRange(v, split, v.length), Arrays.copyOfRange(t, split, v.length), v.length - split);
            Extremes merged = a.merge(b);
            assertEquals(whole.toString(), merged.toString(), "split at " + split);
        }
        assertEquals(1, whole.notNumbers());
        assertEquals(4, whole.max());
        assertEquals(-4, whole.min());
    }

    @Test
    void extremesOfOnlyNotNumbersStayUndefined() {
        Extremes e = new Extremes();
        e.add(new double[] {Double.NaN, Double.NaN}, times(2), 2);
        assertTrue(Double.isNaN(e.max()));
        assertEquals(2, e.notNumbers());
        Extremes later = new Extremes();
        later.add(new double[] {-1}, new double[] {5}, 1);
        e.merge(later);
        assertEquals(-1, e.max());
        assertEquals(5, e.timeOfMin());
    }

    @Test
    void exactSumIsTheCorrectlyRoundedSumInAnyOrder() {
        Random random = new Random(5);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + random.nextInt(300);
            double[] x = new double[n];
            BigDecimal exact = BigDecimal.ZERO;
            for (int i = 0; i < n; i++) {
                x[i] = random.nextGaussian() * Math.pow(10, random.nextInt(30) - 15) * (random.nextBoolean() ? 1 : -1);
                exact = exact.add(new BigDecimal(x[i]));
            }
            // Reference: BigDecimal holds every double exactly; doubleValue() rounds once.
            double expected = exact.doubleValue();
            ExactSum forward = new ExactSum();
            for (double d : x) {
                forward.add(d);
            }
            ExactSum left = new ExactSum();
            ExactSum right = new ExactSum();
            int split = random.nextInt(n + 1);
            for (int i = n - 1; i >= 0; i--) {
                (i < split ? left : right).add(x[i]);
            }
            assertEquals(expected, forward.value(), 0.0, "trial " + trial);
            assertEquals(expected, left.add(right).value(), 0.0, "trial " + trial + " merged");
        }
    }

    @Test
    void exactSumOfTermsThatCancel() {
        // Common practice example: naive summation of 1e100, 1, -1e100 gives 0; the exact sum is 1.
        ExactSum s = new ExactSum();
        s.add(1e100);
        s.add(1.0);
        s.add(-1e100);
        assertEquals(1.0, s.value());
        s.add(Double.POSITIVE_INFINITY);
        assertEquals(Double.POSITIVE_INFINITY, s.value());
    }

    @Test
    void windowMeanTakesSamplesInTheClosedWindowOnly() {
        double[] t = {0.0, 0.5, 1.0, 1.5, 2.0, 2.5};
        double[] v = {1, 2, 3, 4, 5, 100};
        WindowMean first = new WindowMean(0.5, 2.0);
        WindowMean second = new WindowMean(0.5, 2.0);
        first.add(Arrays.copyOfRange(v, 0, 3), Arrays.copyOfRange(t, 0, 3), 3);
        second.add(Arrays.copyOfRange(v, 3, 6), Arrays.copyOfRange(t, 3, 6), 3);
        WindowMean merged = first.merge(second);
        // By hand: samples at 0.5, 1.0, 1.5, 2.0 -> (2 + 3 + 4 + 5) / 4 = 3.5.
        assertEquals(4, merged.count());
        assertEquals(3.5, merged.mean());
        assertThrows(IllegalStateException.class, () -> new WindowMean(10, 11).mean());
        assertThrows(IllegalArgumentException.class, () -> new WindowMean(2, 1));
    }

    @Test
    void plausibilityFlagRecordsCountFirstLastAndWorst() {
        double[] t = {0, 1, 2, 3, 4, 5};
        double[] v = {10, 60_000, -70_000, 20, 55_000, 70_000};
        PlausibilityFlag whole = new PlausibilityFlag(50_000);
        whole.add(v, t, v.length);
        // By hand: 4 readings beyond 50,000 in magnitude, at times 1, 2, 4, 5; worst -70,000 first at 2.
        assertTrue(whole.raised());
        assertEquals(4, whole.count());
        assertEquals(1, whole.firstTime());
        assertEquals(5, whole.lastTime());
        assertEquals(-70_000, whole.worst());
        assertEquals(2, whole.timeOfWorst());
        for (int split = 0; split <= v.length; split++) {
            PlausibilityFlag a = new PlausibilityFlag(50_000);
            PlausibilityFlag b = new PlausibilityFlag(50_000);
            a.add(Arrays.copyOfRange(v, 0, split), Arrays.copyOfRange(t, 0, split), split);
            b.add(Arrays.copyOfRange(v, split, 6), Arrays.copyOfRange(t, split, 6), 6 - split);
            a.merge(b);
            assertEquals(4, a.count());
            assertEquals(1, a.firstTime());
            assertEquals(5, a.lastTime());
            assertEquals(-70_000, a.worst(), "split " + split);
            assertEquals(2, a.timeOfWorst(), "split " + split);
        }
        PlausibilityFlag quiet = new PlausibilityFlag(50_000);
        quiet.add(new double[] {49_999.99}, new double[] {0}, 1);
        assertFalse(quiet.raised());
    }
}
