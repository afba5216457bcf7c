package org.rosetra.runtime.render.record;

import java.util.Objects;

/** One declared property as the script gives it: key, value written out, unit label. */
public record Property(String key, String value, String unit) {

  public Property {
    Objects.requireNonNull(key, "key");
    Objects.requireNonNull(value, "value");
    unit = unit == null ? "" : unit;
  }
}
