package org.rosetra.runtime.render.table;

import java.util.List;

/** An invented result table: two load cases and a combination, one rosette missing from one case. */
final class TableFixtures {

  private TableFixtures() {}

  static ResultTable bracket() {
    return new ResultTable(
        "Bracket B-7, rosette r1",
        List.of(
            new Column("eps_1", "µε"),
            new Column("sigma_1", "MPa"),
            Column.unitless("utilization"),
            Column.unitless("verdict")),
        List.of(
            Row.of("lift_2t", Cell.of(412.34), Cell.of(84.512), Cell.of(0.36127), Cell.text("pass")),
            Row.of("lift_4t", Cell.of(-38.06), Cell.of(169.0), Cell.of(0.72), Cell.text("pass")),
            Row.of("overload", Cell.of(Double.NaN), Cell.absent(), Cell.absent(),
                Cell.text("no result, \"r1\" not read"))));
  }
}
