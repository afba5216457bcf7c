package org.rosetra.runtime.render.text;

import java.util.Locale;

/**
 * A utilization as a reviewer reads it: three decimals, rounded up, so a check that fails by a
 * hair never shows a figure within its limit (1.0000004 shows as 1.001, not 1.000).
 */
public final class UtilizationText {
  private UtilizationText() {}

  public static String of(double utilization) {
    if (Double.isNaN(utilization)) {
      return "—";
    }
    if (Double.isInfinite(utilization)) {
      return utilization > 0 ? "unbounded" : "-unbounded";
    }
    double up = Math.ceil(utilization * 1000 - 1e-9) / 1000;
    return String.format(Locale.ROOT, "%.3f", up == 0 ? 0.0 : up);
  }
}
