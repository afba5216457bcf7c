package org.rosetra.lang.repl;

import java.io.IOException;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.plan.CheckResult;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.JavaCode;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.render.table.PlainTextTable;

/**
 * The reading loop without a terminal: lines go in, the text to print comes out. Each entry is
 * submitted to one session that lives as long as the REPL, as source {@code entry-N} (file
 * {@code <entry N>} in messages). An entry with an error is taken back out, so the session always
 * holds statements that compute.
 */
public final class Repl {
    private static final String NOT_KEPT = "(this entry was not kept; enter it again corrected)";

    private final Session session;
    private final List<Kept> kept = new ArrayList<>();
    private final StringBuilder pending = new StringBuilder();
    private int entryCount;

    /** An entry in force, to replay when a later one is taken back. */
    private record Kept(String source, String file, String text) {}

    public Repl(Session session) {
        this.session = session;
    }

    public Session session() {
        return session;
    }

    /** Whether an entry is open and waits for more lines. */
    public boolean continues() {
        return pending.length() > 0;
    }

    /** Drops the open entry (Ctrl-C). */
    public void cancel() {
        pending.setLength(0);
    }

    /** One line typed, or a whole entry of several lines from an editor that collects them. */
    public Reply accept(String line) {
        if (!continues() && line.strip().startsWith(":")) {
            return command(line.strip());
        }
        if (continues()) {
            pending.append('\n');
        }
        pending.append(line);
        String text = pending.toString();
        if (!EntryText.isReady(text)) {
            return Reply.more();
        }
        pending.setLength(0);
        if (EntryText.isBlank(text)) {
            return Reply.print("");
        }
        return Reply.print(run(text));
    }

    /** Adds a script file to the session, as {@code rosetra repl SCRIPT} does before the first prompt. */
    public Reply load(Path script) {
        String text;
        try {
            text = Files.readString(script, StandardCharsets.UTF_8);
        } catch (MalformedInputException e) {
            return Reply.print("rosetra: error: " + script + " is not UTF-8 text");
        } catch (IOException e) {
            return Reply.print("rosetra: error: cannot read " + script + ": " + e.getMessage());
        }
        return Reply.print(submit("file " + script.toAbsolutePath().normalize(), script.toString(), text));
    }

    private Reply command(String line) {
        String[] words = line.split("\\s+", 2);
        switch (words[0]) {
            case ":quit", ":q", ":exit":
                return Reply.quit();
            case ":help", ":h", ":?":
                return Reply.print(HelpText.TEXT);
            case ":reset":
                kept.forEach(k -> session.forget(k.source()));
                kept.clear();
                return Reply.print("(the session is empty)");
            case ":names":
                return Reply.print(names());
            case ":load":
                if (words.length < 2 || words[1].isBlank()) {
                    return Reply.print("error: :load needs a file, as in :load survey.strain");
                }
                return load(session.folder().resolve(words[1].strip()));
            default:
                return Reply.print("error: unknown command " + words[0] + "; :help lists the commands");
        }
    }

    private String names() {
        List<String> names = SessionNames.of(session.statements()).all();
        return names.isEmpty() ? "(nothing defined yet)" : String.join("  ", names);
    }

    private String run(String text) {
        int number = ++entryCount;
        String source = "entry-" + number;
        String file = "<entry " + number + ">";
        if (EntryText.isBareExpression(text)) {
            return show(text, number, source, file);
        }
        return submit(source, file, text);
    }

    /** Adds a statement entry; prints its tables, the verdicts of its checks and its values. */
    private String submit(String source, String file, String text) {
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(source, file, text, diagnostics);
        if (diagnostics.hasErrors()) {
            return render(diagnostics, file, text, 0);
        }
        Outcome outcome = session.evaluate(diagnostics);
        String report = null;
        if (outcome.ok()) {
            try {
                report = report(outcome, added);
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
        parts.addAll(javaNotes(added));
        return String.join("\n", parts);
    }

    /** Says at once that a Java function will not run here, rather than at its first call. */
    private List<String> javaNotes(List<Statement> added) {
        List<String> notes = new ArrayList<>();
        for (Statement s : added) {
            if (!session.javaAllowed() && s instanceof Let let && let.body() instanceof JavaCode) {
                notes.add("note: function " + let.name().text() + " is written in Java; it runs only in a REPL"
                        + " started with --allow-java");
            }
        }
        return notes;
    }

    /** Shows the value of a bare expression; the session is left as it was. */
    private String show(String text, int number, String source, String file) {
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(source, file, ExpressionEntry.wrap(text, number), diagnostics);
        String shown = null;
        if (!diagnostics.hasErrors()) {
            Outcome outcome = session.evaluate(diagnostics);
            if (outcome.ok()) {
                try {
                    Let let = (Let) added.get(0);
                    Value value = outcome.evaluation().let(let.name().text());
                    shown = value instanceof Value.Rosette || value instanceof Value.State
                            ? tableOf(text.strip(), source, file)
                            : valueText(outcome).of(value, let.body(), text.strip());
                } catch (EvaluationException e) {
                    diagnostics.error(e.span(), e.getMessage(), e.hint());
                }
            }
        }
        session.forget(source);
        if (diagnostics.hasErrors()) {
            return render(diagnostics, file, text, ExpressionEntry.LINES_ADDED);
        }
        return shown;
    }

    /** A whole rosette or state typed alone shows its standard table, as {@code table NAME} would. */
    private String tableOf(String name, String source, String file) {
        String tableSource = source + "-table";
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> added = session.submit(tableSource, file, "table " + name, diagnostics);
        Outcome outcome = diagnostics.hasErrors() ? null : session.evaluate(diagnostics);
        session.forget(tableSource);
        if (outcome == null || !outcome.ok()) {
            return "write table " + name + " to see its results";
        }
        List<String> tables = new ArrayList<>();
        for (Output o : outcome.outputs()) {
            if (added.stream().anyMatch(s -> s == o.statement())) {
                tables.add(outputText(o));
            }
        }
        return String.join("\n", tables);
    }

    private String report(Outcome outcome, List<Statement> added) {
        List<String> parts = new ArrayList<>();
        for (Statement s : added) {
            if (s instanceof Let let && !let.isFunction()) {
                Value value = outcome.evaluation().let(let.name().text());
                String shown = valueText(outcome).of(value, let.body(), let.name().text());
                parts.add(value instanceof Value.Column ? shown : let.name().text() + " = " + shown);
            }
        }
        for (Output o : outcome.outputs()) {
            if (added.stream().anyMatch(s -> s == o.statement())) {
                parts.add(outputText(o));
            }
        }
        for (CheckResult c : outcome.checks()) {
            if (added.stream().anyMatch(s -> s == c.check())) {
                parts.add(Verdicts.of(c));
            }
        }
        return String.join("\n", parts);
    }

    private static String outputText(Output o) {
        if (o instanceof Output.TableOutput t) {
            return PlainTextTable.render(t.table()).stripTrailing();
        }
        Output.FigureOutput f = (Output.FigureOutput) o;
        return "(figure \"" + f.caption() + "\": a terminal cannot show it; rosetra run saves it in plots/)";
    }

    private static ValueText valueText(Outcome outcome) {
        return new ValueText(DisplayChoice.of(outcome.evaluation().program().displays()),
                outcome.evaluation().axis());
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
