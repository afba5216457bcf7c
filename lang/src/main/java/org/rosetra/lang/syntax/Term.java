package org.rosetra.lang.syntax;

/**
 * One term of a combination: a factor times a case. The factor is always a
 * {@link NumberLit}; a term written without one (`- proof`) gets 1 or -1, a minus
 * between terms is folded into the factor.
 */
public record Term(Expr factor, Name caseName, SourceSpan span) implements Node {
}
