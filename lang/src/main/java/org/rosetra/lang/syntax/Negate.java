package org.rosetra.lang.syntax;

/** Unary minus of anything but a literal (a literal takes the minus into its value). */
public record Negate(Expr operand, SourceSpan span) implements Expr {
}
