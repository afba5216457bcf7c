package org.rosetra.runtime.render.record;

import static java.nio.charset.StandardCharsets.UTF_8;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.rosetra.runtime.render.output.OutputTransaction;
import org.rosetra.runtime.render.table.CsvTable;

/**
 * Writes a run's output folder in one transaction: {@code record.html}, {@code record.md},
 * {@code plots/NAME.svg} and {@code .png} for every figure, {@code tables/NAME.csv} for every
 * table, plus any other files the caller adds (such as {@code results.json}). Either everything
 * lands and stale plots and tables go, or, on any failure, the folder is left as it was.
 */
public final class RecordFolder {

  public static final String HTML = "record.html";
  public static final String MARKDOWN = "record.md";

  private RecordFolder() {}

  /** Writes the folder and returns the relative paths written, sorted. */
  public static List<String> write(Path dir, CalculationRecord record, Map<String, byte[]> otherFiles)
      throws IOException {
    Map<String, byte[]> files = new TreeMap<>(otherFiles);
    files.put(HTML, HtmlRecord.render(record).getBytes(UTF_8));
    files.put(MARKDOWN, MarkdownRecord.render(record).getBytes(UTF_8));
    for (RecordItem item : record.outputs()) {
      if (item instanceof RecordItem.TableItem t) {
        putOnce(files, t.csvPath(), CsvTable.render(t.table()).getBytes(UTF_8));
      } else if (item instanceof RecordItem.FigureItem f) {
        putOnce(files, f.figure().svgPath(), f.figure().svg());
        putOnce(files, f.figure().pngPath(), f.figure().png());
      }
    }
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      for (Map.Entry<String, byte[]> e : files.entrySet()) {
        tx.write(e.getKey(), e.getValue());
      }
      tx.commit();
    }
    return new ArrayList<>(files.keySet());
  }

  private static void putOnce(Map<String, byte[]> files, String path, byte[] bytes) {
    if (files.putIfAbsent(path, bytes) != null) {
      throw new IllegalArgumentException("two outputs would both be written to " + path);
    }
  }
}
