package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.List;
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
}
