package org.rosetra.runtime.render.table;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;

/**
 * How the numbers of one column are written, chosen once per column so the decimal points line
 * up and every renderer prints the same digits.
 *
 * <p>The rule: the column's largest magnitude gets four significant digits, and every other
 * number in the column gets the same count of decimals. So 412.3 and -38.06 µε print as
 * {@code 412.3} and {@code -38.1}; a utilization of 0.3613 prints as {@code 0.3613}. At most six
 * decimals. A column whose largest magnitude is 10^6 or more, or below 10^-3 (not zero), is
 * written in scientific notation with four significant digits ({@code 2.050e+05}). Rounding is
 * half up on the exact binary value, with Locale.ROOT; negative zero prints as zero.
 */
public final class ColumnFormat {

  static final int SIGNIFICANT = 4;
  static final int MAX_DECIMALS = 6;

  private final int decimals; // -1 means scientific notation

  private ColumnFormat(int decimals) {
    this.decimals = decimals;
  }

  /** The format for a column holding these cells (text and absent cells do not count). */
  public static ColumnFormat forCells(List<Cell> cells) {
    double maxAbs = 0;
    for (Cell c : cells) {
      if (c instanceof Cell.Number n) {
        maxAbs = Math.max(maxAbs, Math.abs(n.value()));
      }
    }
    return forMagnitude(maxAbs);
  }

  public static ColumnFormat forMagnitude(double maxAbs) {
    if (maxAbs == 0) {
      return new ColumnFormat(0);
    }
    if (maxAbs >= 1e6 || maxAbs < 1e-3) {
      return new ColumnFormat(-1);
    }
    int exponent = new BigDecimal(maxAbs).precision() - new BigDecimal(maxAbs).scale() - 1;
    int d = SIGNIFICANT - 1 - exponent;
    return new ColumnFormat(Math.max(0, Math.min(MAX_DECIMALS, d)));
  }

  /** Decimals written after the point, or -1 for scientific notation. */
  public int decimals() {
    return decimals;
  }

  public String format(double value) {
    if (decimals < 0) {
      return String.format(Locale.ROOT, "%." + (SIGNIFICANT - 1) + "e", value == 0 ? 0.0 : value);
    }
    BigDecimal rounded = new BigDecimal(value).setScale(decimals, RoundingMode.HALF_UP);
    if (rounded.signum() == 0) {
      rounded = rounded.abs();
    }
    return rounded.toPlainString();
  }
}
