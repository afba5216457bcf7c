package org.rosetra.runtime.render.record;

import static org.rosetra.runtime.render.text.MarkdownText.escape;

import java.util.Locale;
import org.rosetra.runtime.render.table.MarkdownTable;
import org.rosetra.runtime.render.text.MarkdownText;

/** The record as Markdown, for reading in a repository: figures link to {@code plots/*.svg}. */
public final class MarkdownRecord {

  private MarkdownRecord() {}

  public static String render(CalculationRecord r) {
    StringBuilder sb = new StringBuilder(1 << 14);
    sb.append("# ").append(escape(r.title())).append("\n\n");
    sb.append("Record ").append(escape(r.recordName())).append(", from the script ").append(escape(r.scriptName()))
        .append(", written by Rosetra ").append(escape(r.toolVersion())).append(".\n\n");
    sb.append("> **Caution.** ").append(escape(Caution.TEXT)).append("\n\n");

    sb.append("## Summary of checks\n\n");
    if (r.checks().isEmpty()) {
      sb.append("The script states no checks.\n\n");
    } else {
      long failed = r.checks().stream().filter(c -> !c.passed()).count();
      sb.append(failed == 0 ? "Every check passed." : "**" + failed + " of " + r.checks().size() + " checks failed.**")
          .append("\n\n");
      sb.append(MarkdownTable.render(RecordTables.checks(r.checks()))).append('\n');
    }

    sb.append("## Materials, gauges and rosettes as declared\n\n");
    if (r.declarations().isEmpty()) {
      sb.append("None declared.\n\n");
    }
    for (Declaration d : r.declarations()) {
      sb.append(MarkdownTable.render(RecordTables.declaration(d))).append('\n');
    }

    sb.append("## Corrections applied to the readings\n\n");
    if (!r.series().isEmpty()) {
      sb.append(escape(RecordTables.SERIES_CORRECTIONS)).append("\n\n");
    }
    if (r.corrections().isEmpty()) {
      if (r.series().isEmpty()) {
        sb.append("No readings were corrected (no rosette readings in this script).\n\n");
      }
    } else {
      sb.append("Per case and arm, in ").append(escape(r.strainUnit()))
          .append(". A dash means the step does not apply.\n\n");
      sb.append(MarkdownTable.render(RecordTables.corrections(r.corrections(), r.strainUnit()))).append('\n');
    }

    sb.append("## Results and figures, in script order\n\n");
    if (r.outputs().isEmpty()) {
      sb.append("The script asks for no tables or figures.\n\n");
    }
    int figureNumber = 0;
    for (RecordItem item : r.outputs()) {
      if (item instanceof RecordItem.TableItem t) {
        sb.append(MarkdownTable.render(t.table())).append('\n');
        sb.append("CSV: [").append(escape(t.csvPath())).append("](").append(t.csvPath()).append(")\n\n");
      } else if (item instanceof RecordItem.FigureItem f) {
        figureNumber++;
        String caption = "Figure " + figureNumber + ". " + f.caption();
        sb.append("![").append(escape(caption)).append("](").append(f.figure().svgPath()).append(")\n\n");
        sb.append("*").append(escape(caption)).append("* (PNG: [").append(escape(f.figure().pngPath()))
            .append("](").append(f.figure().pngPath()).append("))\n\n");
      }
    }

    if (!r.series().isEmpty()) {
      sb.append("## Measured series read\n\n");
      sb.append(MarkdownTable.render(RecordTables.series(r.series()))).append('\n');
    }

    sb.append("## The script, ").append(escape(r.scriptName())).append("\n\n");
    String[] lines = r.script().split("\r\n|\n|\r", -1);
    int count = r.script().endsWith("\n") ? lines.length - 1 : lines.length;
    int width = Integer.toString(Math.max(1, count)).length();
    StringBuilder numbered = new StringBuilder();
    for (int i = 0; i < count; i++) {
      numbered.append(String.format(Locale.ROOT, "%" + width + "d  ", i + 1)).append(lines[i]).append('\n');
    }
    sb.append(MarkdownText.codeBlock(numbered.toString())).append('\n');

    sb.append("## Input files\n\n");
    sb.append(MarkdownTable.render(RecordTables.inputs(r.inputs()))).append('\n');
    sb.append("Written by Rosetra ").append(escape(r.toolVersion()))
        .append(". The same script and inputs give this same file.\n");
    return sb.toString();
  }
}
