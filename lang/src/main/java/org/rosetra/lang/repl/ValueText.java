package org.rosetra.lang.repl;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.render.table.Cell;
import org.rosetra.runtime.render.table.Column;
import org.rosetra.runtime.render.table.ColumnFormat;
import org.rosetra.runtime.render.table.PlainTextTable;
import org.rosetra.runtime.render.table.ResultTable;
import org.rosetra.runtime.render.table.Row;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.DisplayUnits;
import org.rosetra.runtime.units.Unit;

/** A value as the REPL shows it, in display units: a number with its unit, or a table per case. */
final class ValueText {
    private final DisplayUnits display;
    private final List<String> cases;

    ValueText(DisplayUnits display, List<String> cases) {
        this.display = display;
        this.cases = cases;
    }

    /** {@code expression} (null if unknown) decides whether a plain number is a strain. */
    String of(Value value, Expr expression, String label) {
        if (value instanceof Value.Number n) {
            return number(n.si(), unitFor(n.dimension(), expression));
        }
        if (value instanceof Value.Column c) {
            return perCase(c, unitFor(c.dimension(), expression), label);
        }
        if (value instanceof Value.History h) {
            return history(h, unitFor(h.dimension(), expression));
        }
        if (value instanceof Value.Rosette r) {
            return "rosette " + r.name() + ": pick a member, such as " + r.name() + ".von_mises,"
                    + " or write table " + r.name();
        }
        if (value instanceof Value.RosetteInCase rc) {
            return "rosette " + rc.rosette() + " in " + rc.caseName() + ": pick a member, such as "
                    + rc.rosette() + ".sigma_1[" + rc.caseName() + "]";
        }
        if (value instanceof Value.State s) {
            return "state " + s.name() + ": pick a member, such as " + s.name() + ".sigma_1, or write table " + s.name();
        }
        if (value instanceof Value.MaterialRef m) {
            return material(m.material());
        }
        if (value instanceof Value.Text t) {
            return "\"" + t.text() + "\"";
        }
        if (value instanceof Value.Function f) {
            return "function " + f.definition().name().text() + "(" + String.join(", ", f.parameters()) + ")";
        }
        return String.valueOf(value);
    }

    private Unit unitFor(Dimension d, Expr expression) {
        if (d.isNone()) {
            return org.rosetra.lang.plan.StrainExpressions.isStrain(expression) ? display.strainUnit() : Unit.ONE;
        }
        return display.unitFor(d);
    }

    static String number(double si, Unit unit) {
        if (Double.isNaN(si)) {
            return "no result";
        }
        double shown = unit.fromSi(si);
        String digits = ColumnFormat.forMagnitude(Math.abs(shown)).format(shown);
        return unit.symbol().isEmpty() ? digits : digits + " " + unit.symbol();
    }

    private String perCase(Value.Column c, Unit unit, String label) {
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < c.values().length && i < cases.size(); i++) {
            if (!Double.isNaN(c.values()[i])) {
                rows.add(Row.of(cases.get(i), cellOf(unit.fromSi(c.values()[i]))));
            }
        }
        if (rows.isEmpty()) {
            return "no result in any case";
        }
        ResultTable table = new ResultTable("", List.of(new Column(label, unit.symbol())), rows);
        return PlainTextTable.render(table).stripTrailing();
    }

    private static Cell cellOf(double shown) {
        return Double.isFinite(shown) ? new Cell.Number(shown) : new Cell.Absent();
    }

    private static String history(Value.History h, Unit unit) {
        double[] v = h.values();
        int hi = -1;
        int lo = -1;
        for (int i = 0; i < v.length; i++) {
            if (Double.isNaN(v[i])) {
                continue;
            }
            hi = hi < 0 || v[i] > v[hi] ? i : hi;
            lo = lo < 0 || v[i] < v[lo] ? i : lo;
        }
        if (hi < 0) {
            return "series " + h.series() + ": no result in any sample";
        }
        return String.format(Locale.ROOT, "series %s, %d samples: max %s at %s s, min %s at %s s", h.series(),
                v.length, number(v[hi], unit), h.time()[hi], number(v[lo], unit), h.time()[lo]);
    }

    private String material(Material m) {
        Unit stress = display.unitFor(Dimension.STRESS);
        StringBuilder s = new StringBuilder("material ").append(m.name()).append(": E = ")
                .append(number(m.e(), stress)).append(", nu = ").append(number(m.nu(), Unit.ONE))
                .append(", G = ").append(number(m.g(), stress));
        strength(s, "yield", m.yield(), stress);
        strength(s, "yield_c", m.yieldC(), stress);
        strength(s, "ultimate", m.ultimate(), stress);
        strength(s, "ultimate_c", m.ultimateC(), stress);
        return s.toString();
    }

    private static void strength(StringBuilder s, String name, OptionalDouble value, Unit unit) {
        if (value.isPresent()) {
            s.append(", ").append(name).append(" = ").append(number(value.getAsDouble(), unit));
        }
    }

}
