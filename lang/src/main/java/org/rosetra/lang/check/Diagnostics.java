package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;
import org.rosetra.lang.syntax.SourceSpan;

/**
 * The one collector every pass reports to. Passes keep going after an error so a user sees
 * every mistake of a run at once. Not thread-safe: one per run.
 */
public final class Diagnostics {

    private static final Comparator<Diagnostic> BY_POSITION = Comparator
            .comparing((Diagnostic d) -> d.span().file())
            .thenComparingInt(d -> d.span().line())
            .thenComparingInt(d -> d.span().column())
            .thenComparing(Diagnostic::severity)
            .thenComparing(Diagnostic::message);

    private final List<Diagnostic> all = new ArrayList<>();

    public void error(SourceSpan span, String message) {
        report(Severity.ERROR, span, message, null);
    }

    public void error(SourceSpan span, String message, String hint) {
        report(Severity.ERROR, span, message, hint);
    }

    public void warning(SourceSpan span, String message, String hint) {
        report(Severity.WARNING, span, message, hint);
    }

    public void note(SourceSpan span, String message) {
        report(Severity.NOTE, span, message, null);
    }

    public void report(Severity severity, SourceSpan span, String message, String hint) {
        all.add(new Diagnostic(severity, span, message, hint));
    }

    public boolean hasErrors() {
        return all.stream().anyMatch(d -> d.severity() == Severity.ERROR);
    }

    public int errorCount() {
        return (int) all.stream().filter(d -> d.severity() == Severity.ERROR).count();
    }

    /** Every diagnostic, sorted by file, line and column. */
    public List<Diagnostic> sorted() {
        List<Diagnostic> sorted = new ArrayList<>(all);
        sorted.sort(BY_POSITION);
        return sorted;
    }

    /** Every diagnostic in the order reported. */
    public List<Diagnostic> all() {
        return List.copyOf(all);
    }

    /**
     * Renders every diagnostic as {@code FILE:LINE:COL: error: message}, the source line, a
     * caret line under the span, and {@code   hint: ...} when there is one.
     *
     * @param sourceOfFile the text of a file by its name, or null when it is not at hand
     */
    public String render(Function<String, String> sourceOfFile) {
        StringBuilder out = new StringBuilder();
        for (Diagnostic d : sorted()) {
            SourceSpan span = d.span();
            out.append(span.file());
            if (span.line() > 0) {
                out.append(':').append(span.line());
            }
            // Column 0: a place in a data file, named by its line only (its column is named in the message).
            if (span.column() > 0) {
                out.append(':').append(span.column());
            }
            out.append(": ").append(d.severity().label()).append(": ").append(d.message()).append('\n');
            String line = span.column() > 0 ? sourceLine(sourceOfFile.apply(span.file()), span.line()) : null;
            if (line != null) {
                out.append(line).append('\n').append(carets(line, span)).append('\n');
            }
            if (d.hint() != null) {
                out.append("  hint: ").append(d.hint()).append('\n');
            }
        }
        return out.toString();
    }

    private static String sourceLine(String source, int lineNumber) {
        if (source == null || lineNumber < 1) {
            return null;
        }
        String[] lines = source.split("\r\n|\r|\n", -1);
        return lineNumber <= lines.length ? lines[lineNumber - 1] : null;
    }

    /** Carets under the span on its first line; tabs are copied so the carets line up. */
    private static String carets(String line, SourceSpan span) {
        int start = Math.max(0, Math.min(span.column() - 1, line.length()));
        int end = span.endLine() == span.line() ? span.endColumn() - 1 : line.length();
        end = Math.max(start + 1, Math.min(end, line.length()));
        StringBuilder carets = new StringBuilder();
        for (int i = 0; i < start; i++) {
            carets.append(line.charAt(i) == '\t' ? '\t' : ' ');
        }
        carets.append("^".repeat(end - start));
        return carets.toString();
    }
}
