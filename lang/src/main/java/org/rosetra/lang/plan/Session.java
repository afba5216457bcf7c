package org.rosetra.lang.plan;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.check.ScriptChecker;

import org.rosetra.lang.syntax.Baseline;
import org.rosetra.lang.syntax.Case;
import org.rosetra.lang.syntax.Combine;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Report;
import org.rosetra.lang.syntax.Script;
import org.rosetra.lang.syntax.ScriptParser;
import org.rosetra.lang.syntax.Series;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.lang.syntax.Title;
import org.rosetra.lang.syntax.Use;

/**
 * The definitions a front end has given so far. A script file is one submission; a notebook
 * cell or a REPL entry is another. Submitting the same source again replaces what it defined
 * before, and defining a name again replaces the older definition. Every front end (CLI, REPL,
 * kernel) works through one of these.
 */
public final class Session {
    /** Where {@code use "file.strain"} and series files are looked up. */
    private final Path folder;
    private final Map<String, String> sourceText = new HashMap<>();
    private final List<Entry> entries = new ArrayList<>();
    private final Map<String, List<Statement>> modules = new LinkedHashMap<>();
    private final Map<String, String> moduleFileNames = new HashMap<>();
    private boolean allowJava;
    private org.rosetra.runtime.series.ReadOptions readOptions = org.rosetra.runtime.series.ReadOptions.defaults();

    private record Entry(String source, Statement statement) {}

    public Session(Path folder) {
        this.folder = folder.toAbsolutePath().normalize();
    }

    public Path folder() {
        return folder;
    }

    public void allowJava(boolean allow) {
        this.allowJava = allow;
    }

    public boolean javaAllowed() {
        return allowJava;
    }

    private java.io.PrintStream progressOut;
    private boolean writesRecord = true;

    /** Whether a calculation record will be written (it needs the SHA-256 of every series file). */
    public void writesRecord(boolean writes) {
        this.writesRecord = writes;
    }

    /** Draws a progress bar of long series reads here (a terminal's stderr), or nowhere (null). */
    public void progressTo(java.io.PrintStream out) {
        this.progressOut = out;
    }

    /** How measured series are read: threads, a cancel flag (for an interrupt), progress. */
    public void readOptions(org.rosetra.runtime.series.ReadOptions options) {
        this.readOptions = options;
    }

    /** The text of a file or cell the session has seen, for diagnostics (null if unknown). */
    public String sourceOf(String file) {
        return sourceText.get(file);
    }

    /**
     * Parses {@code text} (named {@code fileName} in diagnostics) and adds its statements,
     * replacing what the same {@code source} gave before. Syntax errors go to
     * {@code diagnostics} and leave the session as it was.
     */
    public List<Statement> submit(String source, String fileName, String text, Diagnostics diagnostics) {
        sourceText.put(fileName, text);
        Script script = ScriptParser.parse(fileName, text, diagnostics);
        if (diagnostics.hasErrors()) {
            return List.of();
        }
        for (Statement s : script.statements()) {
            if (s instanceof Use use) {
                loadModule(use, diagnostics);
            }
        }
        if (diagnostics.hasErrors()) {
            return List.of();
        }
        entries.removeIf(e -> e.source().equals(source));
        for (Statement s : script.statements()) {
            String key = key(s);
            if (key != null) {
                // A name defined again in a later submission replaces the older definition; a
                // name defined twice in one submission stays twice, for the checker to report.
                entries.removeIf(e -> !e.source().equals(source) && key.equals(key(e.statement())));
            }
            entries.add(new Entry(source, s));
        }
        return script.statements();
    }

    /** The modules loaded by {@code use}, as file name (as diagnostics show it) and text, in load order. */
    public Map<String, String> moduleSources() {
        Map<String, String> out = new LinkedHashMap<>();
        for (String key : modules.keySet()) {
            String name = moduleFileNames.get(key);
            out.put(name, sourceText.get(name));
        }
        return out;
    }

    /**
     * The text a span covers, as it was written (lines kept), or null when the session has not
     * seen its file. Headers of tables, the record's declarations and inspection show it.
     */
    public String textOf(org.rosetra.lang.syntax.SourceSpan span) {
        String source = span == null ? null : sourceText.get(span.file());
        if (source == null) {
            return null;
        }
        String[] lines = source.split("\r?\n", -1);
        StringBuilder out = new StringBuilder();
        for (int line = span.line(); line <= span.endLine() && line >= 1 && line <= lines.length; line++) {
            String text = lines[line - 1];
            int from = line == span.line() ? Math.max(0, span.column() - 1) : 0;
            int to = line == span.endLine() ? Math.min(text.length(), span.endColumn() - 1) : text.length();
            if (out.length() > 0) {
                out.append('\n');
            }
            if (from < to) {
                out.append(text, from, to);
            }
        }
        return out.toString().strip();
    }

    /** The statement that defines {@code name}, or null. */
    public Statement definitionOf(String name) {
        Statement found = null;
        for (Statement s : statements()) {
            if (name.equals(key(s))) {
                found = s;
            }
        }
        return found;
    }

    /** Removes everything that {@code source} defined. */
    public void forget(String source) {
        entries.removeIf(e -> e.source().equals(source));
    }

    /** Every statement in force: the modules that were used, then the submissions in order. */
    public List<Statement> statements() {
        List<Statement> all = new ArrayList<>();
        modules.values().forEach(all::addAll);
        for (Entry e : entries) {
            all.add(e.statement());
        }
        return all;
    }

    /**
     * Checks every statement in force without reading or reducing anything: names and
     * dimensions, then every declaration built as the runtime will use it (a material whose
     * E, nu and G disagree, a layout with two arms in one direction, a lead wire without a bridge).
     */
    public void check(Diagnostics diagnostics) {
        List<Statement> all = statements();
        ScriptChecker.check(new Script("(session)", all), diagnostics);
        if (diagnostics.hasErrors()) {
            return;
        }
        try {
            new Evaluation(Program.of(all)).buildDeclarations();
        } catch (EvaluationException e) {
            diagnostics.error(e.span(), e.getMessage(), e.hint());
        } catch (Evaluation.CycleException e) {
            diagnostics.error(all.get(0).span(), e.getMessage());
        }
    }

    /** Checks every statement in force, then computes it; errors come back as diagnostics. */
    public Outcome evaluate(Diagnostics diagnostics) {
        return evaluate(diagnostics, s -> true);
    }

    /**
     * As {@link #evaluate(Diagnostics)}, drawing only the tables and figures of the output
     * statements {@code wanted} accepts (a notebook shows the outputs of the cell it ran).
     */
    public Outcome evaluate(Diagnostics diagnostics, java.util.function.Predicate<Statement> wanted) {
        return evaluate(diagnostics, wanted, true);
    }

    /**
     * As above; with {@code everything} false only the checks and outputs {@code wanted}
     * accepts are computed and no {@link RunResults} are collected (a notebook cell shows its
     * own outputs: the rest of the session is computed only as far as they need it).
     */
    public Outcome evaluate(Diagnostics diagnostics, java.util.function.Predicate<Statement> wanted, boolean everything) {
        List<Statement> all = statements();
        Script whole = new Script("(session)", all);
        ScriptChecker.check(whole, diagnostics);
        if (diagnostics.hasErrors()) {
            return new Outcome(diagnostics, null, List.of(), List.of(), null, null);
        }
        Program program = Program.of(all);
        Evaluation evaluation = new Evaluation(program);
        evaluation.allowJava(allowJava);
        evaluation.configureSeries(folder, readOptions, progressOut);
        evaluation.digestSeries(writesRecord);
        try {
            List<CheckResult> checks = new ArrayList<>();
            for (var check : program.checks()) {
                if (everything || wanted.test(check)) {
                    checks.add(Checks.test(check, evaluation));
                }
            }
            RunResults results = everything ? ResultsBuilder.build(evaluation, checks) : null;
            OutputBuilder builder = new OutputBuilder(evaluation, this);
            List<Output> outputs = builder.build(program.outputs().stream().filter(wanted).toList());
            return new Outcome(diagnostics, results, outputs, checks, evaluation, builder.display());
        } catch (EvaluationException e) {
            diagnostics.error(e.span(), e.getMessage(), e.hint());
        } catch (org.rosetra.runtime.series.SeriesDataException e) {
            diagnostics.error(new org.rosetra.lang.syntax.SourceSpan(e.shownName(), (int) e.line(), 0, (int) e.line(), 0),
                    (e.column() != null ? "column \"" + e.column() + "\": " : "") + e.problem(), null);
        } catch (Evaluation.CycleException e) {
            diagnostics.error(all.get(0).span(), e.getMessage());
        }
        return new Outcome(diagnostics, null, List.of(), List.of(), null, null);
    }

    private void loadModule(Use use, Diagnostics diagnostics) {
        String key;
        String fileName;
        String text;
        try {
            if (use.module() != null) {
                key = use.module().text();
                fileName = "stdlib/" + key + ".strain";
                if (modules.containsKey(key)) {
                    return;
                }
                try (InputStream in = Session.class.getResourceAsStream("/org/rosetra/stdlib/" + key + ".strain")) {
                    if (in == null) {
                        diagnostics.error(use.module().span(), "there is no standard module '" + key + "'",
                                "the standard modules are: " + String.join(", ", StandardModules.names()));
                        return;
                    }
                    text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                }
            } else {
                Path file = folder.resolve(use.path().value()).normalize();
                if (!file.startsWith(folder)) {
                    diagnostics.error(use.path().span(), "a used file must lie in the script's folder or below it",
                            "move " + use.path().value() + " next to the script");
                    return;
                }
                key = file.toString();
                fileName = folder.relativize(file).toString();
                if (modules.containsKey(key)) {
                    return;
                }
                if (!Files.isRegularFile(file)) {
                    diagnostics.error(use.path().span(), "cannot find the file " + use.path().value());
                    return;
                }
                text = Files.readString(file, StandardCharsets.UTF_8);
            }
        } catch (IOException e) {
            diagnostics.error(use.span(), "cannot read the module: " + e.getMessage());
            return;
        }
        sourceText.put(fileName, text);
        moduleFileNames.put(key, fileName);
        Script script = ScriptParser.parse(fileName, text, diagnostics);
        List<Statement> loaded = new ArrayList<>();
        modules.put(key, loaded);
        for (Statement s : script.statements()) {
            if (s instanceof Use nested) {
                loadModule(nested, diagnostics);
            } else {
                loaded.add(s);
            }
        }
    }

    /** The name a statement defines (a later definition replaces it), or null. */
    static String key(Statement s) {
        if (s instanceof Declaration d) {
            return d.name().text();
        }
        if (s instanceof Baseline b) {
            return b.name().text();
        }
        if (s instanceof Case c) {
            return c.name().text();
        }
        if (s instanceof Combine c) {
            return c.name().text();
        }
        if (s instanceof Series x) {
            return x.name().text();
        }
        if (s instanceof Let l) {
            return l.name().text();
        }
        if (s instanceof Title) {
            return "#title";
        }
        if (s instanceof Report) {
            return "#report";
        }
        if (s instanceof org.rosetra.lang.syntax.Check c) {
            return "#check " + c.label().value();
        }
        return null;
    }
}
