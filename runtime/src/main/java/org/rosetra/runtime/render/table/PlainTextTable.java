package org.rosetra.runtime.render.table;

import java.util.ArrayList;
import java.util.List;

/** A table as aligned plain text for a terminal: labels and text to the left, numbers to the right. */
public final class PlainTextTable {

  private static final String GAP = "  ";

  private PlainTextTable() {}

  public static String render(ResultTable table) {
    List<List<String>> body = CellText.of(table, CellText.ABSENT);
    List<String> header = new ArrayList<>();
    header.add(table.rowHeader());
    table.columns().forEach(c -> header.add(c.label()));

    int[] widths = new int[header.size()];
    for (int i = 0; i < widths.length; i++) {
      widths[i] = width(header.get(i));
    }
    for (int r = 0; r < body.size(); r++) {
      widths[0] = Math.max(widths[0], width(table.rows().get(r).label()));
      for (int c = 0; c < body.get(r).size(); c++) {
        widths[c + 1] = Math.max(widths[c + 1], width(body.get(r).get(c)));
      }
    }

    boolean[] leftAligned = new boolean[widths.length];
    leftAligned[0] = true;
    for (int c = 0; c < table.columns().size(); c++) {
      leftAligned[c + 1] = table.column(c).stream().noneMatch(cell -> cell instanceof Cell.Number);
    }

    StringBuilder sb = new StringBuilder();
    if (!table.title().isEmpty()) {
      sb.append(table.title()).append('\n');
    }
    appendLine(sb, header, widths, leftAligned);
    List<String> rule = new ArrayList<>();
    for (int w : widths) {
      rule.add("-".repeat(w));
    }
    appendLine(sb, rule, widths, leftAligned);
    for (int r = 0; r < body.size(); r++) {
      List<String> line = new ArrayList<>();
      line.add(table.rows().get(r).label());
      line.addAll(body.get(r));
      appendLine(sb, line, widths, leftAligned);
    }
    return sb.toString();
  }

  private static void appendLine(
      StringBuilder sb, List<String> cells, int[] widths, boolean[] leftAligned) {
    StringBuilder line = new StringBuilder();
    for (int i = 0; i < cells.size(); i++) {
      String text = cells.get(i);
      String pad = " ".repeat(widths[i] - width(text));
      if (i > 0) {
        line.append(GAP);
      }
      if (leftAligned[i]) {
        line.append(text).append(pad);
      } else {
        line.append(pad).append(text);
      }
    }
    sb.append(line.toString().stripTrailing()).append('\n');
  }

  /** Width in terminal columns, counting each code point once (µ, σ and the dash are narrow). */
  private static int width(String text) {
    return text.codePointCount(0, text.length());
  }
}
