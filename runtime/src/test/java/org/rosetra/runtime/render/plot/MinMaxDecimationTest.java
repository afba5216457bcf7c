package org.rosetra.runtime.render.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

class MinMaxDecimationTest {

  /** The property that makes min/max decimation safe for plotting peaks (common practice). */
  @Property(tries = 200)
  void keepsTheGlobalExtremesAndTheirTimes(
      @ForAll @IntRange(min = 1, max = 5000) int n,
      @ForAll @IntRange(min = 1, max = 300) int columns,
      @ForAll long seed) {
    Random random = new Random(seed);
    double[] t = new double[n];
    double[] v = new double[n];
    double time = 0;
    for (int i = 0; i < n; i++) {
      time += random.nextInt(3) == 0 ? 0 : random.nextDouble(); // repeated times are allowed
      t[i] = time;
      v[i] = random.nextGaussian() * 10 + (random.nextInt(500) == 0 ? 1e3 : 0);
    }
    Decimated d = MinMaxDecimation.decimate(t, v, columns);
    int hi = HistoryFigure.extremes(v)[1];
    int lo = HistoryFigure.extremes(v)[0];
    assertTrue(contains(d, t[hi], v[hi]), "global maximum kept with its time");
    assertTrue(contains(d, t[lo], v[lo]), "global minimum kept with its time");
    assertTrue(d.size() <= Math.max(n, 0) && d.size() <= 2 * columns + 2 || d.size() == n);
    assertEquals(t[0], d.time()[0]);
    assertEquals(t[n - 1], d.time()[d.size() - 1]);
    double[] dt = d.time();
    for (int i = 1; i < dt.length; i++) {
      assertTrue(dt[i] >= dt[i - 1], "time order kept");
    }
  }

  @Test
  void oneBucketKeepsFirstMinimumMaximumLast() {
    double[] t = {0, 1, 2, 3, 4, 5, 6, 7};
    double[] v = {5, 9, 1, 7, 3, 4, 2, 6};
    Decimated d = MinMaxDecimation.decimate(t, v, 1);
    assertArrayEquals(new double[] {0, 1, 2, 7}, d.time());
    assertArrayEquals(new double[] {5, 9, 1, 6}, d.value());
  }

  @Test
  void notFiniteSamplesAreDropped() {
    double[] t = {0, 1, 2, 3};
    double[] v = {Double.NaN, 2, Double.POSITIVE_INFINITY, 3};
    Decimated d = MinMaxDecimation.decimate(t, v, 100);
    assertArrayEquals(new double[] {1, 3}, d.time());
    assertEquals(0, MinMaxDecimation.decimate(new double[] {0}, new double[] {Double.NaN}, 5).size());
  }

  @Test
  void decreasingTimeIsRefused() {
    double[] t = new double[100];
    double[] v = new double[100];
    for (int i = 0; i < 100; i++) {
      t[i] = i;
    }
    t[50] = 10;
    assertThrows(IllegalArgumentException.class, () -> MinMaxDecimation.decimate(t, v, 3));
  }

  @Test
  void theHistoryFigurePlotsThePeak() {
    HistoryFigure fig = PlotSamples.history();
    assertTrue(contains(fig.shown(), 71.234, 191.5));
    assertTrue(contains(fig.shown(), 5.0, -12.25));
    assertTrue(fig.shown().size() <= 2 * HistoryFigure.WIDTH + 2);
  }

  private static boolean contains(Decimated d, double time, double value) {
    double[] t = d.time();
    double[] v = d.value();
    for (int i = 0; i < t.length; i++) {
      if (t[i] == time && v[i] == value) {
        return true;
      }
    }
    return false;
  }
}
