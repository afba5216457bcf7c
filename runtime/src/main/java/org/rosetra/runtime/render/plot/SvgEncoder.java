package org.rosetra.runtime.render.plot;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes a {@link Painting} as SVG through VectorGraphics2D, the library XChart uses for vectors.
 *
 * <p>XChart draws all its text as glyph outlines, so the file has no font reference and looks the
 * same everywhere. VectorGraphics2D writes coordinates with up to 15 decimals; we round them to
 * three (a thousandth of a pixel), which keeps the files small and diffs quiet.
 */
public final class SvgEncoder {

  private static final Pattern LONG_DECIMAL = Pattern.compile("-?\\d+\\.\\d{4,}");

  private SvgEncoder() {}

  public static byte[] encode(Painting painting) {
    VectorGraphics2D g = new VectorGraphics2D();
    painting.paint(g);
    g.dispose();
    var document =
        new SVGProcessor()
            .getDocument(g.getCommands(), new PageSize(0, 0, painting.width(), painting.height()));
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      document.writeTo(out);
    } catch (IOException e) {
      throw new UncheckedIOException(e); // an in-memory stream does not fail
    }
    String svg = out.toString(StandardCharsets.UTF_8);
    return renumberClips(shortenDecimals(asciiDigits(svg))).getBytes(StandardCharsets.UTF_8);
  }

  /**
   * VectorGraphics2D writes colours with String.format in the default locale, which in a few
   * locales uses other digits. Our SVG holds no text, only numbers, so mapping every decimal
   * digit to ASCII is safe and makes the file independent of the locale.
   */
  static String asciiDigits(String svg) {
    StringBuilder sb = null;
    for (int i = 0; i < svg.length(); i++) {
      char c = svg.charAt(i);
      if (c > 127 && Character.isDigit(c)) {
        if (sb == null) {
          sb = new StringBuilder(svg);
        }
        sb.setCharAt(i, (char) ('0' + Character.digit(c, 10)));
      }
    }
    return sb == null ? svg : sb.toString();
  }

  private static final Pattern CLIP_ID = Pattern.compile("id=\"(clip-?\\d+)\"");

  /**
   * VectorGraphics2D names clip paths after a hash of their shape; we number them in order of
   * appearance instead ({@code clip1}, {@code clip2}, ...), so ids never depend on hashing.
   */
  static String renumberClips(String svg) {
    Matcher m = CLIP_ID.matcher(svg);
    java.util.Map<String, String> names = new java.util.LinkedHashMap<>();
    while (m.find()) {
      names.putIfAbsent(m.group(1), "clip" + (names.size() + 1));
    }
    if (names.isEmpty()) {
      return svg;
    }
    Pattern ref = Pattern.compile("(id=\"|url\\(#)(clip-?\\d+)([\")])");
    Matcher r = ref.matcher(svg);
    StringBuilder sb = new StringBuilder(svg.length());
    while (r.find()) {
      String renamed = names.getOrDefault(r.group(2), r.group(2));
      r.appendReplacement(sb, Matcher.quoteReplacement(r.group(1) + renamed + r.group(3)));
    }
    r.appendTail(sb);
    return sb.toString();
  }

  /** Rounds every number with more than three decimals to three, half up, dropping trailing zeros. */
  static String shortenDecimals(String svg) {
    Matcher m = LONG_DECIMAL.matcher(svg);
    StringBuilder sb = new StringBuilder(svg.length());
    while (m.find()) {
      BigDecimal rounded = new BigDecimal(m.group()).setScale(3, RoundingMode.HALF_UP);
      String text = rounded.signum() == 0 ? "0" : rounded.stripTrailingZeros().toPlainString();
      m.appendReplacement(sb, text);
    }
    m.appendTail(sb);
    return sb.toString();
  }
}
