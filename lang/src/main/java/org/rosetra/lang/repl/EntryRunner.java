package org.rosetra.lang.repl;

import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Statement;

/**
 * Runs one entry against the session. A statement entry that computes is kept; one with an
 * error is taken back out (and the entries kept before it replayed), so the session always
 * holds statements that compute. A bare expression is shown and leaves the session as it was.
 */
final class EntryRunner {
    private static final String NOT_KEPT = "(this entry was not kept; enter it again corrected)";

    private final Session session;
    private final List<Kept> kept = new ArrayList<>();

    /** An entry in force, to replay when a later one is taken back. */
    private record Kept(String source, String file, String text) {}

    EntryRunner(Session session) {
        this.session = session;
    }

    /** Only the outputs and checks of this entry are drawn and tested; the rest only as they need. */
    private static java.util.function.Predicate<Statement> only(List<Statement> added) {
        java.util.Set<Statement> mine = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
        mine.addAll(added);
        return mine::contains;
    }

    /** Forgets every entry kept so far. */
    void reset() {
        kept.forEach(k -> session.forget(k.source()));
        kept.clear();
    }

    /** Adds a statement entry; prints its tables, the verdicts of its checks and its values. */
    String statement(String source, String file, String text) {
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(source, file, text, diagnostics);
        if (diagnostics.hasErrors()) {
            return render(diagnostics, file, text, 0);
        }
        Outcome outcome = session.evaluate(diagnostics, only(added), false);
        String report = null;
        if (outcome.ok()) {
            try {
                report = EntryReport.of(outcome, added);
            } catch (EvaluationException e) {
                diagnostics.error(e.span(), e.getMessage(), e.hint());
            }
        }
        if (diagnostics.hasErrors()) {
            takeBack(source);
            return render(diagnostics, file, text, 0) + NOT_KEPT;
        }
        kept.removeIf(k -> k.source().equals(source));
        kept.add(new Kept(source, file, text));
        List<String> parts = new ArrayList<>();
        if (!diagnostics.all().isEmpty()) {
            parts.add(render(diagnostics, file, text, 0).stripTrailing());
        }
        if (!report.isEmpty()) {
            parts.add(report);
        }
        parts.addAll(EntryReport.javaNotes(session, added));
        return String.join("\n", parts);
    }

    /** Shows the value of a bare expression; the session is left as it was. */
    String expression(String text, int number, String source, String file) {
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(source, file, ExpressionEntry.wrap(text, number), diagnostics);
        String shown = null;
        if (!diagnostics.hasErrors()) {
            Outcome outcome = session.evaluate(diagnostics, statement -> false, false);
            if (outcome.ok()) {
                try {
                    Let let = (Let) added.get(0);
                    Value value = outcome.evaluation().let(let.name().text());
                    shown = value instanceof Value.Rosette || value instanceof Value.State
                            ? tableOf(text.strip(), source, file)
                            : EntryReport.valueText(outcome).of(value, let.body(), text.strip());
                } catch (EvaluationException e) {
                    diagnostics.error(e.span(), e.getMessage(), e.hint());
                }
            }
        }
        session.forget(source);
        if (diagnostics.hasErrors()) {
            String shownErrors = render(diagnostics, file, text, ExpressionEntry.LINES_ADDED);
            return ExpressionEntry.looksLikeAnAssignment(text)
                    ? shownErrors + "  hint: to name a value, write let " + text.strip() + "\n" : shownErrors;
        }
        return shown;
    }

    /** A whole rosette or state typed alone shows its standard table, as {@code table NAME} would. */
    private String tableOf(String name, String source, String file) {
        String tableSource = source + "-table";
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(tableSource, file, "table " + name, diagnostics);
        Outcome outcome = diagnostics.hasErrors() ? null : session.evaluate(diagnostics, only(added), false);
        session.forget(tableSource);
        if (outcome == null || !outcome.ok()) {
            return "write table " + name + " to see its results";
        }
        return String.join("\n", EntryReport.outputs(outcome, added));
    }

    /** Takes an entry back out and replays the kept ones, so a definition it replaced is back. */
    private void takeBack(String source) {
        session.forget(source);
        for (Kept k : kept) {
            session.forget(k.source());
        }
        for (Kept k : kept) {
            session.submit(k.source(), k.file(), k.text(), new Diagnostics());
        }
    }

    private String render(Diagnostics diagnostics, String file, String text, int linesAdded) {
        Diagnostics placed = EntryDiagnostics.placed(diagnostics, file, linesAdded, (int) text.lines().count());
        return placed.render(f -> f.equals(file) ? text : session.sourceOf(f));
    }
}

