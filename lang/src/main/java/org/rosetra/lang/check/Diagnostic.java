package org.rosetra.lang.check;

import org.rosetra.lang.syntax.SourceSpan;

/** One message about a script, at a place in it; {@code hint} may be null. */
public record Diagnostic(Severity severity, SourceSpan span, String message, String hint) {
}
