package org.rosetra.runtime.render.record;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One check in the summary: its label, whether it passed, its utilization in the governing case
 * (NaN when the check was defined in no case), the governing case or series, and for a series the
 * time of the governing sample in seconds.
 */
public record CheckLine(
    String label, boolean passed, double utilization, String governing, OptionalDouble atSeconds) {

  public CheckLine {
    Objects.requireNonNull(label, "label");
    Objects.requireNonNull(governing, "governing");
    Objects.requireNonNull(atSeconds, "atSeconds");
  }

  /** A check over load cases (no time). */
  public static CheckLine ofCases(String label, boolean passed, double utilization, String governing) {
    return new CheckLine(label, passed, utilization, governing, OptionalDouble.empty());
  }
}
