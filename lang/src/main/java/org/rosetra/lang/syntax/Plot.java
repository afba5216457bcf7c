package org.rosetra.lang.syntax;

/** {@code plot mohr X}, {@code plot directions X} or {@code plot EXPR}. */
public record Plot(PlotKind kind, Expr target, SourceSpan span) implements Statement {
}
