package org.rosetra.lang.repl;

import org.rosetra.lang.check.Diagnostic;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.syntax.SourceSpan;

/**
 * Diagnostics of one entry made ready to print: a place in the wrapper a bare expression was
 * put into is moved back onto the user's own text, and a message without a place is pinned to
 * the entry's first line.
 */
final class EntryDiagnostics {
    private EntryDiagnostics() {
    }

    /**
     * @param linesAdded lines the wrapper put before the user's text (0 when not wrapped)
     * @param lineCount  lines of the user's text
     */
    static Diagnostics placed(Diagnostics diagnostics, String file, int linesAdded, int lineCount) {
        Diagnostics placed = new Diagnostics();
        for (Diagnostic d : diagnostics.all()) {
            String message = linesAdded > 0 ? ExpressionEntry.inUserTerms(d.message()) : d.message();
            placed.report(d.severity(), place(d.span(), file, linesAdded, lineCount), message, d.hint());
        }
        return placed;
    }

    private static SourceSpan place(SourceSpan span, String file, int linesAdded, int lineCount) {
        if (span == null) {
            return new SourceSpan(file, 1, 1, 1, 2);
        }
        if (!span.file().equals(file) || linesAdded == 0) {
            return span;
        }
        int line = span.line() - linesAdded;
        if (line < 1 || line > lineCount) {
            int at = Math.max(1, Math.min(line, lineCount));
            return new SourceSpan(file, at, 1, at, 2);
        }
        int endLine = Math.min(lineCount, Math.max(line, span.endLine() - linesAdded));
        return new SourceSpan(file, line, span.column(), endLine, span.endColumn());
    }
}
