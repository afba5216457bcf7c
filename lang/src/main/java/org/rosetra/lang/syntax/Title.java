package org.rosetra.lang.syntax;

/** {@code title "..."}: the heading of the calculation record. */
public record Title(StringLit text, SourceSpan span) implements Statement {
}
