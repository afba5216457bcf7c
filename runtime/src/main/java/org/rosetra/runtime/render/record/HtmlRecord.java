package org.rosetra.runtime.render.record;

import static org.rosetra.runtime.render.text.HtmlText.escape;

import org.rosetra.runtime.render.table.HtmlTable;
import org.rosetra.runtime.render.table.ResultTable;

/**
 * The record as one self-contained HTML page: style and figures inline, no script, nothing
 * fetched from anywhere, so it opens and prints the same years from now on any machine.
 */
public final class HtmlRecord {

  private HtmlRecord() {}

  public static String render(CalculationRecord r) {
    StringBuilder sb = new StringBuilder(1 << 16);
    sb.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
        .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
        .append("<title>").append(escape(r.title())).append("</title>\n")
        .append("<style>\n").append(RecordStyle.CSS).append("</style>\n</head>\n<body>\n");

    sb.append("<header>\n<h1>").append(escape(r.title())).append("</h1>\n")
        .append("<p class=\"meta\">Record ").append(escape(r.recordName())).append(", from the script ")
        .append(escape(r.scriptName())).append(", written by Rosetra ").append(escape(r.toolVersion()))
        .append("</p>\n")
        .append("<p class=\"caution\" role=\"note\"><strong>Caution.</strong> ")
        .append(escape(Caution.TEXT)).append("</p>\n</header>\n");

    section(sb, "checks", "Summary of checks");
    if (r.checks().isEmpty()) {
      sb.append("<p>The script states no checks.</p>\n");
    } else {
      long failed = r.checks().stream().filter(c -> !c.passed()).count();
      sb.append("<p>").append(failed == 0
          ? "Every check passed."
          : "<span class=\"fail\">" + failed + " of " + r.checks().size() + " checks failed.</span>")
          .append("</p>\n");
      table(sb, RecordTables.checks(r.checks()));
    }
    sb.append("</section>\n");

    section(sb, "declarations", "Materials, gauges and rosettes as declared");
    for (Declaration d : r.declarations()) {
      table(sb, RecordTables.declaration(d));
    }
    if (r.declarations().isEmpty()) {
      sb.append("<p>None declared.</p>\n");
    }
    sb.append("</section>\n");

    section(sb, "corrections", "Corrections applied to the readings");
    if (!r.series().isEmpty()) {
      sb.append("<p>").append(escape(RecordTables.SERIES_CORRECTIONS)).append("</p>\n");
    }
    if (r.corrections().isEmpty()) {
      if (r.series().isEmpty()) {
        sb.append("<p>No readings were corrected (no rosette readings in this script).</p>\n");
      }
    } else {
      sb.append("<p>Per case and arm, in ").append(escape(r.strainUnit()))
          .append(". A dash means the step does not apply.</p>\n");
      table(sb, RecordTables.corrections(r.corrections(), r.strainUnit()));
    }
    sb.append("</section>\n");

    section(sb, "outputs", "Results and figures, in script order");
    int figureNumber = 0;
    for (RecordItem item : r.outputs()) {
      if (item instanceof RecordItem.TableItem t) {
        table(sb, t.table());
        sb.append("<p class=\"files\">").append(escape(t.csvPath())).append("</p>\n");
      } else if (item instanceof RecordItem.FigureItem f) {
        figureNumber++;
        String id = "fig" + figureNumber;
        sb.append("<figure id=\"").append(id).append("\">\n")
            .append(SvgInline.forHtml(f.figure().svgText(), id, f.caption()))
            .append("<figcaption>Figure ").append(figureNumber).append(". ")
            .append(escape(f.caption())).append(" <span class=\"files\">")
            .append(escape(f.figure().svgPath())).append(", ")
            .append(escape(f.figure().pngPath())).append("</span></figcaption>\n</figure>\n");
      }
    }
    if (r.outputs().isEmpty()) {
      sb.append("<p>The script asks for no tables or figures.</p>\n");
    }
    sb.append("</section>\n");

    if (!r.series().isEmpty()) {
      section(sb, "series", "Measured series read");
      table(sb, RecordTables.series(r.series()));
      sb.append("</section>\n");
    }

    section(sb, "script", "The script, " + r.scriptName());
    sb.append("<pre class=\"script\"><code>");
    String[] lines = r.script().split("\r\n|\n|\r", -1);
    int count = r.script().endsWith("\n") ? lines.length - 1 : lines.length;
    int width = Integer.toString(Math.max(1, count)).length();
    for (int i = 0; i < count; i++) {
      sb.append("<span class=\"ln\">").append(String.format(java.util.Locale.ROOT, "%" + width + "d", i + 1))
          .append("  </span>").append(escape(lines[i])).append('\n');
    }
    sb.append("</code></pre>\n</section>\n");

    section(sb, "inputs", "Input files");
    table(sb, RecordTables.inputs(r.inputs()));
    sb.append("</section>\n");

    sb.append("<footer>Written by Rosetra ").append(escape(r.toolVersion()))
        .append(". The same script and inputs give this same file.</footer>\n</body>\n</html>\n");
    return sb.toString();
  }

  private static void section(StringBuilder sb, String id, String heading) {
    sb.append("<section id=\"").append(id).append("\">\n<h2>").append(escape(heading)).append("</h2>\n");
  }

  private static void table(StringBuilder sb, ResultTable t) {
    sb.append(HtmlTable.render(t));
  }
}
