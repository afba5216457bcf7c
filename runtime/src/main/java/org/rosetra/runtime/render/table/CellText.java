package org.rosetra.runtime.render.table;

import java.util.ArrayList;
import java.util.List;

/** The text of every cell of a table, decided once and shared by all renderers. */
final class CellText {

  /** What a person reads where there is no result: a dash, never "NaN". */
  static final String ABSENT = "\u2014";

  private CellText() {}

  /** Cell texts by row then column; absent cells become {@code absentText}. */
  static List<List<String>> of(ResultTable table, String absentText) {
    List<ColumnFormat> formats = new ArrayList<>();
    for (int c = 0; c < table.columns().size(); c++) {
      formats.add(ColumnFormat.forCells(table.column(c)));
    }
    List<List<String>> texts = new ArrayList<>();
    for (Row row : table.rows()) {
      List<String> line = new ArrayList<>();
      for (int c = 0; c < row.cells().size(); c++) {
        Cell cell = row.cells().get(c);
        if (cell instanceof Cell.Number n) {
          line.add(formats.get(c).format(n.value()));
        } else if (cell instanceof Cell.Text t) {
          line.add(t.text());
        } else {
          line.add(absentText);
        }
      }
      texts.add(line);
    }
    return texts;
  }
}
