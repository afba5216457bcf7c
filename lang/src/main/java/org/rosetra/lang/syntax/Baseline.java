package org.rosetra.lang.syntax;

import java.util.List;

/** {@code baseline NAME { ... }}: zero readings, subtracted by a case that names it. */
public record Baseline(Name name, List<Field> fields, SourceSpan span) implements Statement {
    public Baseline {
        fields = List.copyOf(fields);
    }
}
