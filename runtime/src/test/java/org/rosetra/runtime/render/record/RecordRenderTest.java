package org.rosetra.runtime.render.record;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class RecordRenderTest {

  private static final CalculationRecord record = RecordSamples.survey(true); // rendered once: figures are slow-ish

  @Test
  void renderingTwiceGivesTheSameText() {
    assertEquals(HtmlRecord.render(record), HtmlRecord.render(RecordSamples.survey(true)));
    assertEquals(MarkdownRecord.render(record), MarkdownRecord.render(RecordSamples.survey(true)));
  }

  @Test
  void theHtmlLoadsNothingFromOutside() {
    String html = HtmlRecord.render(record).toLowerCase(Locale.ROOT);
    assertFalse(html.contains("http://"), "no http address");
    assertFalse(html.contains("https://"), "no https address");
    assertFalse(html.contains("<link"), "no linked style sheet or font");
    assertFalse(html.contains("<script"), "no script at all");
    assertFalse(html.contains("src="), "no src attribute");
    assertFalse(html.contains("@import"), "no imported style");
    assertFalse(html.contains("@font-face"), "no web font");
    // url( is allowed only for a fragment inside the page (an inline SVG clip path).
    Matcher url = Pattern.compile("url\\(\\s*(.)").matcher(html);
    while (url.find()) {
      assertEquals("#", url.group(1), "url( must point inside the page");
    }
  }

  @Test
  void inlineFiguresHaveUniqueIdsThatResolve() {
    String html = HtmlRecord.render(record);
    Set<String> ids = new HashSet<>();
    Matcher m = Pattern.compile("id=\"([^\"]+)\"").matcher(html);
    while (m.find()) {
      assertTrue(ids.add(m.group(1)), "duplicate id " + m.group(1));
    }
    Matcher ref = Pattern.compile("url\\(#([^)]+)\\)").matcher(html);
    int refs = 0;
    while (ref.find()) {
      refs++;
      assertTrue(ids.contains(ref.group(1)), "dangling reference " + ref.group(1));
    }
    assertTrue(refs > 0);
  }

  @Test
  void inlineFiguresStayWellFormed() throws Exception {
    String html = HtmlRecord.render(record);
    Matcher svg = Pattern.compile("(?s)<svg role=\"img\".*?</svg>").matcher(html);
    int figures = 0;
    while (svg.find()) {
      figures++;
      // XML 1.0 well-formedness through the JDK's parser; no DTD, no outside entity is read.
      var factory = javax.xml.parsers.DocumentBuilderFactory.newInstance();
      factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
      var doc = factory.newDocumentBuilder()
          .parse(new java.io.ByteArrayInputStream(svg.group().getBytes(java.nio.charset.StandardCharsets.UTF_8)));
      assertEquals("svg", doc.getDocumentElement().getTagName());
    }
    assertEquals(3, figures);
  }

  @Test
  void theRecordFollowsItsOrderAndCarriesTheCaution() {
    String html = HtmlRecord.render(record);
    String[] order = {
      "<h1>", "class=\"caution\"", "id=\"checks\"", "id=\"declarations\"", "id=\"corrections\"",
      "id=\"outputs\"", "id=\"series\"", "id=\"script\"", "id=\"inputs\"", "<footer>"
    };
    int at = -1;
    for (String marker : order) {
      int next = html.indexOf(marker);
      assertTrue(next > at, marker + " out of order");
      at = next;
    }
    assertTrue(html.contains(Caution.TEXT));
    assertTrue(MarkdownRecord.render(record).contains(Caution.TEXT.replace(".", ".")));
    assertTrue(html.contains("qualified engineer"));
    assertTrue(html.contains("code of practice"));
  }

  @Test
  void printingKeepsTablesAndFiguresWhole() {
    String html = HtmlRecord.render(record);
    assertTrue(html.contains("@page { size: auto;"));
    assertTrue(html.contains("table, figure, .caution { break-inside: avoid;"));
  }

  @Test
  void textIsEscapedAndMissingValuesAreDashes() {
    String html = HtmlRecord.render(record);
    assertFalse(html.contains("<b>not bold</b>"));
    assertTrue(html.contains("&lt;b&gt;not bold&lt;/b&gt; &amp; &quot;quoted&quot;"));
    assertFalse(html.contains("NaN"));
    assertFalse(MarkdownRecord.render(record).contains("NaN"));
    assertTrue(html.contains("<td class=\"num absent\">—</td>"));
  }

  @Test
  void theScriptIsNumberedLineByLine() {
    String html = HtmlRecord.render(record);
    assertTrue(html.contains("<span class=\"ln\">1  </span>title &quot;Hoist beam HB-3"));
    assertTrue(html.contains("<span class=\"ln\">9  </span>plot mohr web_top[proof_60kN]"));
    assertFalse(html.contains("<span class=\"ln\">10"));
    String md = MarkdownRecord.render(record);
    assertTrue(md.contains("\n1  title \"Hoist beam HB-3, proof load survey\"\n"));
  }

  @Test
  void markdownLinksFiguresAndTables() {
    String md = MarkdownRecord.render(record);
    assertTrue(md.contains("](plots/mohr-web_top-proof_60kN.svg)"));
    assertTrue(md.contains("](plots/mohr-web_top-proof_60kN.png)"));
    assertTrue(md.contains("](tables/web_top.csv)"));
    assertTrue(md.contains("| run peak <= allowable | FAIL | 1.043 | hoist\\_run | 71.23 |")
        || md.contains("| run peak \\<= allowable | FAIL | 1.043 | hoist\\_run | 71.23 |"), md);
  }
}
