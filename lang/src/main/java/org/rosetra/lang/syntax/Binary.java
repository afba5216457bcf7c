package org.rosetra.lang.syntax;

/** {@code left op right} for {@code + - * / ^}. */
public record Binary(BinaryOp op, Expr left, Expr right, SourceSpan span) implements Expr {
}
