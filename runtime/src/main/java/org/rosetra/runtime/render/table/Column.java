package org.rosetra.runtime.render.table;

import java.util.Objects;

/** A value column: its header (a member name such as {@code sigma_1}) and its unit label. */
public record Column(String header, String unit) {

  public Column {
    Objects.requireNonNull(header, "header");
    unit = unit == null ? "" : unit;
  }

  /** A column of pure numbers or text, with no unit. */
  public static Column unitless(String header) {
    return new Column(header, "");
  }

  /** The header with its unit in brackets, {@code sigma_1 [MPa]}, or the bare header. */
  public String label() {
    return unit.isEmpty() ? header : header + " [" + unit + "]";
  }
}
