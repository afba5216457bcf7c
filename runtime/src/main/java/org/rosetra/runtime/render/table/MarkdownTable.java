package org.rosetra.runtime.render.table;

import static org.rosetra.runtime.render.text.MarkdownText.escape;

import java.util.List;

/** A table as a GitHub-flavoured Markdown table, its title in bold above it, numbers to the right. */
public final class MarkdownTable {

  private MarkdownTable() {}

  public static String render(ResultTable table) {
    List<List<String>> body = CellText.of(table, CellText.ABSENT);
    StringBuilder sb = new StringBuilder();
    if (!table.title().isEmpty()) {
      sb.append("**").append(escape(table.title())).append("**\n\n");
    }
    sb.append("| ").append(escape(table.rowHeader()));
    for (Column c : table.columns()) {
      sb.append(" | ").append(escape(c.label()));
    }
    sb.append(" |\n| :---");
    for (int i = 0; i < table.columns().size(); i++) {
      boolean numeric = table.column(i).stream().anyMatch(c -> c instanceof Cell.Number);
      sb.append(numeric ? " | ---:" : " | :---"); // numbers to the right, text to the left
    }
    sb.append(" |\n");
    for (int r = 0; r < body.size(); r++) {
      sb.append("| ").append(escape(table.rows().get(r).label()));
      for (String text : body.get(r)) {
        sb.append(" | ").append(escape(text));
      }
      sb.append(" |\n");
    }
    return sb.toString();
  }
}
