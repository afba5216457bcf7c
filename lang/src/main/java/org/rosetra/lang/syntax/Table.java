package org.rosetra.lang.syntax;

import java.util.List;

/** {@code table a, b.sigma_1, ...}: a rosette gives its standard table, a value a column. */
public record Table(List<Expr> items, SourceSpan span) implements Statement {
    public Table {
        items = List.copyOf(items);
    }
}
