package org.rosetra.runtime.render.record;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.rosetra.runtime.render.plot.PlotSamples;
import org.rosetra.runtime.render.table.Cell;
import org.rosetra.runtime.render.table.Column;
import org.rosetra.runtime.render.table.ResultTable;
import org.rosetra.runtime.render.table.Row;

/** An invented survey of an invented hoist beam, with every part of a record filled in. */
final class RecordSamples {

  static final String SCRIPT =
      String.join("\n",
          "title \"Hoist beam HB-3, proof load survey\"",
          "material s355 {",
          "  E = 205 GPa",
          "  nu = 0.29",
          "}",
          "case proof_60kN from unloaded {",
          "  web_top = 412, -38, -121 ue   # <b>not bold</b> & \"quoted\"",
          "}",
          "plot mohr web_top[proof_60kN]",
          "");

  private RecordSamples() {}

  static CalculationRecord survey(boolean withHistory) {
    List<RecordItem> outputs = new ArrayList<>();
    outputs.add(new RecordItem.TableItem("web_top",
        new ResultTable("web_top, one row per case",
            List.of(new Column("sigma_1", "MPa"), new Column("von_mises", "MPa")),
            List.of(Row.of("proof_60kN", Cell.of(84.51), Cell.of(168.2)),
                Row.of("service", Cell.of(50.7), Cell.absent())))));
    outputs.add(new RecordItem.FigureItem("Mohr's circles, web_top, proof_60kN",
        PlotSamples.mohr().render("mohr-web_top-proof_60kN")));
    outputs.add(new RecordItem.FigureItem("Directions, web_top, proof_60kN",
        PlotSamples.directions().render("directions-web_top-proof_60kN")));
    if (withHistory) {
      outputs.add(new RecordItem.FigureItem("web_top von Mises over hoist_run",
          PlotSamples.history().render("history-web_top-von_mises")));
    }
    return new CalculationRecord(
        "Hoist beam HB-3, proof load survey",
        List.of(CheckLine.ofCases("web yield margin", true, 0.7107, "proof_60kN"),
            new CheckLine("run peak <= allowable", false, 1.043, "hoist_run", OptionalDouble.of(71.234))),
        List.of(new Declaration("material", "s355",
                List.of(new Property("E", "205", "GPa"), new Property("nu", "0.29", ""))),
            new Declaration("gauge", "foil350",
                List.of(new Property("factor", "2.09", ""), new Property("transverse", "0.6", "%"))),
            new Declaration("rosette", "web_top",
                List.of(new Property("layout", "rectangular", ""), new Property("angle", "15", "deg")))),
        "µε",
        List.of(new ArmCorrection("proof_60kN", "web_top", "a", 415.0, 417.1, 2.3, 3.1, 411.7),
            new ArmCorrection("proof_60kN", "web_top", "b", -37.0, -37.2, Double.NaN, -2.0, -35.2)),
        outputs,
        withHistory
            ? List.of(new SeriesInput("hoist_run", "data/hoist-run.csv",
                "9f86d081884c7d659a2feaa0c55ad015a3bf4f1b2b0b822cd15d6c15b0f00a08", 120000, 0, 119.999, "s",
                "0 s to 2 s"))
            : List.of(),
        "hb3.strain",
        SCRIPT,
        List.of(new InputFile("hb3.strain", "2c26b46b68ffc68ff99b453c1d30413413422d706483bfa0f98a5e886266e7ae")),
        "0.1.0");
  }
}
