package org.rosetra.runtime.render.record;

import java.util.Objects;

/** An input file (the script, a data file, a module) as a path relative to the script, and its SHA-256. */
public record InputFile(String path, String sha256) {

  public InputFile {
    Objects.requireNonNull(path, "path");
    Objects.requireNonNull(sha256, "sha256");
  }
}
