package org.rosetra.lang.syntax;

/** {@code from to to}: a time window such as {@code 0 s to 2 s}. */
public record Range(Expr from, Expr to, SourceSpan span) implements Expr {
}
