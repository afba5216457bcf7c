package org.rosetra.lang.syntax;

/** {@code report "name"}: the name of the calculation record. */
public record Report(StringLit name, SourceSpan span) implements Statement {
}
