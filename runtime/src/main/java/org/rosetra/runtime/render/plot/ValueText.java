package org.rosetra.runtime.render.plot;

import org.rosetra.runtime.render.table.ColumnFormat;

/** A single value as the tables would print it (four significant digits, Locale.ROOT). */
final class ValueText {

  private ValueText() {}

  static String of(double value) {
    return ColumnFormat.forMagnitude(Math.abs(value)).format(value);
  }
}
