package org.rosetra.runtime.render.table;

/** One cell of a result table: a number in display units, a piece of text, or no result. */
public sealed interface Cell permits Cell.Number, Cell.Text, Cell.Absent {

  /** A number already converted to the column's display unit. */
  record Number(double value) implements Cell {
    public Number {
      if (!Double.isFinite(value)) {
        throw new IllegalArgumentException("a number cell must be finite; use Cell.absent()");
      }
    }
  }

  /** Text such as "pass" or a case name. */
  record Text(String text) implements Cell {
    public Text {
      java.util.Objects.requireNonNull(text, "text");
    }
  }

  /** No result in this case (for instance a rosette not read in it): never zero, never NaN. */
  record Absent() implements Cell {}

  /** A number, or {@link #absent()} when the value is NaN or infinite. */
  static Cell of(double value) {
    return Double.isFinite(value) ? new Number(value) : absent();
  }

  static Cell text(String text) {
    return new Text(text);
  }

  static Cell absent() {
    return new Absent();
  }
}
