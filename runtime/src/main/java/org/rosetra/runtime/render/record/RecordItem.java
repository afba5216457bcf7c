package org.rosetra.runtime.render.record;

import java.util.Objects;
import org.rosetra.runtime.render.plot.FileStem;
import org.rosetra.runtime.render.plot.RenderedFigure;
import org.rosetra.runtime.render.table.ResultTable;

/** One output of the script, a table or a figure, kept in script order. */
public sealed interface RecordItem permits RecordItem.TableItem, RecordItem.FigureItem {

  /** A results table, also written as {@code tables/NAME.csv}. */
  record TableItem(String name, ResultTable table) implements RecordItem {
    public TableItem {
      FileStem.require(name);
      Objects.requireNonNull(table, "table");
    }

    public String csvPath() {
      return "tables/" + name + ".csv";
    }
  }

  /** A figure with its caption; its files are {@code plots/NAME.svg} and {@code plots/NAME.png}. */
  record FigureItem(String caption, RenderedFigure figure) implements RecordItem {
    public FigureItem {
      Objects.requireNonNull(caption, "caption");
      Objects.requireNonNull(figure, "figure");
    }
  }
}
