package org.rosetra.runtime.render.table;

import java.util.List;
import java.util.Objects;

/** One row: its label (usually a case name) and one cell per column. */
public record Row(String label, List<Cell> cells) {

  public Row {
    Objects.requireNonNull(label, "label");
    cells = List.copyOf(cells);
  }

  public static Row of(String label, Cell... cells) {
    return new Row(label, List.of(cells));
  }
}
