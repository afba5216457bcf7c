package org.rosetra.runtime.render.plot;

import java.util.Objects;

/** A check's limit drawn as a horizontal line: its label and its value in the plot's unit. */
public record Limit(String label, double value) {

  public Limit {
    Objects.requireNonNull(label, "label");
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException("limit '" + label + "' must be finite");
    }
  }
}
