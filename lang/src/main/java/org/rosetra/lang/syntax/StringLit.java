package org.rosetra.lang.syntax;

/** A string with its escapes resolved. */
public record StringLit(String value, SourceSpan span) implements Expr {
}
