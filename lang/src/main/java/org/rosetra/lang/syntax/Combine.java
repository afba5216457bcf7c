package org.rosetra.lang.syntax;

import java.util.List;

/** {@code combine NAME = k1 * CASE1 + k2 * CASE2 ...}: a load combination. */
public record Combine(Name name, List<Term> terms, SourceSpan span) implements Statement {
    public Combine {
        terms = List.copyOf(terms);
    }
}
