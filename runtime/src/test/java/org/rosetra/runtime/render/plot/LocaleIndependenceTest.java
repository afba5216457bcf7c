package org.rosetra.runtime.render.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.render.table.CsvTable;
import org.rosetra.runtime.render.table.PlainTextTable;

/** The host's locale and time zone must not reach any output (DESIGN.md, "Outputs"). */
class LocaleIndependenceTest {

  @Test
  void figuresAndTablesAreTheSameUnderAnyLocaleAndTimeZone() {
    List<RenderedFigure> reference = renderAll();
    String table = tables();
    Locale locale = Locale.getDefault();
    TimeZone zone = TimeZone.getDefault();
    try {
      // Decimal comma (German), and Arabic-Indic digits (a locale with its own numbering system).
      for (Locale other : List.of(Locale.GERMANY, Locale.forLanguageTag("ar-EG-u-nu-arab"))) {
        Locale.setDefault(other);
        TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Chatham"));
        List<RenderedFigure> again = renderAll();
        for (int i = 0; i < reference.size(); i++) {
          assertArrayEquals(reference.get(i).svg(), again.get(i).svg(), other + " " + reference.get(i).name());
          assertArrayEquals(reference.get(i).png(), again.get(i).png(), other + " " + reference.get(i).name());
        }
        assertEquals(table, tables(), other.toString());
      }
    } finally {
      Locale.setDefault(locale);
      TimeZone.setDefault(zone);
    }
  }

  private static List<RenderedFigure> renderAll() {
    return List.of(PlotSamples.mohr().render("mohr"), PlotSamples.bars().render("bars"));
  }

  private static String tables() {
    var t = new org.rosetra.runtime.render.table.ResultTable("t",
        List.of(new org.rosetra.runtime.render.table.Column("sigma_1", "MPa")),
        List.of(org.rosetra.runtime.render.table.Row.of("c",
            org.rosetra.runtime.render.table.Cell.of(1234.5678))));
    return PlainTextTable.render(t) + CsvTable.render(t);
  }
}
