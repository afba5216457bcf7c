package org.rosetra.runtime.render.record;

import java.util.Objects;

/** A measured series as read: its file and digest, row count, time span and the zero used. */
public record SeriesInput(
    String name, String file, String sha256, long rows, double timeStart, double timeEnd,
    String timeUnit, String zero) {

  public SeriesInput {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(sha256, "sha256");
    Objects.requireNonNull(timeUnit, "timeUnit");
    zero = zero == null || zero.isEmpty() ? "none" : zero;
  }
}
