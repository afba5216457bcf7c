package org.rosetra.runtime.render.plot;

import java.util.Objects;
import java.util.Optional;

/** One value against time over a measured series, in display units, with an optional limit. */
public record History(
    String title,
    double[] time,
    double[] value,
    String timeUnit,
    String valueName,
    String valueUnit,
    Optional<Limit> limit) {

  public History {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(timeUnit, "timeUnit");
    Objects.requireNonNull(valueName, "valueName");
    Objects.requireNonNull(valueUnit, "valueUnit");
    Objects.requireNonNull(limit, "limit");
    if (time.length != value.length) {
      throw new IllegalArgumentException("history '" + title + "': times and values differ in length");
    }
    time = time.clone();
    value = value.clone();
  }

  @Override
  public double[] time() {
    return time.clone();
  }

  @Override
  public double[] value() {
    return value.clone();
  }
}
