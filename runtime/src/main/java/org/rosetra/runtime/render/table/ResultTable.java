package org.rosetra.runtime.render.table;

import java.util.List;
import java.util.Objects;

/**
 * A table of results ready to render: a title, a header for the row labels, the value columns
 * and the rows. Every row has exactly one cell per column.
 */
public record ResultTable(String title, String rowHeader, List<Column> columns, List<Row> rows) {

  public ResultTable {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(rowHeader, "rowHeader");
    columns = List.copyOf(columns);
    rows = List.copyOf(rows);
    for (Row row : rows) {
      if (row.cells().size() != columns.size()) {
        throw new IllegalArgumentException(
            "row '" + row.label() + "' has " + row.cells().size() + " cells for "
                + columns.size() + " columns in table '" + title + "'");
      }
    }
  }

  /** A table whose row labels are load cases. */
  public ResultTable(String title, List<Column> columns, List<Row> rows) {
    this(title, "case", columns, rows);
  }

  /** The cells of column {@code index}, top to bottom. */
  public List<Cell> column(int index) {
    return rows.stream().map(r -> r.cells().get(index)).toList();
  }
}
