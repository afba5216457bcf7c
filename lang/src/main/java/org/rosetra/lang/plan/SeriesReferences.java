package org.rosetra.lang.plan;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.rosetra.lang.syntax.Binary;
import org.rosetra.lang.syntax.Call;
import org.rosetra.lang.syntax.Check;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.syntax.Index;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Member;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.lang.syntax.Negate;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.lang.syntax.Table;

/** Finds where a program looks at the samples of a series: {@code x[SERIES]} inside max() or min(). */
final class SeriesReferences {
    private SeriesReferences() {}

    /** Every {@code max(...)} / {@code min(...)} of one argument that reads {@code series}' samples. */
    static void collect(Program program, String series, List<Call> found) {
        Set<Expr> seen = new HashSet<>();
        for (Let let : program.lets.values()) {
            walk(let.body(), program, series, found, seen);
        }
        for (Check c : program.checks) {
            walk(c.left(), program, series, found, seen);
            walk(c.right(), program, series, found, seen);
        }
        for (Statement s : program.outputs) {
            if (s instanceof Table t) {
                t.items().forEach(e -> walk(e, program, series, found, seen));
            } else if (s instanceof Plot p) {
                walk(p.target(), program, series, found, seen);
            }
        }
    }

    private static void walk(Expr e, Program program, String series, List<Call> found, Set<Expr> seen) {
        if (e == null || !seen.add(e)) {
            return;
        }
        if (e instanceof Call c) {
            String f = c.function().text();
            if ((f.equals("max") || f.equals("min")) && c.args().size() == 1 && mentions(c.args().get(0), program, series)) {
                found.add(c);
            }
            c.args().forEach(a -> walk(a, program, series, found, seen));
        } else if (e instanceof Binary b) {
            walk(b.left(), program, series, found, seen);
            walk(b.right(), program, series, found, seen);
        } else if (e instanceof Negate n) {
            walk(n.operand(), program, series, found, seen);
        } else if (e instanceof Member m) {
            walk(m.target(), program, series, found, seen);
        } else if (e instanceof Index ix) {
            walk(ix.target(), program, series, found, seen);
        }
    }

    /** Whether an expression reads the samples of {@code series} (directly or through values). */
    static boolean mentions(Expr e, Program program, String series) {
        return mentions(e, program, series, new HashSet<>());
    }

    private static boolean mentions(Expr e, Program program, String series, Set<String> lets) {
        if (e instanceof Index ix) {
            return ix.caseName().text().equals(series) || mentions(ix.target(), program, series, lets);
        }
        if (e instanceof Binary b) {
            return mentions(b.left(), program, series, lets) || mentions(b.right(), program, series, lets);
        }
        if (e instanceof Negate n) {
            return mentions(n.operand(), program, series, lets);
        }
        if (e instanceof Member m) {
            return mentions(m.target(), program, series, lets);
        }
        if (e instanceof Call c) {
            for (Expr a : c.args()) {
                if (mentions(a, program, series, lets)) {
                    return true;
                }
            }
            if (program != null) {
                Let let = program.lets.get(c.function().text());
                return let != null && lets.add(let.name().text()) && mentions(let.body(), program, series, lets);
            }
            return false;
        }
        if (e instanceof NameRef ref && program != null) {
            Let let = program.lets.get(ref.name());
            return let != null && !let.isFunction() && lets.add(ref.name()) && mentions(let.body(), program, series, lets);
        }
        return false;
    }
}
