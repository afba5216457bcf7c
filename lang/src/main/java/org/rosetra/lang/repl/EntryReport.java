package org.rosetra.lang.repl;

import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.plan.CheckResult;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.JavaCode;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.render.table.PlainTextTable;

/** What an entry that computed prints: its values, its tables and figures, its checks' verdicts. */
public final class EntryReport {
    private EntryReport() {
    }

    static String of(Outcome outcome, List<Statement> added) {
        List<String> parts = new ArrayList<>(values(outcome, added));
        parts.addAll(outputs(outcome, added));
        for (CheckResult c : outcome.checks()) {
            if (added.stream().anyMatch(s -> s == c.check())) {
                parts.add(org.rosetra.lang.plan.ScriptRunner.verdict(c));
            }
        }
        return String.join("\n", parts);
    }

    /** The values the added {@code let}s name, in display units: {@code allowable = 236.7 MPa}. */
    public static List<String> values(Outcome outcome, List<Statement> added) {
        List<String> parts = new ArrayList<>();
        for (Statement s : added) {
            if (s instanceof Let let && !let.isFunction()) {
                Value value = outcome.evaluation().let(let.name().text());
                String shown = valueText(outcome).of(value, let.body(), let.name().text());
                parts.add(value instanceof Value.Column ? shown : let.name().text() + " = " + shown);
            }
        }
        return parts;
    }

    /** The outputs of the statements an entry added, as text. */
    static List<String> outputs(Outcome outcome, List<Statement> added) {
        List<String> out = new ArrayList<>();
        for (Output o : outcome.outputs()) {
            if (added.stream().anyMatch(s -> s == o.statement())) {
                out.add(outputText(o));
            }
        }
        return out;
    }

    private static String outputText(Output o) {
        if (o instanceof Output.TableOutput t) {
            return PlainTextTable.render(t.table()).stripTrailing();
        }
        Output.FigureOutput f = (Output.FigureOutput) o;
        return "(figure \"" + f.caption() + "\": a terminal cannot show it; rosetra run saves it in plots/)";
    }

    static ValueText valueText(Outcome outcome) {
        return new ValueText(outcome.display(),
                outcome.evaluation().axis());
    }

    /** Says at once that a Java function will not run here, rather than at its first call. */
    static List<String> javaNotes(Session session, List<Statement> added) {
        List<String> notes = new ArrayList<>();
        for (Statement s : added) {
            if (!session.javaAllowed() && s instanceof Let let && let.body() instanceof JavaCode) {
                notes.add("note: function " + let.name().text() + " is written in Java; it runs only in a REPL"
                        + " started with --allow-java");
            }
        }
        return notes;
    }
}
