package org.rosetra.lang.syntax;

/** {@code name = value}, one line of a block. */
public record Field(Name name, Expr value, SourceSpan span) implements Node {
}
