package org.rosetra.runtime.render.plot;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One member's value in each case, in display units; NaN where the case has no result (the bar
 * is left out, never drawn as zero). An optional limit is drawn as a horizontal line.
 */
public record CaseBars(
    String title, List<String> cases, double[] values, String valueName, String unit,
    Optional<Limit> limit) {

  public CaseBars {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(valueName, "valueName");
    Objects.requireNonNull(unit, "unit");
    Objects.requireNonNull(limit, "limit");
    cases = List.copyOf(cases);
    if (cases.size() != values.length || cases.isEmpty()) {
      throw new IllegalArgumentException("case bars '" + title + "' need one value per case");
    }
    values = values.clone();
  }

  @Override
  public double[] values() {
    return values.clone();
  }
}
