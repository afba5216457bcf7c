package org.rosetra.lang.kernel;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.atomic.AtomicBoolean;
import org.rosetra.lang.check.Builtins;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.plan.CheckResult;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.repl.ScriptCompleter;
import org.rosetra.lang.syntax.ScriptParser;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.render.table.HtmlTable;
import org.rosetra.runtime.render.table.PlainTextTable;
import org.rosetra.runtime.series.ReadOptions;
import org.rosetra.runtime.series.SeriesCancelledException;

/**
 * The notebook kernel's view of a language session: every cell is submitted to one
 * {@link Session} that lives as long as the kernel; a re-run cell replaces what it defined.
 */
public final class SessionCellEngine implements CellEngine {
    private final Session session;
    private final AtomicBoolean cancel = new AtomicBoolean();
    private final String version;
    private final ScriptCompleter completer;
    private int cells;

    public SessionCellEngine(Path folder, boolean allowJava, String version) {
        this.session = new Session(folder);
        this.session.allowJava(allowJava);
        this.session.readOptions(ReadOptions.defaults().withCancel(cancel));
        this.version = version;
        this.completer = new ScriptCompleter(session);
    }

    @Override
    public CellOutcome execute(String code, OutputSink sink) {
        cancel.set(false);
        cells++;
        String source = "cell " + cells;
        String file = "<cell " + cells + ">";
        Diagnostics diagnostics = new Diagnostics();
        List<Statement> statements = session.submit(source, file, code, diagnostics);
        if (diagnostics.hasErrors()) {
            return failure(diagnostics);
        }
        Set<Statement> mine = java.util.Collections.newSetFromMap(new IdentityHashMap<>());
        mine.addAll(statements);
        Outcome outcome;
        try {
            outcome = session.evaluate(diagnostics, mine::contains, false);
        } catch (SeriesCancelledException e) {
            session.forget(source);
            return interrupted();
        }
        if (!outcome.ok()) {
            session.forget(source);
            return failure(diagnostics);
        }
        List<String> values;
        try {
            values = org.rosetra.lang.repl.EntryReport.values(outcome, statements);
        } catch (org.rosetra.lang.plan.EvaluationException e) {
            diagnostics.error(e.span(), e.getMessage(), e.hint());
            session.forget(source);
            return failure(diagnostics);
        } catch (SeriesCancelledException e) {
            session.forget(source);
            return interrupted();
        }
        if (!values.isEmpty()) {
            sink.display(MimeBundle.plain(String.join("\n", values)));
        }
        for (Output o : outcome.outputs()) {
            sink.display(bundleOf(o));
        }
        StringBuilder verdicts = new StringBuilder();
        for (CheckResult c : outcome.checks()) {
            if (mine.contains(c.check())) {
                verdicts.append(verdict(c)).append('\n');
            }
        }
        if (verdicts.length() > 0) {
            sink.display(MimeBundle.plain(verdicts.toString().replace("**", "")).with("text/markdown", verdicts.toString()));
        }
        return CellOutcome.nothingToShow();
    }

    private static CellOutcome interrupted() {
        return CellOutcome.failed("Interrupted", "the cell was stopped while reading a series", List.of(
                "the cell was stopped while reading a series; what it defined was taken back"));
    }

    static MimeBundle bundleOf(Output o) {
        if (o instanceof Output.TableOutput t) {
            return MimeBundle.plain(PlainTextTable.render(t.table()))
                    .with("text/html", HtmlTable.render(t.table()));
        }
        Output.FigureOutput f = (Output.FigureOutput) o;
        return MimeBundle.plain(f.caption())
                .with("image/svg+xml", f.figure().svgText())
                .with("image/png", Base64.getEncoder().encodeToString(f.figure().png()));
    }

    private static String verdict(CheckResult c) {
        StringBuilder s = new StringBuilder(c.passes() ? "**pass**" : "**FAIL**");
        s.append(" \u2014 check \"").append(c.check().label().value()).append('"');
        if (c.unbounded()) {
            s.append(": utilization unbounded (the limit is zero)");
        } else if (!Double.isNaN(c.highest())) {
            s.append(": utilization ").append(org.rosetra.runtime.render.text.UtilizationText.of(c.highest()));
        }
        if (c.governingName() != null) {
            s.append(", governing ").append(c.governingName());
        }
        if (c.at() != null) {
            s.append(String.format(Locale.ROOT, " at %.3f s", c.at()));
        }
        return s.toString();
    }

    private CellOutcome failure(Diagnostics diagnostics) {
        String rendered = diagnostics.render(session::sourceOf);
        List<String> lines = new ArrayList<>(List.of(rendered.split("\n")));
        String first = diagnostics.sorted().stream().filter(d -> d.severity().name().equals("ERROR"))
                .map(d -> d.message()).findFirst().orElse("error");
        return CellOutcome.failed("Error", first, lines);
    }

    @Override
    public CompletionResult complete(String code, int cursorPos) {
        var c = completer.complete(code, cursorPos);
        return new CompletionResult(c.candidates(), c.start(), c.end());
    }

    @Override
    public InspectionResult inspect(String code, int cursorPos, int detailLevel) {
        String word = wordAt(code, cursorPos);
        if (word.isEmpty()) {
            return InspectionResult.notFound();
        }
        var member = Builtins.resultMember(word);
        if (member.isPresent()) {
            var m = member.get();
            String text = word + " (member of a rosette's result, " + m.kind() + "): " + m.doc();
            return InspectionResult.of(MimeBundle.plain(text).with("text/markdown", "**" + word + "** \u2014 " + m.doc()));
        }
        var function = Builtins.function(word);
        if (function.isPresent()) {
            var f = function.get();
            String text = f.signature() + ": " + f.doc();
            return InspectionResult.of(MimeBundle.plain(text).with("text/markdown", "`" + f.signature() + "` \u2014 " + f.doc()));
        }
        String definition = definitionOf(word);
        if (definition != null) {
            return InspectionResult.of(MimeBundle.plain(definition).with("text/markdown", "```\n" + definition + "\n```"));
        }
        return InspectionResult.notFound();
    }

    /** The name around {@code cursor}, or "". */
    static String wordAt(String code, int cursor) {
        int at = Math.min(Math.max(cursor, 0), code.length());
        int start = at;
        while (start > 0 && isNameChar(code.charAt(start - 1))) {
            start--;
        }
        int end = at;
        while (end < code.length() && isNameChar(code.charAt(end))) {
            end++;
        }
        return code.substring(start, end);
    }

    private static boolean isNameChar(char c) {
        return Character.isLetterOrDigit(c) || c == '_';
    }

    /** The text of the statement defining {@code name}, as it was written, or null. */
    private String definitionOf(String name) {
        Statement s = session.definitionOf(name);
        return s == null ? null : session.textOf(s.span());
    }


    @Override
    public Completeness isComplete(String code) {
        if (code.isBlank()) {
            return Completeness.complete();
        }
        return ScriptParser.isComplete(code) ? Completeness.complete() : Completeness.incomplete("  ");
    }

    @Override
    public void interrupt() {
        cancel.set(true);
    }

    @Override
    public String languageVersion() {
        return version;
    }
}
