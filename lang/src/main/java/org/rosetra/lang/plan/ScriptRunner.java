package org.rosetra.lang.plan;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.charset.MalformedInputException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.rosetra.lang.check.Diagnostics;
import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.output.OutputFolder;
import org.rosetra.lang.output.RecordBuilder;
import org.rosetra.runtime.render.record.InputFile;
import org.rosetra.runtime.render.record.CalculationRecord;
import org.rosetra.lang.output.ResultsJson;
import org.rosetra.runtime.render.table.PlainTextTable;

/**
 * Runs or checks one script file for the command line: reads it, checks it, computes it,
 * prints its tables and check verdicts, and writes its outputs. Exit statuses as in
 * LANGUAGE.md: 0 ran and passed, 1 a check failed, 2 an error (nothing computed or written).
 */
public final class ScriptRunner {
    /** The script ran and every check passed (exit statuses of LANGUAGE.md, "Running and results"). */
    public static final int PASSED = 0;
    /** The script ran and a check failed; every output is still written. */
    public static final int CHECK_FAILED = 1;
    /** The script has an error and nothing was computed or written. */
    public static final int ERROR = 2;

    private final PrintStream out;
    private final PrintStream err;
    private final String toolVersion;

    public ScriptRunner(PrintStream out, PrintStream err, String toolVersion) {
        this.out = out;
        this.err = err;
        this.toolVersion = toolVersion;
    }

    /** Parses and checks only. */
    public int check(Path script) {
        Loaded loaded = load(script);
        if (loaded == null) {
            return ERROR;
        }
        Diagnostics diagnostics = new Diagnostics();
        loaded.session.submit("script", loaded.name, loaded.text, diagnostics);
        if (!diagnostics.hasErrors()) {
            loaded.session.check(diagnostics);
        }
        return report(diagnostics, loaded.session) ? ERROR : PASSED;
    }

    public int run(Path script, RunOptions options) {
        Loaded loaded = load(script);
        if (loaded == null) {
            return ERROR;
        }
        Outcome outcome = compute(loaded, options.allowJava(), options.writeOutputs());
        if (outcome == null) {
            return ERROR;
        }
        for (Output o : outcome.outputs()) {
            if (o instanceof Output.TableOutput t) {
                out.println(PlainTextTable.render(t.table()));
            }
        }
        for (CheckResult c : outcome.checks()) {
            out.println(verdict(c));
        }
        try {
            byte[] json = ResultsJson.write(outcome.results());
            if (options.writeOutputs()) {
                Path folder = options.outDir() != null ? options.outDir() : defaultOutputFolder(script);
                List<InputFile> inputs = new ArrayList<>();
                inputs.add(RecordBuilder.input(script.getFileName().toString(), loaded.text));
                loaded.session.moduleSources().forEach((name, text) -> inputs.add(RecordBuilder.input(name, text)));
                CalculationRecord record = RecordBuilder.build(script.getFileName().toString(), loaded.text, outcome,
                        loaded.session, inputs, toolVersion);
                OutputFolder.write(folder, record, json);
            }
            if (options.json() != null) {
                OutputFolder.writeAtomically(options.json(), json);
            }
        } catch (IOException e) {
            err.println("rosetra: error: cannot write the outputs: " + e.getMessage());
            return ERROR;
        }
        return outcome.results().allChecksPass() ? PASSED : CHECK_FAILED;
    }

    /**
     * Re-runs the script without writing anything and compares every number with the committed
     * results: 0 when all agree, 1 when any differs, 2 on a script error.
     */
    public int verify(Path script, Path committedResults, double rtol, boolean allowJava) {
        if (!(rtol >= 0)) {
            err.println("rosetra: error: --rtol must be zero or positive, got " + rtol);
            return ERROR;
        }
        Object committed;
        try {
            committed = org.rosetra.lang.output.JsonTree.parse(Files.readAllBytes(committedResults));
        } catch (java.nio.file.NoSuchFileException e) {
            err.println("rosetra: error: there are no committed results at " + committedResults
                    + "; run the script once and commit its results.json, or name them with --against");
            return ERROR;
        } catch (IOException e) {
            err.println("rosetra: error: cannot read " + committedResults + ": " + e.getMessage());
            return ERROR;
        }
        Loaded loaded = load(script);
        if (loaded == null) {
            return ERROR;
        }
        Outcome outcome = compute(loaded, allowJava, false);
        if (outcome == null) {
            return ERROR;
        }
        Object now;
        try {
            now = org.rosetra.lang.output.JsonTree.parse(ResultsJson.write(outcome.results()));
        } catch (IOException e) {
            throw new IllegalStateException("results.json written by this tool does not read back", e);
        }
        var differences = org.rosetra.lang.output.ResultsComparison.compare(committed, now, rtol);
        for (var d : differences) {
            out.println(d);
        }
        if (differences.isEmpty()) {
            out.println("verified: every number agrees with " + committedResults
                    + " (relative tolerance " + rtol + ")");
            return PASSED;
        }
        out.println(differences.size() + (differences.size() == 1 ? " difference" : " differences")
                + " from " + committedResults);
        return CHECK_FAILED;
    }

    /** {@code survey.strain} writes to {@code survey.out/} next to it. */
    public static Path defaultOutputFolder(Path script) {
        String name = script.getFileName().toString();
        String stem = name.endsWith(".strain") ? name.substring(0, name.length() - ".strain".length()) : name;
        return script.resolveSibling(stem + ".out");
    }

    /** One line per check: pass or FAIL, the highest utilization and the governing case. */
    public static String verdict(CheckResult c) {
        StringBuilder s = new StringBuilder();
        s.append(c.passes() ? "pass" : "FAIL").append("  check \"").append(c.check().label().value()).append('"');
        if (c.unbounded()) {
            s.append("  utilization unbounded (the limit is zero)");
        } else if (!Double.isNaN(c.highest())) {
            s.append("  utilization ").append(org.rosetra.runtime.render.text.UtilizationText.of(c.highest()));
        } else {
            s.append("  (no case defines it)");
        }
        if (c.governingName() != null) {
            s.append("  governing ").append(c.governingName());
        }
        if (c.at() != null) {
            s.append(String.format(Locale.ROOT, " at %.3f s", c.at()));
        }
        return s.toString();
    }

    /**
     * Checks and computes a loaded script; prints its diagnostics. Null when it has an error.
     * {@code writesRecord} false spares the digests of series files that only the record needs.
     */
    private Outcome compute(Loaded loaded, boolean allowJava, boolean writesRecord) {
        loaded.session.allowJava(allowJava);
        loaded.session.writesRecord(writesRecord);
        if (System.console() != null) {
            loaded.session.progressTo(err);
        }
        Diagnostics diagnostics = new Diagnostics();
        loaded.session.submit("script", loaded.name, loaded.text, diagnostics);
        Outcome outcome = diagnostics.hasErrors() ? null : loaded.session.evaluate(diagnostics);
        return report(diagnostics, loaded.session) ? null : outcome;
    }

    /** Prints the diagnostics; true when there were errors. */
    private boolean report(Diagnostics diagnostics, Session session) {
        if (!diagnostics.all().isEmpty()) {
            err.print(diagnostics.render(session::sourceOf));
        }
        return diagnostics.hasErrors();
    }

    /** A script file read for a run, with the session it runs in. */
    public record Loaded(Path path, String name, String text, Session session) {}

    private Loaded load(Path script) {
        if (!Files.isRegularFile(script)) {
            err.println("rosetra: error: cannot find the script " + script);
            return null;
        }
        try {
            String text = Files.readString(script, StandardCharsets.UTF_8);
            Path folder = script.toAbsolutePath().getParent();
            return new Loaded(script, script.toString(), text, new Session(folder));
        } catch (MalformedInputException e) {
            err.println("rosetra: error: " + script + " is not UTF-8 text");
        } catch (IOException e) {
            err.println("rosetra: error: cannot read " + script + ": " + e.getMessage());
        }
        return null;
    }
}
