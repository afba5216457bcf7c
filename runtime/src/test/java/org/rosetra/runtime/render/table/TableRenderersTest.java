package org.rosetra.runtime.render.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TableRenderersTest {

  private final ResultTable table = TableFixtures.bracket();

  @Test
  void plainTextIsAlignedWithADashForNoResult() {
    String expected =
        String.join(
            "\n",
            "Bracket B-7, rosette r1",
            "case      eps_1 [µε]  sigma_1 [MPa]  utilization  verdict",
            "--------  ----------  -------------  -----------  ------------------------",
            "lift_2t        412.3           84.5       0.3613  pass",
            "lift_4t        -38.1          169.0       0.7200  pass",
            "overload           —              —            —  no result, \"r1\" not read",
            "");
    assertEquals(expected, PlainTextTable.render(table));
  }

  @Test
  void csvFollowsRfc4180() {
    // RFC 4180 section 2: CRLF line breaks (rule 1), a header line (rule 3), fields with commas
    // or quotes enclosed in double quotes (rule 6) with inner quotes doubled (rule 7).
    String expected =
        "case,eps_1 [µε],sigma_1 [MPa],utilization,verdict\r\n"
            + "lift_2t,412.3,84.5,0.3613,pass\r\n"
            + "lift_4t,-38.1,169.0,0.7200,pass\r\n"
            + "overload,,,,\"no result, \"\"r1\"\" not read\"\r\n";
    assertEquals(expected, CsvTable.render(table));
  }

  @Test
  void csvQuotesLineBreaksAndLeavesPlainFieldsAlone() {
    // RFC 4180 section 2, rule 6: CR and LF inside a field need quotes too.
    assertEquals("\"a\nb\"", CsvTable.field("a\nb"));
    assertEquals("\"a\rb\"", CsvTable.field("a\rb"));
    assertEquals("plain", CsvTable.field("plain"));
    assertEquals("\"\"\"\"", CsvTable.field("\""));
  }

  @Test
  void htmlEscapesTextAndMarksNumbers() {
    ResultTable hostile =
        new ResultTable(
            "<script>alert(1)</script> & co",
            java.util.List.of(new Column("a<b", "N/mm^2")),
            java.util.List.of(Row.of("x\"y", Cell.text("<img src=x>"))));
    String html = HtmlTable.render(hostile);
    assertFalse(html.contains("<script>"));
    assertFalse(html.contains("<img"));
    assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt; &amp; co"));
    assertTrue(html.contains("x&quot;y"));

    String normal = HtmlTable.render(table);
    assertTrue(normal.contains("<td class=\"num\">412.3</td>"));
    assertTrue(normal.contains("<td class=\"num absent\">—</td>"));
    assertTrue(normal.contains("sigma_1 <span class=\"unit\">[MPa]</span>"));
    assertFalse(normal.contains("NaN"));
  }

  @Test
  void markdownEscapesPipesAndUnderscores() {
    String md = MarkdownTable.render(table);
    assertTrue(md.startsWith("**Bracket B-7, rosette r1**\n\n"));
    assertTrue(md.contains("| case | eps\\_1 \\[µε] | sigma\\_1 \\[MPa] | utilization | verdict |"));
    assertTrue(md.contains("| :--- | ---: | ---: | ---: | :--- |")); // the text column to the left
    assertTrue(md.contains("| overload | — | — | — | no result, \"r1\" not read |"));
    ResultTable pipes =
        new ResultTable("t", java.util.List.of(Column.unitless("a|b")), java.util.List.of(Row.of("r", Cell.text("x|y"))));
    assertTrue(MarkdownTable.render(pipes).contains("| r | x\\|y |"));
  }

  @Test
  void everyRendererIsDeterministic() {
    assertEquals(PlainTextTable.render(table), PlainTextTable.render(TableFixtures.bracket()));
    assertEquals(CsvTable.render(table), CsvTable.render(TableFixtures.bracket()));
    assertEquals(HtmlTable.render(table), HtmlTable.render(TableFixtures.bracket()));
    assertEquals(MarkdownTable.render(table), MarkdownTable.render(TableFixtures.bracket()));
  }
}
