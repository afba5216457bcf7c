package org.rosetra.runtime.render.table;

import java.util.ArrayList;
import java.util.List;

/**
 * A table as CSV by RFC 4180: a header row ({@code case,sigma_1 [MPa],...}), CRLF line ends, and
 * a field quoted, with inner quotes doubled, when it holds a comma, a quote, CR or LF. No result
 * is an empty field. Numbers are written as in the record (see {@link ColumnFormat}); results.json
 * keeps full precision.
 */
public final class CsvTable {

  private static final String CRLF = "\r\n";

  private CsvTable() {}

  public static String render(ResultTable table) {
    StringBuilder sb = new StringBuilder();
    List<String> header = new ArrayList<>();
    header.add(table.rowHeader());
    table.columns().forEach(c -> header.add(c.label()));
    appendRecord(sb, header);
    List<List<String>> body = CellText.of(table, "");
    for (int r = 0; r < body.size(); r++) {
      List<String> fields = new ArrayList<>();
      fields.add(table.rows().get(r).label());
      fields.addAll(body.get(r));
      appendRecord(sb, fields);
    }
    return sb.toString();
  }

  private static void appendRecord(StringBuilder sb, List<String> fields) {
    for (int i = 0; i < fields.size(); i++) {
      if (i > 0) {
        sb.append(',');
      }
      sb.append(field(fields.get(i)));
    }
    sb.append(CRLF);
  }

  /** One field, quoted only when RFC 4180 requires it. */
  static String field(String text) {
    boolean quote =
        text.indexOf(',') >= 0 || text.indexOf('"') >= 0 || text.indexOf('\r') >= 0
            || text.indexOf('\n') >= 0;
    return quote ? '"' + text.replace("\"", "\"\"") + '"' : text;
  }
}
