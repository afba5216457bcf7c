package org.rosetra.lang.plan;

import org.rosetra.lang.syntax.SourceSpan;

/** A script that checked cleanly still cannot be computed here, at this place, for this reason. */
public final class EvaluationException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient SourceSpan span;
    private final String hint;

    public EvaluationException(SourceSpan span, String message) {
        this(span, message, null);
    }

    public EvaluationException(SourceSpan span, String message, String hint) {
        super(message);
        this.span = span;
        this.hint = hint;
    }

    public SourceSpan span() {
        return span;
    }

    public String hint() {
        return hint;
    }
}
