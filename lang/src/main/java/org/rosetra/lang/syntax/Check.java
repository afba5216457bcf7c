package org.rosetra.lang.syntax;

/** {@code check "label": LEFT op RIGHT}. */
public record Check(StringLit label, Expr left, ComparisonOp op, Expr right, SourceSpan span)
        implements Statement {
}
