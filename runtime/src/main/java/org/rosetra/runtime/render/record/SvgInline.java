package org.rosetra.runtime.render.record;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns a standalone SVG file into markup for inline use in HTML: the XML declaration and the
 * DOCTYPE go (HTML parses inline SVG without them, and the DOCTYPE names an outside address),
 * so do the namespace attributes (implied in HTML), and every id gets the figure's prefix so two
 * figures' clip paths cannot collide in one page.
 */
final class SvgInline {

  private static final Pattern PROLOG = Pattern.compile("(?s)\\A.*?(?=<svg[\\s>])");
  private static final Pattern NAMESPACES = Pattern.compile("\\s+xmlns(:xlink)?=\"[^\"]*\"");
  private static final Pattern IDS = Pattern.compile("(id=\"|url\\(#|href=\"#)([A-Za-z][\\w.-]*)");

  private SvgInline() {}

  static String forHtml(String svg, String idPrefix, String label) {
    String body = PROLOG.matcher(svg).replaceFirst("");
    body = NAMESPACES.matcher(body).replaceAll("");
    Matcher m = IDS.matcher(body);
    StringBuilder sb = new StringBuilder(body.length() + 256);
    while (m.find()) {
      m.appendReplacement(sb, Matcher.quoteReplacement(m.group(1) + idPrefix + "-" + m.group(2)));
    }
    m.appendTail(sb);
    String labelled = "<svg role=\"img\" aria-label=\"" + org.rosetra.runtime.render.text.HtmlText.escape(label) + "\"";
    return sb.toString().replaceFirst("\\A<svg", Matcher.quoteReplacement(labelled)).strip() + "\n";
  }
}
