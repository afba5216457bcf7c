package org.rosetra.runtime.render.plot;

import java.awt.Font;
import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The one typeface every figure uses, loaded from a font file on the class path.
 *
 * <p>A figure laid out with the host's fonts would change from machine to machine (text widths
 * move the axes, glyph outlines change the SVG paths), so we never ask the host for a font. The
 * first file found wins: our own copy under {@code /org/rosetra/runtime/render/fonts/}, if the
 * project ships one, otherwise the Liberation Sans (SIL Open Font License) that PDFBox, a
 * dependency of XChart, carries. Only if neither is present do we fall back to the logical font
 * "SansSerif", and {@link #isEmbedded()} says so.
 */
public final class PlotFont {

  private static final String[] CANDIDATES = {
    "/org/rosetra/runtime/render/fonts/PlotSans-Regular.ttf",
    "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf",
  };

  private static final Font BASE = load();

  private PlotFont() {}

  /** The typeface at the given size in points (plain weight). */
  public static Font ofSize(float size) {
    return BASE.deriveFont(Font.PLAIN, size);
  }

  /** True when the typeface came from a file we control, so layout does not depend on the host. */
  public static boolean isEmbedded() {
    return !BASE.getFamily(java.util.Locale.ROOT).equals(Font.SANS_SERIF)
        && !BASE.getName().equals(Font.SANS_SERIF);
  }

  /** Name of the loaded typeface, for the record and for tests. */
  public static String familyName() {
    return BASE.getFamily(java.util.Locale.ROOT);
  }

  private static Font load() {
    for (String path : CANDIDATES) {
      try (InputStream in = PlotFont.class.getResourceAsStream(path)) {
        if (in != null) {
          return Font.createFont(Font.TRUETYPE_FONT, in);
        }
      } catch (FontFormatException e) {
        // A damaged file is skipped in favour of the next candidate.
      } catch (IOException e) {
        throw new UncheckedIOException("cannot read the plot font " + path, e);
      }
    }
    return new Font(Font.SANS_SERIF, Font.PLAIN, 12);
  }
}
