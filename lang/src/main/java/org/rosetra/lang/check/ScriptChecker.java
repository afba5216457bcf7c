package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.syntax.Script;

/**
 * Runs the checking passes in order: the {@link Resolver} (names, kinds, fields), then the
 * {@link DimensionChecker}. Holds no state: a session may run it again over its accumulated
 * statements (see {@link StatementNames#accumulate}) after every cell.
 */
public final class ScriptChecker {

    private ScriptChecker() {
    }

    /** Checks the script; the result is usable for inspection even when there are errors. */
    public static CheckedScript check(Script script, Diagnostics diagnostics) {
        Resolver.Resolution resolution = new Resolver(diagnostics).resolve(script);
        DimensionChecker checker = new DimensionChecker(resolution.symbols(), resolution.armCounts(), diagnostics);
        checker.check(script);
        List<String> caseOrder = new ArrayList<>(resolution.symbols().namesOf(SymbolKind.CASE));
        caseOrder.addAll(resolution.symbols().namesOf(SymbolKind.COMBINATION));
        return new CheckedScript(script, resolution.symbols(), checker.dimensions(), checker.perCase(),
                checker.units(), resolution.armCounts(), List.copyOf(caseOrder));
    }

    /**
     * Checks a bare value (from {@code ScriptParser.parseExpression}) against a checked
     * script: the result is the context with the value's own dimensions, columns and units.
     * A rosette or state by name is accepted (a cell may show its table).
     */
    public static CheckedScript checkExpression(CheckedScript context, Expr expr, Diagnostics diagnostics) {
        new Resolver(diagnostics).resolveExpression(context.symbols(), expr);
        DimensionChecker checker = new DimensionChecker(context.symbols(), context.armCounts(), diagnostics);
        checker.checkValue(expr);
        return new CheckedScript(context.script(), context.symbols(), checker.dimensions(), checker.perCase(),
                checker.units(), context.armCounts(), context.caseOrder());
    }
}
