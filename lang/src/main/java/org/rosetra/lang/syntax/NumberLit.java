package org.rosetra.lang.syntax;

/** A bare number: {@code 0.29}, {@code -38.5} (a leading minus is folded in). */
public record NumberLit(double value, SourceSpan span) implements Expr {
}
