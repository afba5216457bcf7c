package org.rosetra.runtime.render.plot;

import java.util.regex.Pattern;

/** File stems for outputs: letters, digits, '-', '_', '.', so names are safe on every file system. */
public final class FileStem {

  private static final Pattern SAFE = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,119}");

  private FileStem() {}

  public static String require(String stem) {
    if (stem == null || !SAFE.matcher(stem).matches() || stem.contains("..")) {
      throw new IllegalArgumentException(
          "not a safe file name for an output: '" + stem
              + "' (use letters, digits, '-', '_' and '.', at most 120)");
    }
    return stem;
  }

  /** Turns any label into a safe stem: other characters become '_'. */
  public static String from(String label) {
    String s = label.replaceAll("[^A-Za-z0-9._-]", "_").replaceAll("\\.{2,}", ".");
    if (s.isEmpty() || !Character.isLetterOrDigit(s.charAt(0))) {
      s = "f" + s;
    }
    return s.length() > 120 ? s.substring(0, 120) : s;
  }
}
