package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.syntax.Display;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.lang.syntax.Table;
import org.rosetra.runtime.render.table.Cell;
import org.rosetra.runtime.render.table.Column;
import org.rosetra.runtime.render.table.ResultTable;
import org.rosetra.runtime.render.table.Row;
import org.rosetra.runtime.results.MemberKind;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.results.RosetteResult;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.DisplayUnits;
import org.rosetra.runtime.units.Unit;
import org.rosetra.runtime.units.UnitParser;

/** Turns the output statements into tables and figures in display units, in script order. */
final class OutputBuilder {
    private final Evaluation evaluation;
    private final Session session;
    private final DisplayUnits display;

    OutputBuilder(Evaluation evaluation, Session session) {
        this.evaluation = evaluation;
        this.session = session;
        this.display = displayUnits(evaluation.program().displays());
    }

    DisplayUnits display() {
        return display;
    }

    /** The display units the script's {@code display} statements choose (SI by default). */
    static DisplayUnits displayUnits(List<Display> displays) {
        DisplayUnits units = DisplayUnits.si();
        for (Display d : displays) {
            if (d.isUnitSet()) {
                units = d.subject().text().equals("us") ? DisplayUnits.us() : DisplayUnits.si();
                continue;
            }
            Unit unit = UnitParser.parse(d.unitText());
            if (d.subject().text().equals("strain")) {
                units = units.withStrainUnit(unit);
            } else {
                units = units.with(unit.dimension(), unit);
            }
        }
        return units;
    }

    List<Output> build(List<Statement> statements) {
        List<Output> out = new ArrayList<>();
        for (Statement s : statements) {
            if (s instanceof Table t) {
                tables(t, out);
            } else if (s instanceof Plot p) {
                out.addAll(Figures.of(p, evaluation, display, this::textOf));
            }
        }
        return out;
    }

    private void tables(Table t, List<Output> out) {
        List<Expr> columns = new ArrayList<>();
        for (Expr item : t.items()) {
            if (item instanceof NameRef ref && evaluation.isRosette(ref.name())) {
                flushColumns(t, columns, out);
                out.add(new Output.TableOutput(t, "rosette-" + ref.name() + "-strains", rosetteTable(ref.name(), false)));
                if (evaluation.rosette(ref.name()).material() != null) {
                    out.add(new Output.TableOutput(t, "rosette-" + ref.name() + "-stresses", rosetteTable(ref.name(), true)));
                }
            } else if (item instanceof NameRef ref && evaluation.isState(ref.name())) {
                flushColumns(t, columns, out);
                out.add(new Output.TableOutput(t, "state-" + ref.name(), stateTable(ref.name())));
            } else {
                columns.add(item);
            }
        }
        flushColumns(t, columns, out);
    }

    /**
     * The standard result table of a rosette, one row per case where it has a result: its
     * strains (with theta_p), or its stresses. Two tables read better than one of 18 columns.
     */
    ResultTable rosetteTable(String rosette, boolean stresses) {
        EnumMap<RosetteMember, double[]> all = evaluation.results(rosette);
        EnumMap<RosetteMember, double[]> results = new EnumMap<>(RosetteMember.class);
        all.forEach((m, v) -> {
            if ((m.kind() == MemberKind.STRESS) == stresses) {
                results.put(m, v);
            }
        });
        StrainState[] states = evaluation.strains(rosette);
        List<Column> columns = new ArrayList<>();
        for (RosetteMember m : results.keySet()) {
            columns.add(new Column(m.scriptName(), unitOf(m).symbol()));
        }
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < states.length; i++) {
            if (states[i] == null) {
                continue;
            }
            List<Cell> cells = new ArrayList<>();
            for (var e : results.entrySet()) {
                cells.add(Cell.of(unitOf(e.getKey()).fromSi(e.getValue()[i])));
            }
            rows.add(new Row(evaluation.axis().get(i), cells));
        }
        return new ResultTable("Rosette " + rosette + (stresses ? ", stresses" : ", strains"), columns, rows);
    }

    private ResultTable stateTable(String state) {
        RosetteResult result = Expressions.stateResult(evaluation.state(state));
        List<Column> columns = new ArrayList<>();
        List<Cell> cells = new ArrayList<>();
        for (var e : result.asMap().entrySet()) {
            columns.add(new Column(e.getKey().scriptName(), unitOf(e.getKey()).symbol()));
            cells.add(Cell.of(unitOf(e.getKey()).fromSi(e.getValue())));
        }
        return new ResultTable("State " + state, "state", columns, List.of(new Row(state, cells)));
    }

    private void flushColumns(Table t, List<Expr> items, List<Output> out) {
        if (items.isEmpty()) {
            return;
        }
        int n = evaluation.axis().size();
        List<Column> columns = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        List<Unit> units = new ArrayList<>();
        for (Expr item : items) {
            Value v = evaluation.expressions().evaluate(item, Map.of());
            Dimension d = Arithmetic.dimension(v, item.span());
            Unit unit = d.isNone() ? (StrainExpressions.isStrain(item) ? display.strainUnit() : Unit.ONE) : display.unitFor(d);
            columns.add(new Column(textOf(item.span()), unit.symbol()));
            values.add(Arithmetic.column(v, n));
            units.add(unit);
        }
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<Cell> cells = new ArrayList<>();
            boolean any = false;
            for (int c = 0; c < columns.size(); c++) {
                double v = values.get(c)[i];
                any |= !Double.isNaN(v);
                cells.add(Cell.of(units.get(c).fromSi(v)));
            }
            if (any) {
                rows.add(new Row(evaluation.axis().get(i), cells));
            }
        }
        String name = org.rosetra.runtime.render.plot.FileStem.from("values-" + columns.get(0).header());
        out.add(new Output.TableOutput(t, name, new ResultTable("Values per case", columns, rows)));
        items.clear();
    }


    Unit unitOf(RosetteMember m) {
        return switch (m.kind()) {
            case STRAIN -> display.strainUnit();
            case ANGLE -> display.unitFor(Dimension.ANGLE);
            case STRESS -> display.unitFor(Dimension.STRESS);
        };
    }

    /** The text of an expression as the script wrote it. */
    String textOf(SourceSpan span) {
        String text = session.textOf(span);
        return text == null || text.isEmpty() ? "value" : text.replace('\n', ' ');
    }

}
