package org.rosetra.lang.syntax;

/** {@code target.member}: {@code web_top.sigma_1}, {@code s355.yield}. */
public record Member(Expr target, Name member, SourceSpan span) implements Expr {
}
