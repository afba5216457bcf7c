package org.rosetra.runtime.render.record;

import org.rosetra.runtime.render.text.UtilizationText;
import java.util.ArrayList;
import java.util.List;
import org.rosetra.runtime.render.table.Cell;
import org.rosetra.runtime.render.table.Column;
import org.rosetra.runtime.render.table.ColumnFormat;
import org.rosetra.runtime.render.table.ResultTable;
import org.rosetra.runtime.render.table.Row;

/** The record's own tables, built once so the HTML and the Markdown say exactly the same. */
final class RecordTables {

  /** How the record says what happened to the readings of a measured series. */
  static final String SERIES_CORRECTIONS = "Every sample of a measured series went through the same steps as a "
      + "case's readings: gauge factor, bridge and lead wires, thermal output at the sample's temperature "
      + "(when the series has a temperature column and the gauge a thermal-output polynomial), then the "
      + "zero; the zero subtracted from each arm is given under the series below.";

  private RecordTables() {}

  static ResultTable checks(List<CheckLine> checks) {
    boolean anyTime = checks.stream().anyMatch(c -> c.atSeconds().isPresent());
    List<Row> rows = new ArrayList<>();
    for (CheckLine c : checks) {
      List<Cell> cells = new ArrayList<>(List.of(
          Cell.text(c.passed() ? "pass" : "FAIL"),
          Double.isNaN(c.utilization()) ? Cell.absent() : Cell.text(UtilizationText.of(c.utilization())),
          c.governing().isEmpty() ? Cell.absent() : Cell.text(c.governing())));
      if (anyTime) {
        cells.add(c.atSeconds().isPresent() ? Cell.of(c.atSeconds().getAsDouble()) : Cell.absent());
      }
      rows.add(new Row(c.label(), cells));
    }
    List<Column> columns = new ArrayList<>(List.of(Column.unitless("result"), Column.unitless("utilization"),
        Column.unitless("governing")));
    if (anyTime) {
      columns.add(new Column("at", "s"));
    }
    return new ResultTable("Checks", "check", columns, rows);
  }

  static ResultTable declaration(Declaration d) {
    boolean anyUnit = d.properties().stream().anyMatch(p -> !p.unit().isEmpty());
    List<Row> rows = new ArrayList<>();
    for (Property p : d.properties()) {
      rows.add(anyUnit
          ? Row.of(p.key(), Cell.text(p.value()), p.unit().isEmpty() ? Cell.absent() : Cell.text(p.unit()))
          : Row.of(p.key(), Cell.text(p.value())));
    }
    List<Column> columns = anyUnit ? List.of(Column.unitless("value"), Column.unitless("unit"))
        : List.of(Column.unitless("value"));
    return new ResultTable(d.kind() + " " + d.name(), "property", columns, rows);
  }

  static ResultTable corrections(List<ArmCorrection> corrections, String unit) {
    List<Row> rows = new ArrayList<>();
    for (ArmCorrection a : corrections) {
      rows.add(Row.of(a.caseName(), Cell.text(a.rosette()), Cell.text(a.arm()),
          Cell.of(a.indicated()), Cell.of(a.afterBridge()), Cell.of(a.thermalRemoved()),
          Cell.of(a.baselineRemoved()), Cell.of(a.corrected())));
    }
    return new ResultTable("Corrections applied to each reading", "case",
        List.of(Column.unitless("rosette"), Column.unitless("arm"), new Column("indicated", unit),
            new Column("after bridge, lead and gauge factor", unit),
            new Column("thermal output removed", unit), new Column("baseline removed", unit),
            new Column("corrected", unit)),
        rows);
  }

  static ResultTable series(List<SeriesInput> series) {
    List<Row> rows = new ArrayList<>();
    for (SeriesInput s : series) {
      // Both ends with one format, so a span reads "0.000 to 120.0" consistently.
      ColumnFormat f = ColumnFormat.forMagnitude(Math.max(Math.abs(s.timeStart()), Math.abs(s.timeEnd())));
      String unit = s.timeUnit().isEmpty() ? "" : " " + s.timeUnit();
      String span = Double.isFinite(s.timeStart()) && Double.isFinite(s.timeEnd())
          ? f.format(s.timeStart()) + " to " + f.format(s.timeEnd()) + unit
          : "\u2014";
      rows.add(Row.of(s.name(), Cell.text(s.file()), Cell.text(s.sha256()), Cell.text(Long.toString(s.rows())),
          Cell.text(span), Cell.text(s.zero())));
    }
    return new ResultTable("Measured series", "series",
        List.of(Column.unitless("file"), Column.unitless("SHA-256"), Column.unitless("rows"),
            Column.unitless("time span"), Column.unitless("zero")),
        rows);
  }

  static ResultTable inputs(List<InputFile> inputs) {
    List<Row> rows = new ArrayList<>();
    for (InputFile f : inputs) {
      rows.add(Row.of(f.path(), Cell.text(f.sha256())));
    }
    return new ResultTable("Input files", "file", List.of(Column.unitless("SHA-256")), rows);
  }
}
