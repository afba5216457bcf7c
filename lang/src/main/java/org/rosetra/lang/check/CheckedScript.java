package org.rosetra.lang.check;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.syntax.Node;
import org.rosetra.lang.syntax.Script;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.Unit;

/**
 * A script that has been resolved and dimension-checked, for the planner.
 *
 * @param dimensions the dimension of every value expression, keyed by identity; the body
 *                   of a function with parameters holds the dimensions of its first call
 * @param perCase    the expressions (by identity) whose value is a column over the cases,
 *                   combinations or samples of a series, not one number
 * @param units      the parsed unit of every quantity, reading list, column list and display
 *                   statement, keyed by identity
 * @param armCounts  rosette name to its number of arms
 * @param caseOrder  cases then combinations, each in the order written
 */
public record CheckedScript(Script script, SymbolTable symbols, Map<Expr, Dimension> dimensions,
        Set<Expr> perCase, Map<Node, Unit> units, Map<String, Integer> armCounts, List<String> caseOrder) {

    /** The dimension of a value expression, or null when it is not a value (or had an error). */
    public Dimension dimensionOf(Expr expr) {
        return dimensions.get(expr);
    }
}
