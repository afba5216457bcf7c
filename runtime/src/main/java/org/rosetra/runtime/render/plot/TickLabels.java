package org.rosetra.runtime.render.plot;

import java.math.BigDecimal;
import java.math.MathContext;

/** Axis tick labels: the tick value with at most six significant digits, no exponent, no "-0". */
final class TickLabels {

  private TickLabels() {}

  static String of(double value) {
    if (!Double.isFinite(value)) {
      return "";
    }
    BigDecimal d = new BigDecimal(value).round(new MathContext(6));
    // Tick values are sums of a step, so 0.30000000000000004 must read 0.3 and 1e-17 must read 0.
    if (d.abs().compareTo(new BigDecimal("1e-12")) < 0) {
      return "0";
    }
    return d.stripTrailingZeros().toPlainString();
  }
}
