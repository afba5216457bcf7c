package org.rosetra.runtime.render.plot;

import java.nio.file.Files;
import java.nio.file.Path;

/** Writes sample figures to target/plot-preview for a person to look at (not a test). */
public final class PlotPreview {
  public static void main(String[] args) throws Exception {
    Path dir = Path.of(args.length > 0 ? args[0] : "target/plot-preview");
    Files.createDirectories(dir);
    for (RenderedFigure f : PlotSamples.all()) {
      Files.write(dir.resolve(f.name() + ".svg"), f.svg());
      Files.write(dir.resolve(f.name() + ".png"), f.png());
    }
  }
}
