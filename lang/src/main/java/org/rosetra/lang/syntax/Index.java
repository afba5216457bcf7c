package org.rosetra.lang.syntax;

/** {@code target[case]}: one load case (or combination, or series) of a per-case value. */
public record Index(Expr target, Name caseName, SourceSpan span) implements Expr {
}
