package org.rosetra.runtime.render.table;

import static org.rosetra.runtime.render.text.HtmlText.escape;

import java.util.List;

/** A table as an HTML {@code <table>} with a caption, header cells with units, numbers to the right. */
public final class HtmlTable {

  private HtmlTable() {}

  public static String render(ResultTable table) {
    List<List<String>> body = CellText.of(table, CellText.ABSENT);
    StringBuilder sb = new StringBuilder();
    sb.append("<table class=\"result-table\">\n");
    if (!table.title().isEmpty()) {
      sb.append("<caption>").append(escape(table.title())).append("</caption>\n");
    }
    sb.append("<thead><tr><th scope=\"col\">").append(escape(table.rowHeader())).append("</th>");
    for (Column c : table.columns()) {
      sb.append("<th scope=\"col\">").append(escape(c.header()));
      if (!c.unit().isEmpty()) {
        sb.append(" <span class=\"unit\">[").append(escape(c.unit())).append("]</span>");
      }
      sb.append("</th>");
    }
    sb.append("</tr></thead>\n<tbody>\n");
    for (int r = 0; r < body.size(); r++) {
      Row row = table.rows().get(r);
      sb.append("<tr><th scope=\"row\">").append(escape(row.label())).append("</th>");
      for (int c = 0; c < body.get(r).size(); c++) {
        Cell cell = row.cells().get(c);
        String kind =
            cell instanceof Cell.Number ? "num" : cell instanceof Cell.Absent ? "num absent" : "text";
        sb.append("<td class=\"").append(kind).append("\">")
            .append(escape(body.get(r).get(c))).append("</td>");
      }
      sb.append("</tr>\n");
    }
    sb.append("</tbody>\n</table>\n");
    return sb.toString();
  }
}
