package org.rosetra.runtime.render.plot;

import java.util.Arrays;

/**
 * Thins a long series for plotting without losing its peaks: the time span is cut into one bucket
 * per pixel column, and from each bucket we keep its smallest and its largest sample, in time
 * order (common practice for plotting long signals). The first and last samples are kept too, so
 * the line spans the whole record. The global maximum and minimum, with their times, always
 * survive, because each is the extreme of its own bucket. Samples that are not finite are
 * dropped (they have no place on a plot). Times must not decrease.
 */
public final class MinMaxDecimation {

  private MinMaxDecimation() {}

  public static Decimated decimate(double[] time, double[] value, int columns) {
    if (time.length != value.length) {
      throw new IllegalArgumentException("times and values differ in length");
    }
    if (columns < 1) {
      throw new IllegalArgumentException("need at least one pixel column, got " + columns);
    }
    int n = time.length;
    int[] kept = new int[Math.min(n, 2 * columns + 2)];
    int count = 0;
    int first = nextFinite(time, value, 0);
    if (first < 0) {
      return new Decimated(new double[0], new double[0]);
    }
    int last = first;
    for (int i = n - 1; i > first; i--) {
      if (Double.isFinite(value[i]) && Double.isFinite(time[i])) {
        last = i;
        break;
      }
    }
    double t0 = time[first];
    double span = time[last] - t0;
    if (n <= 2 * columns + 2) {
      for (int i = first; i <= last; i++) {
        if (Double.isFinite(value[i]) && Double.isFinite(time[i])) {
          kept = grow(kept, count);
          kept[count++] = i;
        }
      }
      return pick(time, value, kept, count);
    }
    kept[count++] = first;
    int bucket = -1;
    int lo = -1;
    int hi = -1;
    for (int i = first; i <= last; i++) {
      if (i > first && time[i] < time[i - 1]) {
        throw new IllegalArgumentException("time decreases at sample " + i);
      }
      if (!Double.isFinite(value[i]) || !Double.isFinite(time[i])) {
        continue;
      }
      int b = span > 0 ? (int) Math.min(columns - 1, Math.floor((time[i] - t0) / span * columns)) : 0;
      if (b != bucket) {
        count = emit(kept, count, lo, hi);
        bucket = b;
        lo = i;
        hi = i;
      } else {
        if (value[i] < value[lo]) {
          lo = i;
        }
        if (value[i] > value[hi]) {
          hi = i;
        }
      }
    }
    count = emit(kept, count, lo, hi);
    if (kept[count - 1] != last) {
      kept = grow(kept, count);
      kept[count++] = last;
    }
    return pick(time, value, kept, count);
  }

  private static int emit(int[] kept, int count, int lo, int hi) {
    if (lo < 0) {
      return count;
    }
    int a = Math.min(lo, hi);
    int b = Math.max(lo, hi);
    if (kept[count - 1] != a) {
      kept[count++] = a;
    }
    if (b != a) {
      kept[count++] = b;
    }
    return count;
  }

  private static int[] grow(int[] kept, int count) {
    return count < kept.length ? kept : Arrays.copyOf(kept, Math.max(4, kept.length * 2));
  }

  private static int nextFinite(double[] time, double[] value, int from) {
    for (int i = from; i < value.length; i++) {
      if (Double.isFinite(value[i]) && Double.isFinite(time[i])) {
        return i;
      }
    }
    return -1;
  }

  private static Decimated pick(double[] time, double[] value, int[] kept, int count) {
    double[] t = new double[count];
    double[] v = new double[count];
    for (int k = 0; k < count; k++) {
      t[k] = time[kept[k]];
      v[k] = value[kept[k]];
    }
    return new Decimated(t, v);
  }
}
